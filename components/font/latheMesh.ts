/**
 * three.js geometry for the font, built from the model's lathe profile (no React here, so the
 * benchmark and the tests can use it directly).
 *
 * three's LatheGeometry turns points (x = radius, y = height) about its Y axis, so the scene is Y-up:
 * model (x, y, z) ↔ scene (x, z, −y), a proper rotation; model millimetres are scene units.
 */
import { LatheGeometry, Shape, ShapeGeometry, Vector2 } from "three";
import type { ProfilePoint } from "@/models/font";

/** Segments round the axis. At 96 the polygonal section holds (96/2π)·sin(2π/96) = 99.93 % of the circle's area. */
export const DEFAULT_LATHE_SEGMENTS = 96;

export type Vec3 = [number, number, number];

export const modelToScene = ([x, y, z]: Vec3): Vec3 => [x, z, -y];
export const sceneToModel = ([x, y, z]: Vec3): Vec3 => [x, -z, y];

export function toVector2(points: ProfilePoint[]): Vector2[] {
  return points.map(([r, z]) => new Vector2(r, z));
}

/**
 * A whole lathe, or for the section view the half behind the cut (phi from π/2 to 3π/2, i.e. scene
 * z ≤ 0, model y ≥ 0) so the cut lies in the scene's XY plane, facing a camera on +z.
 */
export function buildLathe(points: ProfilePoint[], segments = DEFAULT_LATHE_SEGMENTS, section = false): LatheGeometry {
  const v = toVector2(points);
  return section
    ? new LatheGeometry(v, Math.ceil(segments / 2), Math.PI / 2, Math.PI)
    : new LatheGeometry(v, segments, 0, Math.PI * 2);
}

/** The cut faces for the section view: the profile on both sides of the axis, in the XY plane. */
export function buildSectionFaces(points: ProfilePoint[]): ShapeGeometry {
  const right = new Shape(points.map(([r, z]) => new Vector2(r, z)));
  const left = new Shape(
    points
      .slice()
      .reverse()
      .map(([r, z]) => new Vector2(-r, z)),
  );
  return new ShapeGeometry([right, left]);
}
