/**
 * The rows of a comparison between two revisions: every parameter and figure, the older and newer
 * value in the chosen units, and the change in words ("+12 mm", "−1.8 kg"). Pure: no React.
 */
import {
  cm2ToIn2,
  cm3ToIn3,
  fontFields,
  formatAngle,
  formatArea,
  formatCapacity,
  formatLength,
  formatList,
  formatMass,
  formatNumber,
  formatPressure,
  formatVolumeCm3,
  glassMaterials,
  kgToLb,
  kPaToPsi,
  litresToUsGallons,
  mmToIn,
  type FontFigures,
  type GlassKind,
  type LengthUnit,
} from "@/models/font";

export type Kind = "length" | "mass" | "capacity" | "pressure" | "area" | "volume" | "angle" | "count" | "density" | "glass" | "angles" | "choice" | "flag";

export interface CompareRow {
  key: string;
  label: string;
  older: string;
  newer: string;
  /** the change in words, or null when the value did not change */
  change: string | null;
  /** "more" or "less" for numbers that changed; null otherwise */
  direction: "more" | "less" | null;
}

type Value = number | string | boolean | number[] | null | undefined;
type Worded = "glass" | "angles" | "choice" | "flag";

const unitOf: Record<Exclude<Kind, Worded>, (u: LengthUnit) => { to: (v: number) => number; suffix: string }> = {
  length: (u) => (u === "in" ? { to: mmToIn, suffix: " in" } : { to: (v) => v, suffix: " mm" }),
  mass: (u) => (u === "in" ? { to: kgToLb, suffix: " lb" } : { to: (v) => v, suffix: " kg" }),
  capacity: (u) => (u === "in" ? { to: litresToUsGallons, suffix: " US gal" } : { to: (v) => v, suffix: " L" }),
  pressure: (u) => (u === "in" ? { to: kPaToPsi, suffix: " psi" } : { to: (v) => v, suffix: " kPa" }),
  area: (u) => (u === "in" ? { to: cm2ToIn2, suffix: " in²" } : { to: (v) => v, suffix: " cm²" }),
  volume: (u) => (u === "in" ? { to: cm3ToIn3, suffix: " in³" } : { to: (v) => v, suffix: " cm³" }),
  angle: () => ({ to: (v) => v, suffix: "°" }),
  count: () => ({ to: (v) => v, suffix: "" }),
  density: () => ({ to: (v) => v, suffix: " kg/m³" }),
};

/** A value as the figures show it elsewhere, so the same number reads the same on every page. */
export function formatValue(kind: Kind, v: Value, u: LengthUnit): string {
  if (v === null || v === undefined) return "—";
  if (kind === "glass") return glassMaterials[v as GlassKind]?.label ?? String(v);
  if (kind === "flag") return v ? "Yes" : "No";
  if (kind === "choice") return fontFields.flatMap((f) => f.options ?? []).find((o) => o.value === v)?.label ?? String(v);
  if (kind === "angles") return (v as number[]).length ? formatList((v as number[]).map(formatAngle)) : "None";
  if (typeof v !== "number") return String(v);
  switch (kind) {
    case "length": return formatLength(v, u);
    case "mass": return formatMass(v, u);
    case "capacity": return formatCapacity(v, u);
    case "pressure": return formatPressure(v, u);
    case "area": return formatArea(v, u);
    case "volume": return formatVolumeCm3(v, u);
    case "angle": return formatAngle(v);
    case "density": return `${formatNumber(v, 0)} kg/m³`;
    default: return formatNumber(v, 0);
  }
}

/** A signed change in the chosen units, e.g. "+12 mm" or "−1.8 kg" (a true minus sign). */
export function formatChange(kind: Exclude<Kind, Worded>, delta: number, u: LengthUnit): string {
  const { to, suffix } = unitOf[kind](u);
  const d = to(delta);
  const a = Math.abs(d);
  const digits = kind === "count" ? 0 : a >= 100 ? 0 : a >= 1 ? 1 : a >= 0.1 ? 2 : 3;
  const shown = formatNumber(a, digits);
  const text = shown === "0" ? `less than ${formatNumber(10 ** -digits, digits)}` : shown;
  return `${d > 0 ? "+" : "−"}${text}${suffix}`;
}

/** Equal within floating-point noise (figures are computed, so 1e-9 relative is "the same"). */
function same(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

export function compareValue(key: string, label: string, kind: Kind, older: Value, newer: Value, u: LengthUnit): CompareRow {
  const row = { key, label, older: formatValue(kind, older, u), newer: formatValue(kind, newer, u) };
  if (typeof older === "number" && typeof newer === "number" && kind !== "glass" && kind !== "angles" && kind !== "choice" && kind !== "flag") {
    if (same(older, newer)) return { ...row, change: null, direction: null };
    return { ...row, change: formatChange(kind, newer - older, u), direction: newer > older ? "more" : "less" };
  }
  const a = JSON.stringify(older ?? null);
  const b = JSON.stringify(newer ?? null);
  if (kind === "angles" && Array.isArray(older) && Array.isArray(newer) && older.length === newer.length && older.every((x, i) => same(x, newer[i])))
    return { ...row, change: null, direction: null };
  return { ...row, change: a === b ? null : older == null ? "Added" : newer == null ? "Removed" : "Changed", direction: null };
}

export function parameterRows(olderParams: object, newerParams: object, u: LengthUnit): CompareRow[] {
  const older = olderParams as Record<string, unknown>;
  const newer = newerParams as Record<string, unknown>;
  return fontFields.map((f) => {
    const kind: Kind = f.kind === "glass" ? "glass" : f.kind;
    return compareValue(f.name, f.label, kind, older[f.name] as Value, newer[f.name] as Value, u);
  });
}

type FigureSpec = [key: string, label: string, kind: Kind, get: (f: FontFigures) => Value];

const figureSpecs: FigureSpec[] = [
  ["capacityLitres", "Capacity, full to the brim", "capacity", (f) => f.capacityLitres],
  ["outerRimDiameter", "Across the outside of the rim", "length", (f) => 2 * f.outerRimRadiusMm],
  ["rimHeightMm", "Rim height above the floor", "length", (f) => f.rimHeightMm],
  ["glassUnderInteriorMm", "Glass under the interior", "length", (f) => f.glassUnderInteriorMm],
  ["laminationAreaCm2", "Lamination contact area", "area", (f) => f.laminationAreaCm2],
  ["bowlGlassVolumeCm3", "Bowl glass volume", "volume", (f) => f.bowlGlassVolumeCm3],
  ["footGlassVolumeCm3", "Foot glass volume", "volume", (f) => f.footGlassVolumeCm3],
  ["bowlMassKg", "Bowl glass weight", "mass", (f) => f.bowlMassKg],
  ["footMassKg", "Foot glass weight", "mass", (f) => f.footMassKg],
  ["waterMassKg", "Water when full", "mass", (f) => f.waterMassKg],
  ["filledMassKg", "Filled weight", "mass", (f) => f.filledMassKg],
  ["centreOfMassHeightMm", "Centre of mass, full, above the floor", "length", (f) => f.centreOfMassHeightMm],
  ["tipAngleDeg", "Tip-over angle", "angle", (f) => f.tipAngleDeg],
  ["bearingPressureKPa", "Pressure under the foot", "pressure", (f) => f.bearingPressureKPa],
  ["workingCapacityLitres", "Capacity at the working level", "capacity", (f) => f.workingCapacityLitres],
  ["pedestalMassKg", "Pedestal weight", "mass", (f) => f.pedestalMassKg],
  ["rimLoadGlassEmpty", "Lean on the rim that tips the glass off, empty", "mass", (f) => f.rimLoadToTipKg?.glassOffPedestalEmpty],
  ["rimLoadWholeEmpty", "Lean on the rim that tips the whole font, empty", "mass", (f) => f.rimLoadToTipKg?.wholeFontEmpty],
  ["engravingAngles", "Engraving angles from the datum", "angles", (f) => f.engravings.map((e) => e.angleDeg)],
  ["engravingArcSpacingMm", "Spacing between engraving centres", "length", (f) => f.engravingArcSpacingMm],
  ["engravingCircleRadiusMm", "Radius of the circle through the engravings", "length", (f) => f.engravingCircleRadiusMm],
  ["sphereRadiusMm", "Radius of the interior's sphere", "length", (f) => f.sphereRadiusMm],
  ["flatCapHeightMm", "Glass ground off for the flat", "length", (f) => f.flatCapHeightMm],
  ["glassDensityKgM3", "Glass density used", "density", (f) => f.glassDensityKgM3],
];

export function figureRows(older: FontFigures | null, newer: FontFigures | null, u: LengthUnit): CompareRow[] {
  return figureSpecs.map(([key, label, kind, get]) => compareValue(key, label, kind, older ? get(older) : null, newer ? get(newer) : null, u));
}

export interface AttachmentLike { sha256: string; name: string; kind: string }

/** Files by their SHA-256: a file renamed but unchanged is the same file. */
export function attachmentChanges<T extends AttachmentLike>(older: T[], newer: T[]) {
  const before = new Set(older.map((a) => a.sha256));
  const after = new Set(newer.map((a) => a.sha256));
  return {
    added: newer.filter((a) => !before.has(a.sha256)),
    removed: older.filter((a) => !after.has(a.sha256)),
    kept: newer.filter((a) => before.has(a.sha256)),
  };
}
