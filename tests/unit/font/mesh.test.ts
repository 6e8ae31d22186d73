import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { BufferGeometry } from "three";
import { computeFontFigures, defaultFontParameters, fontProfile } from "@/models/font";
import { buildLathe, DEFAULT_LATHE_SEGMENTS, modelToScene, sceneToModel } from "@/components/font/latheMesh";
import { validFontParams } from "./arbitraries";

/**
 * Enclosed volume of a closed triangle mesh by the divergence theorem: V = Σ v0 · (v1 × v2) / 6 over
 * its triangles (positive when the faces wind outwards).
 */
function enclosedVolume(geo: BufferGeometry): number {
  const pos = geo.getAttribute("position");
  const idx = geo.getIndex();
  const n = idx ? idx.count : pos.count;
  let six = 0;
  for (let i = 0; i < n; i += 3) {
    const [a, b, c] = [0, 1, 2].map((k) => (idx ? idx.getX(i + k) : i + k));
    const ax = pos.getX(a), ay = pos.getY(a), az = pos.getZ(a);
    const bx = pos.getX(b), by = pos.getY(b), bz = pos.getZ(b);
    const cx = pos.getX(c), cy = pos.getY(c), cz = pos.getZ(c);
    six += ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
  }
  return six / 6;
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("the 3D mesh encloses the volume the figures report", () => {
  it("default font, default segment count: within 0.5 %", () => {
    const prof = fontProfile(defaultFontParameters);
    const f = computeFontFigures(defaultFontParameters, prof);
    const bowl = enclosedVolume(buildLathe(prof.bowl.points, DEFAULT_LATHE_SEGMENTS)) / 1000;
    const foot = enclosedVolume(buildLathe(prof.foot.points, DEFAULT_LATHE_SEGMENTS)) / 1000;
    const water = enclosedVolume(buildLathe(prof.water.points, DEFAULT_LATHE_SEGMENTS)) / 1e6;
    expect(bowl).toBeGreaterThan(0); // faces wind outwards
    expect(rel(bowl, f.bowlGlassVolumeCm3)).toBeLessThan(0.005);
    expect(rel(foot, f.footGlassVolumeCm3)).toBeLessThan(0.005);
    expect(rel(water, f.workingCapacityLitres)).toBeLessThan(0.005);
  });

  it("any valid font: within 0.5 %", () => {
    fc.assert(
      fc.property(validFontParams, (p) => {
        const prof = fontProfile(p);
        const f = computeFontFigures(p, prof);
        const bowl = enclosedVolume(buildLathe(prof.bowl.points)) / 1000;
        const water = enclosedVolume(buildLathe(prof.water.points)) / 1e6;
        expect(rel(bowl, f.bowlGlassVolumeCm3)).toBeLessThan(0.005);
        expect(rel(water, f.workingCapacityLitres)).toBeLessThan(0.005);
      }),
      { numRuns: 40 },
    );
  }, 60_000); // 40 meshes: slow on a shared machine
});

describe("model ↔ scene coordinates", () => {
  it("round-trip and keep z up as the scene's y", () => {
    expect(modelToScene([1, 2, 3])).toEqual([1, 3, -2]);
    expect(sceneToModel(modelToScene([4, -5, 6]))).toEqual([4, -5, 6]);
  });
});
