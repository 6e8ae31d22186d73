/**
 * The spatial dimension of Media Fragments URI 1.0 (basic), W3C Recommendation 25 September 2012,
 * §4.2.2 "Spatial Dimension":
 *
 *   xywhparam = [ xywhunit ":" ] 1*DIGIT "," 1*DIGIT "," 1*DIGIT "," 1*DIGIT
 *   xywhunit  = "pixel" / "percent"        (no unit means pixel)
 *
 * The grammar allows whole numbers only, so Placet stores whole per cents: on a phone-sized drawing
 * one per cent is a few pixels, finer than a fingertip. A pin's place is always written in the percent
 * unit (it survives the drawing being shown at any size).
 *
 * Placet's own rules on top of the grammar, for a comment's place on a drawing:
 * - the unit is percent, and the box lies inside the picture: x + w ≤ 100 and y + h ≤ 100;
 * - the box is at least 1 per cent wide and tall (no zero-area boxes, whose meaning the spec leaves open);
 * - a tap becomes a TAP_SIZE × TAP_SIZE box centred on the tapped spot (moved inwards at the edges).
 *
 * What people's devices send is read a little more kindly (normalisePercentSelector): fractional per cents
 * are accepted and a zero-size box means a tap; either is stored in the canonical whole-per-cent form.
 */

export type XywhUnit = "pixel" | "percent";

export interface Xywh {
  unit: XywhUnit;
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A box on a drawing, in whole per cents of its width (x, w) and height (y, h). */
export interface PercentBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A tap is stored as a square this many per cent on a side. */
export const TAP_SIZE = 2;

const GRAMMAR = /^xywh=(?:(pixel|percent):)?(\d+),(\d+),(\d+),(\d+)$/;

/** Parses an `xywh=` name-value pair by the §4.2.2 grammar (any unit); null if it does not match. */
export function parseXywh(value: string): Xywh | null {
  const m = GRAMMAR.exec(value);
  if (!m) return null;
  const nums = [m[2], m[3], m[4], m[5]].map(Number);
  if (!nums.every(Number.isSafeInteger)) return null;
  const [x, y, w, h] = nums;
  return { unit: (m[1] as XywhUnit | undefined) ?? "pixel", x, y, w, h };
}

/** Writes the canonical form: the unit always named, numbers without leading zeros. */
export function formatXywh(f: Xywh): string {
  return `xywh=${f.unit}:${f.x},${f.y},${f.w},${f.h}`;
}

/** Why a box cannot be a comment's place on a drawing, in plain words, or null if it can. */
export function percentBoxProblem(b: PercentBox): string | null {
  const all = [b.x, b.y, b.w, b.h];
  if (!all.every((n) => Number.isInteger(n) && n >= 0)) return "The place on the drawing must be given in whole per cents from 0 to 100.";
  if (b.w < 1 || b.h < 1) return "A marked area must be at least 1% wide and 1% tall.";
  if (b.x + b.w > 100 || b.y + b.h > 100) return "The marked area must lie inside the drawing.";
  return null;
}

/** Parses a stored place on a drawing: the percent unit and Placet's bounds; null if it is not one. */
export function parsePercentSelector(value: string): PercentBox | null {
  const f = parseXywh(value);
  if (!f || f.unit !== "percent") return null;
  const box = { x: f.x, y: f.y, w: f.w, h: f.h };
  return percentBoxProblem(box) ? null : box;
}

/** The selector value for a box; throws on a box that breaks the rules (callers build boxes with the helpers below). */
export function formatPercentSelector(b: PercentBox): string {
  const problem = percentBoxProblem(b);
  if (problem) throw new RangeError(problem);
  return formatXywh({ unit: "percent", ...b });
}

const clamp = (n: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, n));
const finiteOr = (n: number, d: number) => (Number.isFinite(n) ? n : d);

/** The box stored for a tap at (xPercent, yPercent) of the drawing (numbers from 0 to 100, fractions welcome). */
export function tapBox(xPercent: number, yPercent: number): PercentBox {
  const half = TAP_SIZE / 2;
  const x = clamp(Math.round(finiteOr(xPercent, 50) - half), 0, 100 - TAP_SIZE);
  const y = clamp(Math.round(finiteOr(yPercent, 50) - half), 0, 100 - TAP_SIZE);
  return { x, y, w: TAP_SIZE, h: TAP_SIZE };
}

/** The box spanned by dragging from one corner to the other (per cents, either direction); a short drag is a tap. */
export function dragBox(x1: number, y1: number, x2: number, y2: number): PercentBox {
  const [ax, bx] = [clamp(finiteOr(Math.min(x1, x2), 0), 0, 100), clamp(finiteOr(Math.max(x1, x2), 0), 0, 100)];
  const [ay, by] = [clamp(finiteOr(Math.min(y1, y2), 0), 0, 100), clamp(finiteOr(Math.max(y1, y2), 0), 0, 100)];
  if (bx - ax < TAP_SIZE && by - ay < TAP_SIZE) return tapBox((ax + bx) / 2, (ay + by) / 2);
  const x = Math.min(Math.floor(ax), 99);
  const y = Math.min(Math.floor(ay), 99);
  const w = clamp(Math.ceil(bx) - x, 1, 100 - x);
  const h = clamp(Math.ceil(by) - y, 1, 100 - y);
  return { x, y, w, h };
}

/** Whether a box is a tap (a pin) rather than a marked area. */
export function isTap(b: PercentBox): boolean {
  return b.w <= TAP_SIZE && b.h <= TAP_SIZE;
}

/** The centre of a box, where its numbered pin is drawn. */
export function boxCentre(b: PercentBox): { x: number; y: number } {
  return { x: b.x + b.w / 2, y: b.y + b.h / 2 };
}

const LENIENT = /^xywh=percent:(\d{1,3}(?:\.\d+)?),(\d{1,3}(?:\.\d+)?),(\d{1,3}(?:\.\d+)?),(\d{1,3}(?:\.\d+)?)$/;
const EPSILON = 1e-6;

/**
 * The canonical selector for a place sent by a device: a valid one as it is (canonically written); fractional
 * per cents rounded outwards to whole ones; a box smaller than a tap (including w = h = 0) as a tap centred on
 * it. Null if it is not a percent box inside the drawing.
 */
export function normalisePercentSelector(value: string): string | null {
  const strict = parsePercentSelector(value);
  if (strict) return formatXywh({ unit: "percent", ...strict });
  const m = LENIENT.exec(value);
  if (!m) return null;
  const [x, y, w, h] = [m[1], m[2], m[3], m[4]].map(Number);
  if (x > 100 || y > 100 || x + w > 100 + EPSILON || y + h > 100 + EPSILON) return null;
  const box = w < TAP_SIZE && h < TAP_SIZE ? tapBox(x + w / 2, y + h / 2) : dragBox(x, y, x + w, y + h);
  return formatXywh({ unit: "percent", ...box });
}
