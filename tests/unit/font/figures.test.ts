/**
 * The demo font's figures against numbers worked by hand (closed forms from any engineering handbook's
 * table of solids, e.g. Roark's Formulas for Stress and Strain, table of properties of solids; or
 * Eric Weisstein, MathWorld, "Spherical Cap"). Each expected value is a literal, not a call into the
 * model.
 *
 * The demo: rim radius a = 280, depth d = 150, wall t = 28, flat f = 110, foot 150 → 110 radius and
 * 250 tall, pedestal 550 tall, low-iron glass 2500 kg/m³ (EN 572-1), water 998.2 kg/m³ (20 °C).
 *
 *   R  = (a² + d²)/2d = (78 400 + 22 500)/300 = 336.333 mm;  Ro = R + t = 364.333 mm
 *   flat cap h = Ro − √(Ro² − f²) = 364.333 − √(132 738.8 − 12 100) = 17.0024 mm
 *   rim height = 550 + 250 − 17.0024 + 150 + 28 = 960.998 mm
 *   outer rim radius = √(Ro² − (R − d)²) = √(132 738.8 − 34 720.1) = 313.079 mm
 *   brim water = πd²(3R − d)/3 = π·22 500·859/3 = 20.2397 L
 *   bowl glass = cap(Ro, 178) − cap(R, 150) − cap(Ro, 17.0024) = 9 793.71 cm³ → 24.4843 kg
 *   foot = πh(R² + Rr + r²)/3 = π·250·(22 500 + 16 500 + 12 100)/3 = 13 377.95 cm³ → 33.4449 kg
 *   working water, 50 mm below the rim: a cap of height 100 of the same sphere,
 *     π·100²·(3·336.333 − 100)/3 = 9.51903 L → 9.50189 kg; its surface radius √(R² − (R − 100)²) = 239.305 mm
 *   pedestal: solid oak, 380 mm round, 550 tall: π·0.19²·0.55 m³ × 640 kg/m³ (EN 338 D30 mean) = 39.9208 kg
 */
import { describe, expect, it } from "vitest";
import { computeFontFigures, defaultFontParameters as p, modelFont } from "@/models/font";

const f = computeFontFigures(p);
const within = (actual: number, expected: number, rel: number) =>
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThan(rel);

describe("figures of the demo font against a hand calculation", () => {
  it("sphere, rim and flat", () => {
    within(f.sphereRadiusMm, 336.3333, 1e-6);
    within(f.flatCapHeightMm, 17.0024, 1e-5);
    within(f.rimHeightMm, 960.998, 1e-6);
    within(f.outerRimRadiusMm, 313.0793, 1e-6);
    within(f.glassUnderInteriorMm, 28 - 17.0024, 1e-5);
  });

  it("capacity to the brim and at the working level", () => {
    within(f.capacityLitres, 20.2397, 1e-5);
    within(f.workingCapacityLitres, 9.51903, 1e-5);
    within(f.workingWaterMassKg, 9.50189, 1e-5);
  });

  it("glass volumes and masses", () => {
    within(f.bowlGlassVolumeCm3, 9793.71, 1e-6);
    within(f.footGlassVolumeCm3, 13377.95, 1e-6);
    within(f.bowlMassKg, 24.4843, 1e-5);
    within(f.footMassKg, 33.4449, 1e-5);
    within(f.filledMassKg, 24.4843 + 33.4449 + 20.2397 * 0.9982, 1e-5);
  });

  it("pedestal mass and total", () => {
    within(f.pedestalMassKg, 39.9208, 1e-5);
    within(f.totalMassKg, 57.9292 + 9.50189 + 39.9208, 1e-5);
  });

  it("centre of mass and tip angles, water at the working level", () => {
    // bowl centroid 881.512 mm (caps' centroids 3(2ρ − h)²/4(3ρ − h) below the centre at 1147.331),
    // foot 550 + 250·(22 500 + 33 000 + 36 300)/(4·51 100) = 662.280, working water 876.748
    // glass + water: (24.4843·881.512 + 33.4449·662.280 + 9.50189·876.748)/67.4310 = 772.105 mm
    within(f.centreOfMassHeightMm, 772.105, 1e-5);
    // tips when it passes the foot's edge: atan(150 / (772.105 − 550)) = 34.033°
    within(f.tipAngleDeg, 34.0334, 1e-5);
    // whole font: add the pedestal's 39.9208 kg at 275 mm: 587.247 mm; atan(190 / 587.247) = 17.929°
    within(f.wholeFontCentreOfMassHeightMm, 587.247, 1e-5);
    within(f.wholeFontTipAngleDeg, 17.9287, 1e-5);
  });

  it("bearing pressure under the foot, full to the brim", () => {
    // (57.9292 + 20.2033) kg × 9.80665 / (π·0.15²) / 1000 = 10.840 kPa
    within(f.bearingPressureKPa, 10.840, 1e-4);
  });

  it("lamination area is π·min(flat, foot top)²", () => {
    within(f.laminationAreaCm2, (Math.PI * 110 ** 2) / 100, 1e-12); // 380.13 cm²
    within(computeFontFigures({ ...p, footTopRadius: 90 }).laminationAreaCm2, 254.469, 1e-5);
  });

  it("borosilicate weighs 2230/2500 of soda-lime for the same form (ISO 3585 vs EN 572-1)", () => {
    within(computeFontFigures({ ...p, glass: "borosilicate" }).bowlMassKg, 24.4843 * 0.892, 1e-5);
  });

  it("a parameter set saved before the pedestal fields existed reads with the stated defaults", () => {
    const { pedestalShape: _s, pedestalWidth: _w, pedestalMaterial: _m, pedestalHollowWall: _h, glassFixedToPedestal: _g,
      pedestalFixedToFloor: _p, workingDepthBelowRim: _d, ...old } = p;
    const m = modelFont(old as typeof p);
    expect(m.params.pedestalWidth).toBe(380);
    expect(m.params.workingDepthBelowRim).toBe(50);
    expect(m.params.pedestalFixedToFloor).toBe(false);
    within(m.figures.pedestalMassKg, 39.9208, 1e-5);
  });
});
