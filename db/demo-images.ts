/**
 * Invented demo drawings of a font, drawn by code from its parameters (the same lathe profile and
 * engraving layout the figures use), so each revision's drawings show that revision's shape.
 */
import sharp from "sharp";
import { computeFontFigures, fontProfile, samplePoints, type FontParameters } from "@/models/font";
import { FONT, INK, PAPER, SOFT, hDim, leader, mapper, mm, profilePath, sheet, text, vDim } from "./demo-svg";

export interface DemoImage { name: string; caption: string; bytes: Buffer }

const GLASS = { soda: "#cfe3dc", edge: "#4f7d74" };
const WOOD = "#a7774f";
const png = (svg: string) => sharp(Buffer.from(svg)).png({ compressionLevel: 9 }).toBuffer();

function sectionElevation(p: FontParameters): string {
  const prof = fontProfile(p);
  const g = prof.geometry;
  const W = 1600, H = 1200;
  const half = Math.max(g.outerRimRadius, g.pedestalRadius);
  const scale = Math.min((H - 330) / g.rimZ, (W - 560) / (2 * half));
  const m = mapper(W / 2 - 60, H - 150, scale);
  const outside = samplePoints(prof.bowl.segments.slice(0, 2), { stepRad: Math.PI / 180, sagitta: 0.05 });
  const silhouette: [number, number][] = [...outside, [g.outerRimRadius, g.rimZ], [0, g.rimZ]];
  const top = m.y(g.rimZ), floor = m.y(0);
  // A point in the middle of the wall, a third of the way down: between the two concentric spheres.
  const wallZ = g.rimZ - p.depth / 3, dz = g.centreZ - wallZ;
  const wallR = (Math.sqrt(g.sphereRadius ** 2 - dz * dz) + Math.sqrt(g.outerSphereRadius ** 2 - dz * dz)) / 2;
  const body = [
    `<defs><pattern id="hatch" width="12" height="12" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="12" height="12" fill="${GLASS.soda}"/><line x1="0" y1="0" x2="0" y2="12" stroke="${GLASS.edge}" stroke-width="1.2"/></pattern></defs>`,
    `<line x1="60" y1="${floor}" x2="${W - 60}" y2="${floor}" stroke="${INK}" stroke-width="2"/>`,
    `<path d="${profilePath(m, prof.pedestal.points, 0)}" fill="${WOOD}" fill-opacity="0.35" stroke="${INK}" stroke-width="2"/>`,
    `<path d="${profilePath(m, prof.foot.points, -1)}" fill="${GLASS.soda}" stroke="${INK}" stroke-width="2"/>`,
    `<path d="${profilePath(m, prof.foot.points, 1)}" fill="url(#hatch)" stroke="${INK}" stroke-width="2"/>`,
    `<path d="${profilePath(m, silhouette, -1)}" fill="${GLASS.soda}" stroke="${INK}" stroke-width="2"/>`,
    `<path d="${profilePath(m, prof.bowl.points, 1)}" fill="url(#hatch)" stroke="${INK}" stroke-width="2.2"/>`,
    `<line x1="${m.x(0)}" y1="${top - 60}" x2="${m.x(0)}" y2="${floor + 20}" stroke="${SOFT}" stroke-width="1.2" stroke-dasharray="28 8 4 8"/>`,
    text(m.x(-half * 0.55), floor + 40, "ELEVATION", { size: 18, fill: SOFT, weight: 700 }),
    text(m.x(half * 0.55), floor + 40, "SECTION", { size: 18, fill: SOFT, weight: 700 }),
    hDim(m.x(-g.outerRimRadius), m.x(g.outerRimRadius), top - 90, `Ø ${mm(2 * g.outerRimRadius)} outside`, top),
    hDim(m.x(-p.rimRadius), m.x(p.rimRadius), top - 40, `Ø ${mm(2 * p.rimRadius)} inside`, top),
    vDim(top, m.y(g.interiorBottomZ), m.x(half) + 80, `depth ${mm(p.depth)}`, m.x(p.rimRadius)),
    vDim(top, floor, m.x(half) + 170, `rim ${mm(g.rimZ)} above floor`, m.x(g.outerRimRadius)),
    vDim(m.y(g.footTopZ), m.y(g.footBaseZ), m.x(-half) - 80, `foot ${mm(p.footHeight)}`, m.x(-p.footBaseRadius)),
    vDim(m.y(g.footBaseZ), floor, m.x(-half) - 80, `pedestal ${mm(p.pedestalHeight)}`, m.x(-g.pedestalRadius)),
    hDim(m.x(-p.footBaseRadius), m.x(p.footBaseRadius), m.y(g.footBaseZ) + 40, `Ø ${mm(2 * p.footBaseRadius)} foot base`),
    leader(m.x(p.rimRadius * 0.62), top + 30, m.x(wallR), m.y(wallZ), `wall ${mm(p.wallThickness)}`),
    leader(m.x(half) + 40, m.y(g.flatZ) + 60, m.x(p.flatRadius * 0.6), m.y(g.flatZ), `ground flat Ø ${mm(2 * p.flatRadius)}`),
  ].join("\n");
  return sheet(W, H, "Font — section and elevation", [
    `Bowl Ø ${mm(2 * p.rimRadius)} × ${mm(p.depth)} deep, ${mm(p.wallThickness)} glass · ${p.glass} glass`,
    "Dimensions in millimetres · for discussion, not construction",
  ], body);
}

function engravingPlan(p: FontParameters): string {
  const prof = fontProfile(p);
  const g = prof.geometry;
  const fig = computeFontFigures(p, prof);
  const W = 1200, H = 1200, cx = W / 2, cy = 520;
  const s = 380 / g.outerRimRadius;
  const circle = (r: number, extra: string) => `<circle cx="${cx}" cy="${cy}" r="${(r * s).toFixed(1)}" ${extra.includes("fill=") ? "" : 'fill="none" '}${extra}/>`;
  const marks = fig.engravings.map((e, i) => {
    const x = cx + e.x * s, y = cy - e.y * s; // plan seen from above: +y is up the page
    const lx = cx + e.x * s * 1.28, ly = cy - e.y * s * 1.28;
    return [
      `<line x1="${cx}" y1="${cy}" x2="${x.toFixed(1)}" y2="${y.toFixed(1)}" stroke="${SOFT}" stroke-width="1" stroke-dasharray="6 6"/>`,
      `<rect x="${(x - 11).toFixed(1)}" y="${(y - 11).toFixed(1)}" width="22" height="22" fill="${INK}" transform="rotate(45 ${x.toFixed(1)} ${y.toFixed(1)})"/>`,
      text(lx, ly + 8, `${i + 1} · ${Math.round(e.angleDeg)}°`, { size: 22, weight: 700 }),
    ].join("");
  });
  const spacing = fig.engravingArcSpacingMm;
  const body = [
    circle(g.outerRimRadius, `stroke="${INK}" stroke-width="3" fill="${GLASS.soda}"`),
    circle(p.rimRadius, `stroke="${INK}" stroke-width="2"`),
    circle(p.footBaseRadius, `stroke="${SOFT}" stroke-width="1.5" stroke-dasharray="14 8"`),
    fig.engravings.length ? circle(fig.engravingCircleRadiusMm, `stroke="${GLASS.edge}" stroke-width="2" stroke-dasharray="4 6"`) : "",
    `<line x1="${cx}" y1="${cy}" x2="${cx + 470}" y2="${cy}" stroke="${INK}" stroke-width="1.5"/>`,
    text(cx + 470, cy - 12, "0°", { anchor: "end", size: 20 }),
    `<path d="M${cx + 60},${cy} A60,60 0 0 0 ${cx + 60 * Math.cos(Math.PI / 3)},${cy - 60 * Math.sin(Math.PI / 3)}" fill="none" stroke="${INK}" stroke-width="1.5"/>`,
    text(cx + 74, cy - 50, "θ", { anchor: "start", size: 22 }),
    ...marks,
    text(80, 1000, fig.engravings.length
      ? `${fig.engravings.length} engravings, ${mm(360 / fig.engravings.length)}° apart from ${mm(p.engravingStartAngle)}°, ${mm(p.engravingDrop)} below the rim`
      : "No engravings on this revision.", { anchor: "start", size: 22 }),
    spacing ? text(80, 1034, `Spacing ${mm(spacing)} along a circle of Ø ${mm(2 * fig.engravingCircleRadiusMm)} round the bowl`, { anchor: "start", size: 22 }) : "",
    text(80, 1068, "Dashed: foot base below. Angles anticlockwise, seen from above.", { anchor: "start", size: 18, fill: SOFT }),
  ].join("\n");
  return sheet(W, H, "Font — plan of the engravings", [`Rim Ø ${mm(2 * g.outerRimRadius)} outside`], body);
}

function softRender(p: FontParameters): string {
  const prof = fontProfile(p);
  const g = prof.geometry;
  const fig = computeFontFigures(p, prof);
  const W = 1200, H = 1500;
  const half = Math.max(g.outerRimRadius, g.pedestalRadius);
  const scale = Math.min((H - 360) / g.rimZ, (W - 260) / (2 * half));
  const m = mapper(W / 2, H - 180, scale);
  const floor = m.y(0);
  const engr = fig.engravings.filter((e) => e.y < 0).map((e) => {
    const x = m.x(e.x), y = m.y(e.z), face = Math.min(1, -e.y / fig.engravingCircleRadiusMm);
    return `<ellipse cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" rx="${(16 * face + 4).toFixed(1)}" ry="20" fill="#ffffff" fill-opacity="${(0.25 + 0.45 * face).toFixed(2)}"/>`;
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
<defs>
<linearGradient id="wall" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#e9e0cf"/><stop offset="1" stop-color="#d8ccb5"/></linearGradient>
<linearGradient id="floor" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#b9aa90"/><stop offset="1" stop-color="#8f806a"/></linearGradient>
<linearGradient id="wood" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="#6e4a2e"/><stop offset="0.45" stop-color="#b07f52"/><stop offset="1" stop-color="#5c3d25"/></linearGradient>
<linearGradient id="glass" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="#8fb8ad" stop-opacity="0.9"/><stop offset="0.35" stop-color="#e6f4ef" stop-opacity="0.75"/><stop offset="0.6" stop-color="#a9cdc3" stop-opacity="0.7"/><stop offset="1" stop-color="#6f9c90" stop-opacity="0.9"/></linearGradient>
<radialGradient id="light" cx="0.35" cy="0.2" r="0.8"><stop offset="0" stop-color="#fff7e0" stop-opacity="0.7"/><stop offset="1" stop-color="#fff7e0" stop-opacity="0"/></radialGradient>
<filter id="blur" x="-50%" y="-50%" width="200%" height="200%"><feGaussianBlur stdDeviation="18"/></filter>
</defs>
<rect width="${W}" height="${floor}" fill="url(#wall)"/><rect y="${floor}" width="${W}" height="${H - floor}" fill="url(#floor)"/>
<rect width="${W}" height="${H}" fill="url(#light)"/>
<ellipse cx="${m.x(0) + 40}" cy="${floor + 10}" rx="${(half * scale * 1.3).toFixed(1)}" ry="28" fill="#3b3128" fill-opacity="0.45" filter="url(#blur)"/>
<path d="${profilePath(m, prof.pedestal.points, 0)}" fill="url(#wood)"/>
<path d="${profilePath(m, prof.foot.points, 0)}" fill="url(#glass)" stroke="#4f7d74" stroke-opacity="0.5" stroke-width="2"/>
<path d="${profilePath(m, prof.bowl.points, 0)}" fill="url(#glass)" stroke="#4f7d74" stroke-opacity="0.6" stroke-width="2"/>
<path d="${profilePath(m, prof.water.points, 0)}" fill="#5f9fc0" fill-opacity="0.28"/>
<ellipse cx="${m.x(0)}" cy="${m.y(g.rimZ)}" rx="${(g.outerRimRadius * scale).toFixed(1)}" ry="${(g.outerRimRadius * scale * 0.12).toFixed(1)}" fill="#f4fbf8" fill-opacity="0.55" stroke="#4f7d74" stroke-opacity="0.6" stroke-width="2"/>
${engr.join("\n")}
<path d="M${m.x(-g.outerRimRadius * 0.72)},${m.y(g.rimZ - p.depth * 0.15)} Q${m.x(-g.outerRimRadius * 0.6)},${m.y(g.rimZ - p.depth * 0.75)} ${m.x(-g.outerRimRadius * 0.2)},${m.y(g.interiorBottomZ - p.wallThickness * 0.3)}" fill="none" stroke="#ffffff" stroke-opacity="0.7" stroke-width="10" stroke-linecap="round" filter="url(#blur)"/>
<text x="40" y="${H - 50}" ${FONT} font-size="24" fill="${PAPER}">Impression for discussion · ${fig.engravings.length} engravings · rim ${mm(g.rimZ)} mm above the floor</text>
<text x="40" y="${H - 90}" ${FONT} font-size="20" fill="${INK}" fill-opacity="0.7">Drawn from the model; colours and light are suggestions only</text>
</svg>`;
}

/** Three invented drawings of the font with these parameters: section elevation, engraving plan, a soft render. */
export async function demoImages(params: FontParameters): Promise<DemoImage[]> {
  const n = params.engravingCount;
  return [
    { name: "section-elevation.png", caption: `Section and elevation: bowl Ø ${mm(2 * params.rimRadius)} mm inside, ${mm(params.depth)} mm deep`, bytes: await png(sectionElevation(params)) },
    { name: "engraving-plan.png", caption: n ? `Plan: ${n} engravings round the rim, starting at ${mm(params.engravingStartAngle)}°` : "Plan: no engravings", bytes: await png(engravingPlan(params)) },
    { name: "render.jpg", caption: "A soft impression of the font in place", bytes: await sharp(Buffer.from(softRender(params))).jpeg({ quality: 84, mozjpeg: true }).toBuffer() },
  ];
}
