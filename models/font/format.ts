/**
 * Plain number formatting with units, in a fixed locale so server and browser render the same text.
 */
import { cm2ToIn2, kgToLb, kPaToPsi, litresToUsGallons, mmToIn, type LengthUnit } from "./units";

const formatters = new Map<number, Intl.NumberFormat>();
export function formatNumber(n: number, fractionDigits: number): string {
  let f = formatters.get(fractionDigits);
  if (!f) {
    f = new Intl.NumberFormat("en-GB", { maximumFractionDigits: fractionDigits, minimumFractionDigits: 0 });
    formatters.set(fractionDigits, f);
  }
  return Number.isFinite(n) ? f.format(n) : "—";
}

const digitsFor = (n: number, big: number, small: number) => (Math.abs(n) >= 100 ? big : small);

export function formatLength(mm: number, unit: LengthUnit): string {
  if (unit === "in") return `${formatNumber(mmToIn(mm), 2)} in`;
  return `${formatNumber(mm, digitsFor(mm, 0, 1))} mm`;
}

export function formatMass(kg: number, unit: LengthUnit): string {
  if (unit === "in") {
    const lb = kgToLb(kg);
    return `${formatNumber(lb, digitsFor(lb, 0, 1))} lb`;
  }
  return `${formatNumber(kg, digitsFor(kg, 0, 1))} kg`;
}

export function formatCapacity(litres: number, unit: LengthUnit): string {
  if (unit === "in") return `${formatNumber(litresToUsGallons(litres), 2)} US gal`;
  return `${formatNumber(litres, digitsFor(litres, 0, 1))} L`;
}

export function formatPressure(kPa: number, unit: LengthUnit): string {
  if (unit === "in") return `${formatNumber(kPaToPsi(kPa), 2)} psi`;
  return `${formatNumber(kPa, 1)} kPa`;
}

export function formatArea(cm2: number, unit: LengthUnit): string {
  if (unit === "in") return `${formatNumber(cm2ToIn2(cm2), 1)} in²`;
  return `${formatNumber(cm2, 0)} cm²`;
}

export function formatVolumeCm3(cm3: number, unit: LengthUnit): string {
  if (unit === "in") return `${formatNumber(cm3 / 16.387064, 0)} in³`;
  return `${formatNumber(cm3, 0)} cm³`;
}

export const formatAngle = (deg: number): string => `${formatNumber(deg, 1)}°`;

export function formatList(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
