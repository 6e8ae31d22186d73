import type { FontPart } from "@/models/font";
import { MODEL_PARTS, POINT_LIMIT_MM, type ModelPoint } from "./schema";

/**
 * Placet's fragment syntax for a point on a revision's 3D model, used as the value of a Web Annotation
 * FragmentSelector whose `conformsTo` is MODEL_POINT_FORMAT_PATH on the Placet server (a plain-text page
 * that says what follows). It borrows the name=value&name=value shape of Media Fragments:
 *
 *   part=<bowl|foot|pedestal>&xyz=<x>,<y>,<z>
 *
 * x, y, z are model millimetres as decimal numbers (at most one decimal place): x and y across the floor
 * from the font's centre line, z up from the floor. Example: part=bowl&xyz=210,-35.5,830
 */
export const MODEL_POINT_FORMAT_PATH = "/api/formats/model-point";

const NUM = "(-?\\d+(?:\\.\\d)?)";
const GRAMMAR = new RegExp(`^part=(bowl|foot|pedestal)&xyz=${NUM},${NUM},${NUM}$`);

export function formatModelPoint(part: FontPart, point: ModelPoint): string {
  const n = (v: number) => String(Math.round(v * 10) / 10 + 0);
  return `part=${part}&xyz=${n(point[0])},${n(point[1])},${n(point[2])}`;
}

export function parseModelPoint(value: string): { part: FontPart; point: ModelPoint } | null {
  const m = GRAMMAR.exec(value);
  if (!m) return null;
  const point = [Number(m[2]), Number(m[3]), Number(m[4])].map((v) => v + 0) as ModelPoint;
  if (!point.every((v) => Number.isFinite(v) && Math.abs(v) <= POINT_LIMIT_MM)) return null;
  if (!(MODEL_PARTS as readonly string[]).includes(m[1])) return null;
  return { part: m[1] as FontPart, point };
}

/** The text served at MODEL_POINT_FORMAT_PATH. */
export const MODEL_POINT_FORMAT_TEXT = `Placet model point fragments

A Web Annotation FragmentSelector whose conformsTo is this page selects a point on the 3D model of a
Placet revision (the target's source is the revision).

  value = "part=" part "&xyz=" number "," number "," number
  part  = "bowl" / "foot" / "pedestal"
  number = ["-"] 1*DIGIT ["." DIGIT]

The numbers are model millimetres: x and y across the floor from the font's centre line, z up from the
floor. Each lies within ${POINT_LIMIT_MM} mm of the centre.

Example: part=bowl&xyz=210,-35.5,830 is a point on the bowl 830 mm above the floor.
`;
