import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { computeFontFigures, parseFontParameters, type FontParameters } from "@/models/font";
import { validFontParams } from "./arbitraries";

const valid = (q: FontParameters) => parseFontParameters(q).ok;

describe("properties of the figures (fast-check)", () => {
  it("every valid input gives finite, positive figures", () => {
    fc.assert(
      fc.property(validFontParams, (p) => {
        expect(valid(p)).toBe(true);
        const f = computeFontFigures(p);
        for (const [k, v] of Object.entries(f)) {
          if (typeof v !== "number") continue;
          expect(Number.isFinite(v), k).toBe(true);
          // no pedestal weighs nothing (the foot may stand on the floor)
          if (k === "pedestalMassKg" && p.pedestalHeight === 0) expect(v, k).toBe(0);
          else expect(v, k).toBeGreaterThan(0);
        }
        expect(f.tipAngleDeg).toBeLessThan(90);
        expect(f.centreOfMassHeightMm).toBeLessThan(f.rimHeightMm);
        expect(f.glassUnderInteriorMm).toBeGreaterThanOrEqual(5 - 1e-9);
      }),
      { numRuns: 500 },
    );
  });

  it("capacity grows with depth", () => {
    fc.assert(
      fc.property(validFontParams, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (p, k) => {
        const shallower = { ...p, depth: p.depth * k };
        fc.pre(valid(shallower));
        expect(computeFontFigures(shallower).capacityLitres).toBeLessThan(computeFontFigures(p).capacityLitres);
      }),
      { numRuns: 300 },
    );
  });

  it("mass grows with wall thickness", () => {
    fc.assert(
      fc.property(validFontParams, fc.double({ min: 0.5, max: 40, noNaN: true }), (p, extra) => {
        const thicker = { ...p, wallThickness: p.wallThickness + extra };
        fc.pre(valid(thicker));
        expect(computeFontFigures(thicker).bowlMassKg).toBeGreaterThan(computeFontFigures(p).bowlMassKg);
        expect(computeFontFigures(thicker).filledMassKg).toBeGreaterThan(computeFontFigures(p).filledMassKg);
      }),
      { numRuns: 300 },
    );
  });

  it("every invalid input is refused with a field error, never a throw", () => {
    const breakers: ((p: FontParameters) => Record<string, unknown>)[] = [
      (p) => ({ ...p, depth: p.rimRadius * 1.01 + 1 }),
      (p) => ({ ...p, wallThickness: -p.wallThickness }),
      (p) => ({ ...p, flatRadius: 5000 }),
      (p) => ({ ...p, engravingCount: 13 }),
      (p) => ({ ...p, engravingCount: Math.max(1, p.engravingCount), engravingDrop: 2999 }),
      (p) => ({ ...p, footBaseRadius: 0 }),
      (p) => ({ ...p, pedestalHeight: "tall" }),
    ];
    fc.assert(
      fc.property(validFontParams, fc.integer({ min: 0, max: breakers.length - 1 }), (p, i) => {
        const r = parseFontParameters(breakers[i](p));
        expect(r.ok).toBe(false);
        if (!r.ok) expect(Object.values(r.fieldErrors).flat().length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });
});
