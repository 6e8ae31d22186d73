import { describe, expect, it } from "vitest";
import {
  capCentroidFromCentre,
  computeFontFigures,
  defaultFontParameters,
  frustumCentroidFromBase,
  frustumVolume,
  sphericalCapVolume,
  sphericalCapVolumeFromBase,
} from "@/models/font";

describe("closed-form volumes against worked examples", () => {
  it("spherical cap, sphere radius 10 cm, height 3 cm, holds 254.47 cm³", () => {
    // Worked example: superglobalcalculator.com, "Spherical Cap Volume", Example 1 (V = 81π ≈ 254.47 cm³);
    // the same figure (254.4690) is novacalculator.com's spherical cap Example 1.
    expect(sphericalCapVolume(10, 3)).toBeCloseTo(254.469, 3);
  });

  it("the base-radius form πd(3a² + d²)/6 gives the same cap", () => {
    // novacalculator.com, Example 1: base radius a = √(3·(20 − 3)) = √51 = 7.1414 for R = 10, h = 3.
    expect(sphericalCapVolumeFromBase(Math.sqrt(51), 3)).toBeCloseTo(254.469, 3);
  });

  it("hemisphere of radius 5 as a cap: 261.7994", () => {
    // novacalculator.com, Example 2: cap formula with R = h = 5 equals (2/3)πR³ = 261.7994.
    expect(sphericalCapVolume(5, 5)).toBeCloseTo(261.7994, 4);
  });

  it("frustum, radii 5 cm and 9 cm, height 11 cm, holds 1739.39 cm³", () => {
    // Worked example: nickzom.org, "How to calculate … the volume of a conical frustum" (1739.39 cm³).
    expect(frustumVolume(5, 9, 11)).toBeCloseTo(1739.39, 1);
  });

  it("a hemisphere of radius 250 mm holds 32.72 L", () => {
    // (2/3)πr³ for r = 250 mm = 32 724 923 mm³ = 32.72 L.
    expect(sphericalCapVolume(250, 250) / 1e6).toBeCloseTo(32.72, 2);
    expect(((2 / 3) * Math.PI * 250 ** 3) / 1e6).toBeCloseTo(32.72, 2);
  });
});

describe("centroids", () => {
  it("a solid hemisphere's centroid is 3r/8 from its flat face", () => {
    // Standard statics tables (from memory): solid hemisphere, z̄ = 3r/8.
    expect(capCentroidFromCentre(8, 8)).toBeCloseTo(3, 12);
  });

  it("a frustum with a point top is a cone, centroid h/4 above the base", () => {
    // Standard statics tables (from memory): solid cone, z̄ = h/4 from the base.
    expect(frustumCentroidFromBase(3, 0, 12)).toBeCloseTo(3, 12);
    // A cylinder (equal radii) has its centroid at mid-height (symmetry).
    expect(frustumCentroidFromBase(4, 4, 10)).toBeCloseTo(5, 12);
  });
});

describe("the font model's capacity", () => {
  it("a = d = 250 mm (a hemispherical interior) holds 32.72 L", () => {
    // (2/3)πr³ with r = 250 mm; the flat and foot do not change the interior.
    const f = computeFontFigures({ ...defaultFontParameters, rimRadius: 250, depth: 250, flatRadius: 80 });
    expect(f.capacityLitres.toFixed(2)).toBe("32.72");
    expect(f.sphereRadiusMm).toBe(250);
  });
});
