/**
 * Engravings spaced evenly round the bowl: θk = θ0 + k·360°/n, normalised to [0, 360), measured from
 * +x towards +y (anticlockwise seen from above). Centres sit on the exterior sphere at the given drop
 * below the rim plane.
 */
import { exteriorRadiusAtDrop, type FontGeometry } from "./geometry";
import { degToRad, normaliseDeg } from "./units";
import type { FontParameters } from "./types";

export interface EngravingPosition {
  index: number;
  /** degrees in [0, 360) */
  angleDeg: number;
  /** model millimetres */
  x: number;
  y: number;
  z: number;
}

export interface EngravingLayout {
  engravings: EngravingPosition[];
  /** radius of the circle through the centres */
  circleRadiusMm: number;
  /** spacing along that circle; null when there are no engravings */
  arcSpacingMm: number | null;
}

export function engravingAngles(count: number, startDeg: number): number[] {
  const out: number[] = [];
  for (let k = 0; k < count; k++) out.push(normaliseDeg(startDeg + (k * 360) / count));
  return out;
}

export function engravingLayout(p: FontParameters, g: FontGeometry): EngravingLayout {
  const r = exteriorRadiusAtDrop(g, p.engravingDrop);
  const z = g.rimZ - p.engravingDrop;
  const engravings = engravingAngles(p.engravingCount, p.engravingStartAngle).map((angleDeg, index) => {
    const th = degToRad(angleDeg);
    return { index, angleDeg, x: r * Math.cos(th), y: r * Math.sin(th), z };
  });
  return {
    engravings,
    circleRadiusMm: r,
    arcSpacingMm: p.engravingCount > 0 ? (2 * Math.PI * r) / p.engravingCount : null,
  };
}
