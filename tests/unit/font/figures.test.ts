import { describe, expect, it } from "vitest";
import {
  capCentroidFromCentre,
  capHeightForBase,
  capSphereRadius,
  computeFontFigures,
  defaultFontParameters as p,
  frustumCentroidFromBase,
  frustumVolume,
  sphericalCapVolume,
} from "@/models/font";

// A hand calculation of the default font from the closed forms, step by step.
const R = capSphereRadius(p.rimRadius, p.depth); // (a² + d²)/2d
const Ro = R + p.wallThickness;
const hFlat = capHeightForBase(Ro, p.flatRadius); // Ro − √(Ro² − f²)
const rimZ = p.pedestalHeight + p.footHeight - hFlat + p.depth + p.wallThickness;
const centreZ = rimZ - p.depth + R;
const waterMm3 = sphericalCapVolume(R, p.depth);
const bowlMm3 = sphericalCapVolume(Ro, p.depth + p.wallThickness) - waterMm3 - sphericalCapVolume(Ro, hFlat);
const footMm3 = frustumVolume(p.footBaseRadius, p.footTopRadius, p.footHeight);

const f = computeFontFigures(p);

describe("figures of the default font against a hand calculation", () => {
  it("sphere radius from R = (a² + d²)/2d", () => {
    expect(f.sphereRadiusMm).toBeCloseTo((280 ** 2 + 150 ** 2) / 300, 9);
  });

  it("capacity, glass volumes and masses", () => {
    expect(f.capacityLitres).toBeCloseTo(waterMm3 / 1e6, 9);
    expect(f.bowlGlassVolumeCm3).toBeCloseTo(bowlMm3 / 1000, 6);
    expect(f.footGlassVolumeCm3).toBeCloseTo(footMm3 / 1000, 6);
    // low-iron glass at 2500 kg/m³ (EN 572-1), water at 998.2 kg/m³
    expect(f.bowlMassKg).toBeCloseTo((bowlMm3 / 1e9) * 2500, 9);
    expect(f.footMassKg).toBeCloseTo((footMm3 / 1e9) * 2500, 9);
    expect(f.waterMassKg).toBeCloseTo(f.capacityLitres * 0.9982, 9);
    expect(f.filledMassKg).toBeCloseTo(f.bowlMassKg + f.footMassKg + f.waterMassKg, 9);
  });

  it("rim height and outer rim radius", () => {
    expect(f.rimHeightMm).toBeCloseTo(rimZ, 9);
    // exterior sphere meets the rim plane (R − d below the centre) at √(Ro² − (R − d)²)
    expect(f.outerRimRadiusMm).toBeCloseTo(Math.sqrt(Ro ** 2 - (R - p.depth) ** 2), 9);
  });

  it("centre of mass, tip angle and bearing pressure", () => {
    // bowl centroid: exterior cap minus interior cap minus flat cap, each about the same centre
    const m = (v: number, h: number, rho: number) => v * (centreZ - capCentroidFromCentre(rho, h));
    const bowlMoment =
      m(sphericalCapVolume(Ro, p.depth + p.wallThickness), p.depth + p.wallThickness, Ro) -
      m(waterMm3, p.depth, R) -
      m(sphericalCapVolume(Ro, hFlat), hFlat, Ro);
    const bowlZ = bowlMoment / bowlMm3;
    const footZ = p.pedestalHeight + frustumCentroidFromBase(p.footBaseRadius, p.footTopRadius, p.footHeight);
    const waterZ = centreZ - capCentroidFromCentre(R, p.depth);
    const com = (f.bowlMassKg * bowlZ + f.footMassKg * footZ + f.waterMassKg * waterZ) / f.filledMassKg;
    expect(f.centreOfMassHeightMm).toBeCloseTo(com, 6);
    // tilt at which the centre of mass passes over the base's edge
    const tip = (Math.atan(p.footBaseRadius / (com - p.pedestalHeight)) * 180) / Math.PI;
    expect(f.tipAngleDeg).toBeCloseTo(tip, 6);
    // full weight (g = 9.80665 m/s²) over the foot's base area, in kPa
    expect(f.bearingPressureKPa).toBeCloseTo((f.filledMassKg * 9.80665) / (Math.PI * 0.15 ** 2) / 1000, 9);
  });

  it("lamination area is π·min(flat, foot top)²", () => {
    expect(f.laminationAreaCm2).toBeCloseTo((Math.PI * 110 ** 2) / 100, 9);
    const wider = computeFontFigures({ ...p, footTopRadius: 90 });
    expect(wider.laminationAreaCm2).toBeCloseTo((Math.PI * 90 ** 2) / 100, 9);
  });

  it("glass left under the interior is the wall less the flat's cap", () => {
    expect(f.glassUnderInteriorMm).toBeCloseTo(p.wallThickness - hFlat, 9);
    expect(f.glassUnderInteriorMm).toBeGreaterThanOrEqual(5);
  });

  it("borosilicate weighs 2230/2500 of soda-lime for the same form (ISO 3585 vs EN 572-1)", () => {
    const b = computeFontFigures({ ...p, glass: "borosilicate" });
    expect(b.bowlMassKg / f.bowlMassKg).toBeCloseTo(2230 / 2500, 12);
  });
});
