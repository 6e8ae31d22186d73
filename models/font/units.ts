/**
 * Unit conversion for display and entry. Everything is stored in millimetres, kilograms, litres and
 * degrees; these helpers only convert at the edges (what a person types or reads).
 *
 * Exact definitions (international yard and pound agreement, 1959):
 *   1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 US gallon = 231 in³ = 3.785411784 L.
 * 1 psi = 1 lbf/in² = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6894.757293168… Pa.
 * Each is checked against mathjs in the unit tests.
 */

export const LENGTH_UNITS = ["mm", "in"] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const MM_PER_INCH = 25.4;
export const KG_PER_POUND = 0.45359237;
export const LITRES_PER_US_GALLON = 3.785411784;
export const STANDARD_GRAVITY = 9.80665; // m/s², CGPM 1901 conventional value
export const PA_PER_PSI = (KG_PER_POUND * STANDARD_GRAVITY) / (MM_PER_INCH / 1000) ** 2;
export const CM2_PER_SQUARE_INCH = (MM_PER_INCH / 10) ** 2; // 6.4516

export const mmToIn = (mm: number): number => mm / MM_PER_INCH;
export const inToMm = (inches: number): number => inches * MM_PER_INCH;
export const kgToLb = (kg: number): number => kg / KG_PER_POUND;
export const litresToUsGallons = (litres: number): number => litres / LITRES_PER_US_GALLON;
export const kPaToPsi = (kPa: number): number => (kPa * 1000) / PA_PER_PSI;
export const cm2ToIn2 = (cm2: number): number => cm2 / CM2_PER_SQUARE_INCH;
export const cm3ToIn3 = (cm3: number): number => cm3 / (MM_PER_INCH / 10) ** 3;

/** A length in mm expressed in the chosen unit. */
export const lengthFromMm = (mm: number, unit: LengthUnit): number => (unit === "in" ? mmToIn(mm) : mm);
/** A length typed in the chosen unit, back to mm. */
export const lengthToMm = (value: number, unit: LengthUnit): number => (unit === "in" ? inToMm(value) : value);

export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
export const radToDeg = (rad: number): number => (rad * 180) / Math.PI;

/** An angle in degrees brought into [0, 360). */
export function normaliseDeg(deg: number): number {
  const r = deg % 360;
  const n = r < 0 ? r + 360 : r;
  // Guard against -0 and values that round up to 360 after the modulo.
  return n >= 360 || Object.is(n, -0) ? 0 : n;
}
