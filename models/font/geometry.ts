/**
 * The font's key dimensions, derived once from the parameters. Both the lathe profile (and so the 3D
 * mesh) and every figure are built from this one object.
 *
 * Coordinates: z up, origin on the floor on the axis, millimetres. The bowl's interior is a spherical
 * cap of radius R about a centre on the axis; the exterior is the concentric sphere of radius R + t,
 * cut by the same rim plane; the underside is ground flat to a disc of radius flatRadius.
 */
import type { FontDimensions } from "./types";

/** Sphere radius of a cap with base radius a and height d: R = (a² + d²) / 2d. */
export function capSphereRadius(a: number, d: number): number {
  return (a * a + d * d) / (2 * d);
}

/** Height of the cap cut from a sphere of radius ρ by a disc of radius b (b ≤ ρ). */
export function capHeightForBase(rho: number, b: number): number {
  const inside = rho * rho - b * b;
  return inside <= 0 ? rho : rho - Math.sqrt(inside);
}

export interface FontGeometry {
  /** interior sphere radius R */
  sphereRadius: number;
  /** exterior sphere radius R + t */
  outerSphereRadius: number;
  /** height of the sphere centre above the floor */
  centreZ: number;
  /** height of the rim plane above the floor */
  rimZ: number;
  /** height of the interior's lowest point */
  interiorBottomZ: number;
  /** height of the ground flat (the bowl's underside) = top of the foot */
  flatZ: number;
  /** height of the cap ground off the exterior to make the flat */
  flatCapHeight: number;
  /** glass left between the flat and the interior */
  glassUnderInterior: number;
  /** radius of the outer edge of the rim */
  outerRimRadius: number;
  /** top of the pedestal = underside of the foot */
  footBaseZ: number;
  footTopZ: number;
  /** half the pedestal's width: its radius when round (a square one is drawn round, as wide as its side) */
  pedestalRadius: number;
  /** the working water level: its height and the interior's radius there */
  waterLineZ: number;
  waterLineRadius: number;
}

export function fontGeometry(p: FontDimensions): FontGeometry {
  const a = p.rimRadius;
  const d = p.depth;
  const t = p.wallThickness;
  const R = capSphereRadius(a, d);
  const Ro = R + t;
  const flatCapHeight = capHeightForBase(Ro, p.flatRadius);
  const footBaseZ = p.pedestalHeight;
  const footTopZ = footBaseZ + p.footHeight;
  const flatZ = footTopZ;
  // The exterior's lowest point would sit at rimZ − d − t; grinding the flat raises it by flatCapHeight.
  const rimZ = flatZ - flatCapHeight + d + t;
  const centreZ = rimZ - d + R;
  // The rim plane is R − d below the centre, so the exterior meets it at √(Ro² − (R − d)²).
  const outerRimRadius = Math.sqrt(Ro * Ro - (R - d) * (R - d));
  return {
    sphereRadius: R,
    outerSphereRadius: Ro,
    centreZ,
    rimZ,
    interiorBottomZ: rimZ - d,
    flatZ,
    flatCapHeight,
    glassUnderInterior: t - flatCapHeight,
    outerRimRadius,
    footBaseZ,
    footTopZ,
    pedestalRadius: p.pedestalWidth / 2,
    waterLineZ: rimZ - p.workingDepthBelowRim,
    waterLineRadius: Math.sqrt(Math.max(0, R * R - (centreZ - rimZ + p.workingDepthBelowRim) ** 2)),
  };
}

/** Radius of the exterior at a given drop below the rim plane. */
export function exteriorRadiusAtDrop(g: FontGeometry, drop: number): number {
  const dz = g.centreZ - (g.rimZ - drop);
  return Math.sqrt(Math.max(0, g.outerSphereRadius ** 2 - dz * dz));
}
