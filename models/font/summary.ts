/**
 * A plain-words description of the form, for people who cannot see the 3D view.
 */
import type { FontFigures } from "./figures";
import { formatAngle, formatCapacity, formatLength, formatList, formatMass } from "./format";
import { glassMaterials } from "./materials";
import { pedestalMaterials } from "./pedestal";
import type { LengthUnit } from "./units";
import type { FontParameters } from "./types";

const countWords = ["no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve"];

function standsOn(p: FontParameters, L: (mm: number) => string): string {
  if (p.pedestalHeight <= 0) return "standing on the floor";
  const material = pedestalMaterials[p.pedestalMaterial]?.label.toLowerCase() ?? "wooden";
  const hollow = p.pedestalHollowWall > 0 ? "hollow " : "";
  return `on a ${p.pedestalShape ?? "round"} ${hollow}${material} pedestal ${L(p.pedestalHeight)} tall and ${L(p.pedestalWidth)} across`;
}

export function describeFont(p: FontParameters, f: FontFigures, unit: LengthUnit): string {
  const L = (mm: number) => formatLength(mm, unit);
  const glass = glassMaterials[p.glass]?.label.toLowerCase() ?? "glass";
  const parts = [
    `A glass font whose rim stands ${L(f.rimHeightMm)} above the floor.`,
    `The bowl is ${L(2 * f.outerRimRadiusMm)} across the outside of the rim and ${L(2 * p.rimRadius)} across the inside, ` +
      `${L(p.depth)} deep, in ${glass} ${L(p.wallThickness)} thick, and holds about ${formatCapacity(f.capacityLitres, unit)} to the brim.`,
    `Its underside is ground flat ${L(2 * p.flatRadius)} across and sits on a solid glass foot ${L(p.footHeight)} tall, ` +
      `${L(2 * p.footBaseRadius)} across at the base and ${L(2 * p.footTopRadius)} at the top, ${standsOn(p, L)}.`,
  ];
  const n = p.engravingCount;
  if (n > 0) {
    const word = countWords[n] ?? String(n);
    const angles = formatList(f.engravings.map((e) => formatAngle(e.angleDeg)));
    parts.push(
      `${word[0].toUpperCase()}${word.slice(1)} engraving${n === 1 ? "" : "s"} ${n === 1 ? "sits" : "sit"} ${L(p.engravingDrop)} below the rim, at ${angles} from the datum mark.`,
    );
  } else parts.push("There are no engravings.");
  parts.push(`Full of water it weighs about ${formatMass(f.filledMassKg, unit)}.`);
  if (f.fixing) parts.push(f.fixing.lines.slice(0, -2).join(" "));
  return parts.join(" ");
}
