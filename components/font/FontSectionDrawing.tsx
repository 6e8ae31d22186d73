import type { FontProfile, ProfilePoint } from "@/models/font";

/**
 * A flat cross-section of the font drawn from the same lathe profile as the 3D view: the plain
 * picture shown when WebGL is missing or lost. No three.js here.
 */
export function FontSectionDrawing({ profile: prof, className = "" }: { profile: FontProfile; className?: string }) {
  const g = prof.geometry;
  const halfWidth = Math.max(g.outerRimRadius, g.pedestalRadius) * 1.1;
  const height = g.rimZ * 1.05;
  const pad = halfWidth * 0.04;
  const path = (pts: ProfilePoint[]) => {
    const right = pts.map(([r, z]) => `${r.toFixed(1)},${(-z).toFixed(1)}`);
    const left = pts
      .slice()
      .reverse()
      .map(([r, z]) => `${(-r).toFixed(1)},${(-z).toFixed(1)}`);
    return `M${right.join("L")}L${left.join("L")}Z`;
  };
  return (
    <svg
      viewBox={`${-halfWidth - pad} ${-height - pad} ${2 * (halfWidth + pad)} ${height + 2 * pad}`}
      className={className}
      role="img"
      aria-label="Cross-section of the font"
    >
      <line
        x1={-halfWidth}
        x2={halfWidth}
        y1={0}
        y2={0}
        stroke="currentColor"
        strokeWidth={halfWidth / 200}
        opacity={0.5}
      />
      <path d={path(prof.pedestal.points)} fill="#8b5e3c" opacity={0.85} />
      <path d={path(prof.water.points)} fill="#4f86b5" opacity={0.35} />
      <path d={path(prof.foot.points)} fill="#b9d6cf" stroke="#5d7f78" strokeWidth={halfWidth / 300} />
      <path d={path(prof.bowl.points)} fill="#b9d6cf" stroke="#5d7f78" strokeWidth={halfWidth / 300} />
      <line
        x1={-g.waterLineRadius} x2={g.waterLineRadius} y1={-g.waterLineZ} y2={-g.waterLineZ}
        stroke="#2f5f8a" strokeWidth={halfWidth / 250} data-testid="section-water-line"
      />
      <line x1={0} x2={0} y1={0} y2={-height} stroke="currentColor" strokeDasharray={`${halfWidth / 40} ${halfWidth / 60}`} strokeWidth={halfWidth / 400} opacity={0.4} />
    </svg>
  );
}
