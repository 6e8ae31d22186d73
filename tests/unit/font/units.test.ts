import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import {
  cm2ToIn2,
  inToMm,
  kgToLb,
  kPaToPsi,
  lengthFromMm,
  lengthToMm,
  litresToUsGallons,
  mmToIn,
  normaliseDeg,
  PA_PER_PSI,
} from "@/models/font";

// Each conversion is checked against mathjs's own unit definitions (an independent implementation).
describe("unit conversions against mathjs", () => {
  it("millimetres and inches", () => {
    expect(inToMm(1)).toBe(unit(1, "inch").toNumber("mm"));
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), (mm) => {
        expect(mmToIn(mm)).toBeCloseTo(unit(mm, "mm").toNumber("inch"), 9);
        expect(lengthToMm(lengthFromMm(mm, "in"), "in")).toBeCloseTo(mm, 9);
        expect(lengthFromMm(mm, "mm")).toBe(mm);
      }),
    );
  });

  it("0.060 in of downfeed per turn is 1.524 mm", () => {
    expect(inToMm(0.06)).toBeCloseTo(unit(0.06, "inch").toNumber("mm"), 12);
    expect(inToMm(0.06)).toBeCloseTo(1.524, 12);
  });

  it("kilograms and pounds", () => {
    expect(kgToLb(100)).toBeCloseTo(unit(100, "kg").toNumber("lbm"), 9);
  });

  it("litres and US gallons", () => {
    // mathjs's "gallon" is the US liquid gallon (231 in³).
    expect(litresToUsGallons(20)).toBeCloseTo(unit(20, "liter").toNumber("gallon"), 9);
  });

  it("kilopascals and psi", () => {
    expect(PA_PER_PSI).toBeCloseTo(unit(1, "psi").toNumber("Pa"), 6);
    expect(kPaToPsi(10)).toBeCloseTo(unit(10, "kPa").toNumber("psi"), 9);
  });

  it("square centimetres and square inches", () => {
    expect(cm2ToIn2(380)).toBeCloseTo(unit(380, "cm^2").toNumber("inch^2"), 9);
  });
});

describe("angles", () => {
  it("normalise to [0, 360)", () => {
    expect(normaliseDeg(360)).toBe(0);
    expect(normaliseDeg(-30)).toBe(330);
    expect(normaliseDeg(-360)).toBe(0);
    expect(normaliseDeg(725)).toBe(5);
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (deg) => {
        const n = normaliseDeg(deg);
        expect(n).toBeGreaterThanOrEqual(0);
        expect(n).toBeLessThan(360);
      }),
    );
  });
});
