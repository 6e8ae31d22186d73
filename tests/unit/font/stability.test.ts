/**
 * Tipping under a person leaning on the rim, against a hand calculation. For a rigid body of weight W
 * standing on a base whose nearest edge is b from the axis, a vertical load at radius r > b tips it when
 * it exceeds W·b/(r − b); a horizontal push at height h when it exceeds W·b/h (moments about the edge;
 * any statics text, e.g. Meriam & Kraige, Engineering Mechanics: Statics, equilibrium of rigid bodies).
 *
 * Demo font (see figures.test.ts for the masses): glass 57.9292 kg, working water 9.50189 kg, oak
 * pedestal 39.9208 kg; outer rim r = 313.079 mm; foot base b = 150 mm; pedestal 380 mm round, b = 190 mm;
 * rim 410.998 mm above the foot's base and 960.998 mm above the floor.
 */
import { describe, expect, it } from "vitest";
import { unit } from "mathjs";
import { computeFontFigures, defaultFontParameters as p, LEANING_DESIGN_LOAD, parseFontParameters } from "@/models/font";

const within1pc = (actual: number | null, expected: number) => {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) - expected) / expected).toBeLessThan(0.01);
};

describe("the load on the rim edge that tips the demo font", () => {
  const f = computeFontFigures(p);

  it("glass off an unfixed pedestal: 62.0 kgf full (working level), 53.3 kgf empty", () => {
    // full: 67.4311 × 150 / (313.079 − 150) = 67.4311 × 0.919799 = 62.023 kgf
    within1pc(f.rimLoadToTipKg.glassOffPedestalFull, 62.023);
    // empty: 57.9292 × 0.919799 = 53.283 kgf (the "about 53 kgf" worked by hand before)
    within1pc(f.rimLoadToTipKg.glassOffPedestalEmpty, 53.283);
  });

  it("to the brim the glass tips at about 72 kgf", () => {
    // (57.9292 + 20.2033) × 0.919799 = 71.866 kgf
    const brim = computeFontFigures({ ...p, workingDepthBelowRim: 0 });
    within1pc(brim.rimLoadToTipKg.glassOffPedestalFull, 71.866);
  });

  it("the whole font on an unfixed pedestal: 165.7 kgf full, 151.1 kgf empty", () => {
    // full: 107.352 × 190 / (313.079 − 190) = 107.352 × 1.543724 = 165.72 kgf
    within1pc(f.rimLoadToTipKg.wholeFontFull, 165.72);
    // empty: 97.8500 × 1.543724 = 151.05 kgf
    within1pc(f.rimLoadToTipKg.wholeFontEmpty, 151.05);
  });

  it("horizontal push at the rim", () => {
    // glass: 67.4311 × 150 / 410.998 = 24.610 kgf full; 57.9292 × 150 / 410.998 = 21.142 kgf empty
    within1pc(f.rimPushToTipKg.glassOffPedestalFull, 24.61);
    within1pc(f.rimPushToTipKg.glassOffPedestalEmpty, 21.142);
    // whole: 107.352 × 190 / 960.998 = 21.225 kgf full; 97.8500 × 190 / 960.998 = 19.346 kgf empty
    within1pc(f.rimPushToTipKg.wholeFontFull, 21.225);
    within1pc(f.rimPushToTipKg.wholeFontEmpty, 19.346);
  });

  it("a square pedestal tips about its nearest edge, half the side", () => {
    // 380 mm square solid oak: 0.38² × 0.55 × 640 = 50.829 kg; W full = 67.4311 + 50.829 = 118.260 kg
    // 118.260 × 190 / 123.079 = 182.56 kgf
    const sq = computeFontFigures({ ...p, pedestalShape: "square" });
    within1pc(sq.pedestalMassKg, 50.829);
    within1pc(sq.rimLoadToTipKg.wholeFontFull, 182.56);
  });

  it("a hollow pedestal weighs its walls only", () => {
    // round, 380 outside, 20 mm wall: π(0.19² − 0.17²)·0.55·640 = 7.9620 kg
    within1pc(computeFontFigures({ ...p, pedestalHollowWall: 20 }).pedestalMassKg, 7.962);
  });

  it("null where the joint is fixed, or where the rim lies within the base edge", () => {
    const fixed = computeFontFigures({ ...p, glassFixedToPedestal: true, pedestalFixedToFloor: true });
    expect(fixed.rimLoadToTipKg).toEqual({
      glassOffPedestalFull: null, glassOffPedestalEmpty: null, wholeFontFull: null, wholeFontEmpty: null,
    });
    // a pedestal 700 mm across puts its edge (350) outside the rim (313): it cannot tip that way
    const wide = computeFontFigures({ ...p, pedestalWidth: 700 });
    expect(wide.rimLoadToTipKg.wholeFontFull).toBeNull();
    expect(wide.rimLoadToTipKg.glassOffPedestalFull).not.toBeNull();
  });

  it("with no pedestal the foot stands on the floor and the whole font is the glass", () => {
    const r = parseFontParameters({ ...p, pedestalHeight: 0 });
    expect(r.ok).toBe(true);
    const g = computeFontFigures({ ...p, pedestalHeight: 0 });
    expect(g.pedestalMassKg).toBe(0);
    expect(g.rimLoadToTipKg.glassOffPedestalFull).toBeNull();
    within1pc(g.rimLoadToTipKg.wholeFontFull, 62.023); // the same sum as the glass off the pedestal
  });
});

describe("the plain-words advice against the stated leaning loads", () => {
  it("design loads in newtons and pounds-force, checked with mathjs", () => {
    // 75 kgf and 50 kgf: 735.5 N / 165.3 lbf and 490.3 N / 110.2 lbf
    expect(unit(LEANING_DESIGN_LOAD.verticalKgf, "kgf").toNumber("N")).toBeCloseTo(735.499, 2);
    expect(unit(LEANING_DESIGN_LOAD.horizontalKgf, "kgf").toNumber("lbf")).toBeCloseTo(110.231, 2);
    expect(LEANING_DESIGN_LOAD.verticalSource).toMatch(/from memory/);
  });

  it("the demo must be fixed at both joints, and the caution names a structural engineer", () => {
    const f = computeFontFigures(p);
    expect(f.fixing.glassMustBeFixed).toBe(true); // 53.3 kgf < 75 kgf
    expect(f.fixing.pedestalMustBeFixed).toBe(true); // push 19.3 kgf < 50 kgf
    expect(f.fixing.lines.join(" ")).toMatch(/pedestal must be fixed to the floor/);
    expect(f.fixing.lines.join(" ")).toMatch(/structural engineer .* local building code/);
    expect(f.fixing.lines.join(" ")).toMatch(/slow lean/);
  });

  it("fixing the pedestal takes its warning away", () => {
    const f = computeFontFigures({ ...p, pedestalFixedToFloor: true });
    expect(f.fixing.pedestalMustBeFixed).toBe(false);
    expect(f.fixing.lines.join(" ")).not.toMatch(/pedestal must be fixed/);
  });
});
