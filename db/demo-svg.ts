/** Small SVG helpers for the demo drawings: a model-to-page mapping, dimension lines, labels. */
import type { ProfilePoint } from "@/models/font";

export const INK = "#221f1b";
export const SOFT = "#5d574f";
export const PAPER = "#fbf7ee";
export const FONT = `font-family="DejaVu Sans, Liberation Sans, sans-serif"`;

const n = (v: number) => (Math.round(v * 10) / 10).toString();
export const mm = (v: number) => `${Math.round(v).toLocaleString("en-GB")}`;

/** Model millimetres (r right, z up) to page pixels around a centre line at `cx`, floor at `floorY`. */
export function mapper(cx: number, floorY: number, scale: number) {
  return { x: (r: number) => cx + r * scale, y: (z: number) => floorY - z * scale, scale };
}
export type Mapper = ReturnType<typeof mapper>;

/** A closed path through profile points, mirrored to the left (`side` -1), the right (+1) or both (0). */
export function profilePath(m: Mapper, pts: ProfilePoint[], side: -1 | 0 | 1): string {
  const right = pts.map(([r, z]) => `${n(m.x(r))},${n(m.y(z))}`);
  const left = pts.slice().reverse().map(([r, z]) => `${n(m.x(-r))},${n(m.y(z))}`);
  if (side === 1) return `M${n(m.x(0))},${n(m.y(pts[0][1]))}L${right.join("L")}Z`;
  if (side === -1) return `M${left.join("L")}L${n(m.x(0))},${n(m.y(pts[0][1]))}Z`;
  return `M${right.join("L")}L${left.join("L")}Z`;
}

export function text(x: number, y: number, body: string, opts: { size?: number; anchor?: "start" | "middle" | "end"; weight?: number; fill?: string; rotate?: number } = {}) {
  const { size = 22, anchor = "middle", weight = 400, fill = INK, rotate } = opts;
  const t = rotate ? ` transform="rotate(${rotate} ${n(x)} ${n(y)})"` : "";
  return `<text x="${n(x)}" y="${n(y)}" ${FONT} font-size="${size}" font-weight="${weight}" text-anchor="${anchor}" fill="${fill}"${t}>${body}</text>`;
}

const arrow = (x: number, y: number, angle: number) => {
  const a = (angle * Math.PI) / 180, l = 14, w = 5;
  const bx = x - l * Math.cos(a), by = y - l * Math.sin(a);
  return `<path d="M${n(x)},${n(y)}L${n(bx - w * Math.sin(a))},${n(by + w * Math.cos(a))}L${n(bx + w * Math.sin(a))},${n(by - w * Math.cos(a))}Z" fill="${INK}"/>`;
};

/** A horizontal dimension between x1 and x2 at height y, with extension lines down/up to `fromY`. */
export function hDim(x1: number, x2: number, y: number, label: string, fromY?: number) {
  const ext = fromY === undefined ? "" : [x1, x2].map((x) => `<line x1="${n(x)}" y1="${n(fromY)}" x2="${n(x)}" y2="${n(y + Math.sign(y - fromY) * 8)}" stroke="${SOFT}" stroke-width="1"/>`).join("");
  return `${ext}<line x1="${n(x1)}" y1="${n(y)}" x2="${n(x2)}" y2="${n(y)}" stroke="${INK}" stroke-width="1.4"/>${arrow(x1, y, 180)}${arrow(x2, y, 0)}${text((x1 + x2) / 2, y - 10, label)}`;
}

/** A vertical dimension between y1 (upper) and y2 at x, with extension lines across from `fromX`. */
export function vDim(y1: number, y2: number, x: number, label: string, fromX?: number) {
  const ext = fromX === undefined ? "" : [y1, y2].map((y) => `<line x1="${n(fromX)}" y1="${n(y)}" x2="${n(x + Math.sign(x - fromX) * 8)}" y2="${n(y)}" stroke="${SOFT}" stroke-width="1"/>`).join("");
  const mid = (y1 + y2) / 2;
  return `${ext}<line x1="${n(x)}" y1="${n(y1)}" x2="${n(x)}" y2="${n(y2)}" stroke="${INK}" stroke-width="1.4"/>${arrow(x, y1, -90)}${arrow(x, y2, 90)}${text(x - 10, mid, label, { rotate: -90 })}`;
}

/** A note with a leader line to a point. */
export function leader(fromX: number, fromY: number, toX: number, toY: number, label: string) {
  const anchor = toX > fromX ? "end" : "start"; // the text sits on the far side from the point
  return `<line x1="${n(fromX)}" y1="${n(fromY)}" x2="${n(toX)}" y2="${n(toY)}" stroke="${INK}" stroke-width="1.2"/><circle cx="${n(toX)}" cy="${n(toY)}" r="3.5" fill="${INK}"/>${text(fromX + (anchor === "start" ? 6 : -6), fromY + 7, label, { anchor, size: 20 })}`;
}

/** The sheet: border and a title block in the lower right. */
export function sheet(width: number, height: number, title: string, lines: string[], body: string) {
  const bw = 560, bh = 40 + lines.length * 26, bx = width - bw - 30, by = height - bh - 30;
  const block = [
    `<rect x="${bx}" y="${by}" width="${bw}" height="${bh}" fill="${PAPER}" stroke="${INK}" stroke-width="1.5"/>`,
    text(bx + 16, by + 30, title, { anchor: "start", size: 22, weight: 700 }),
    ...lines.map((l, i) => text(bx + 16, by + 58 + i * 26, l, { anchor: "start", size: 17, fill: SOFT })),
  ].join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">
<rect width="100%" height="100%" fill="${PAPER}"/><rect x="14" y="14" width="${width - 28}" height="${height - 28}" fill="none" stroke="${INK}" stroke-width="2"/>
${body}${block}</svg>`;
}
