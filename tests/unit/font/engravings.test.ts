import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { computeFontFigures, defaultFontParameters, engravingAngles, fontGeometry } from "@/models/font";
import { validFontParams } from "./arbitraries";

describe("engraving angles θk = θ0 + k·360°/n", () => {
  it("three engravings from 0° sit at 0°, 120° and 240°", () => {
    // Common practice: n marks spaced evenly, 360°/n apart.
    expect(engravingAngles(3, 0)).toEqual([0, 120, 240]);
  });

  it("angles are normalised to [0, 360)", () => {
    expect(engravingAngles(3, -30)).toEqual([330, 90, 210]);
    expect(engravingAngles(4, 300)).toEqual([300, 30, 120, 210]);
    expect(engravingAngles(0, 45)).toEqual([]);
  });
});

describe("engraving positions", () => {
  it("lie on the exterior sphere at the given drop below the rim", () => {
    fc.assert(
      fc.property(validFontParams, (p) => {
        const g = fontGeometry(p);
        const f = computeFontFigures(p);
        expect(f.engravings).toHaveLength(p.engravingCount);
        for (const e of f.engravings) {
          const dist = Math.hypot(e.x, e.y, e.z - g.centreZ);
          expect(dist / g.outerSphereRadius).toBeCloseTo(1, 9);
          expect(e.z).toBeCloseTo(g.rimZ - p.engravingDrop, 6);
          // angle measured from +x towards +y
          const ang = ((Math.atan2(e.y, e.x) * 180) / Math.PI + 360) % 360;
          expect(Math.min(Math.abs(ang - e.angleDeg), 360 - Math.abs(ang - e.angleDeg))).toBeLessThan(1e-6);
        }
      }),
      { numRuns: 200 },
    );
  });

  it("arc spacing is the circle through the centres divided by n", () => {
    const p = { ...defaultFontParameters, engravingCount: 4 };
    const f = computeFontFigures(p);
    const r = Math.hypot(f.engravings[0].x, f.engravings[0].y);
    expect(f.engravingArcSpacingMm).toBeCloseTo((2 * Math.PI * r) / 4, 9);
    // Neighbouring centres are a chord 2r·sin(π/n) apart (plane geometry).
    const [e0, e1] = f.engravings;
    expect(Math.hypot(e1.x - e0.x, e1.y - e0.y)).toBeCloseTo(2 * r * Math.sin(Math.PI / 4), 9);
    expect(computeFontFigures({ ...p, engravingCount: 0 }).engravingArcSpacingMm).toBeNull();
  });
});
