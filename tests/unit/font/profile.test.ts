import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  capCentroidFromCentre,
  defaultFontParameters,
  fontProfile,
  frustumCentroidFromBase,
  frustumVolume,
  integrateOutline,
  sphericalCapVolume,
} from "@/models/font";
import { validFontParams } from "./arbitraries";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("profile integration equals the closed forms", () => {
  it("water, bowl glass and foot, for any valid font", () => {
    fc.assert(
      fc.property(validFontParams, (p) => {
        const prof = fontProfile(p);
        const g = prof.geometry;
        const R = g.sphereRadius;
        const Ro = g.outerSphereRadius;
        // interior cap V = πd²(3R − d)/3
        const water = integrateOutline(prof.brimWater.segments);
        expect(rel(water.volume, sphericalCapVolume(R, p.depth))).toBeLessThan(1e-9);
        // centroid of a cap: 3(2R − h)²/4(3R − h) below the centre (pointing down here)
        expect(water.centroidZ).toBeCloseTo(g.centreZ - capCentroidFromCentre(R, p.depth), 6);
        // bowl glass = exterior cap to the rim − interior cap − the cap ground off for the flat
        const glass =
          sphericalCapVolume(Ro, p.depth + p.wallThickness) -
          sphericalCapVolume(R, p.depth) -
          sphericalCapVolume(Ro, g.flatCapHeight);
        expect(rel(integrateOutline(prof.bowl.segments).volume, glass)).toBeLessThan(1e-7);
        // foot frustum V = πh(R² + Rr + r²)/3, centroid h(R² + 2Rr + 3r²)/4(R² + Rr + r²)
        const foot = integrateOutline(prof.foot.segments);
        expect(rel(foot.volume, frustumVolume(p.footBaseRadius, p.footTopRadius, p.footHeight))).toBeLessThan(1e-9);
        expect(foot.centroidZ).toBeCloseTo(
          p.pedestalHeight + frustumCentroidFromBase(p.footBaseRadius, p.footTopRadius, p.footHeight),
          6,
        );
      }),
      { numRuns: 300 },
    );
  });
});

describe("profile points", () => {
  it("start and end on the axis, never go negative, and lie on their surfaces", () => {
    fc.assert(
      fc.property(validFontParams, (p) => {
        const prof = fontProfile(p);
        for (const part of [prof.bowl, prof.foot, prof.pedestal]) {
          expect(part.points[0][0]).toBe(0);
          expect(part.points[part.points.length - 1][0]).toBe(0);
          for (const [r, z] of part.points) {
            expect(r).toBeGreaterThanOrEqual(0);
            expect(Number.isFinite(z)).toBe(true);
          }
        }
        for (const seg of prof.bowl.segments) {
          if (seg.kind !== "arc") continue;
          for (const [r, z] of [seg.from, seg.to]) {
            expect(Math.hypot(r, z - seg.centreZ) / seg.radius).toBeCloseTo(1, 9);
          }
        }
      }),
      { numRuns: 100 },
    );
  });

  it("the bowl's flat sits on the foot's top, and the foot on the pedestal", () => {
    const prof = fontProfile(defaultFontParameters);
    expect(prof.bowl.points[0][1]).toBe(prof.foot.points[prof.foot.points.length - 1][1]);
    expect(prof.foot.points[0][1]).toBe(defaultFontParameters.pedestalHeight);
  });
});
