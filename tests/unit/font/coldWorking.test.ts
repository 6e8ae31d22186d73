import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import {
  computeFontFigures,
  defaultFontParameters as p,
  demoStudioSettings as s,
  planColdWorking,
  studioSettingsSchema,
  type ColdWorkingPlan,
  type StudioSettings,
} from "@/models/font";

function plan(params: unknown = p, settings: unknown = s, choice = {}): ColdWorkingPlan {
  const r = planColdWorking(params, settings, choice);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r;
}

describe("the cold-working plan", () => {
  it("the demo settings are valid", () => {
    expect(studioSettingsSchema.safeParse(s).success).toBe(true);
  });

  it("works the four surfaces, in order, with their areas", () => {
    const r = plan();
    expect(r.surfaces.map((x) => x.surface)).toEqual(["footBase", "footTop", "bowlFlat", "rim"]);
    const f = computeFontFigures(p);
    const [base, top, flat, rim] = r.surfaces;
    expect(base.areaCm2).toBeCloseTo((Math.PI * 150 ** 2) / 100, 9);
    expect(top.areaCm2).toBeCloseTo((Math.PI * 110 ** 2) / 100, 9);
    expect(flat.areaCm2).toBeCloseTo((Math.PI * 110 ** 2) / 100, 9);
    expect(rim.areaCm2).toBeCloseTo((Math.PI * (f.outerRimRadiusMm ** 2 - 280 ** 2)) / 100, 9);
  });

  it("lists three grinding then three polishing stages, each finer than the last (common practice)", () => {
    const stages = plan().surfaces[0].stages;
    expect(stages.map((x) => x.kind)).toEqual(["grind", "grind", "grind", "polish", "polish", "polish"]);
    expect(stages.map((x) => x.label)).toEqual(["FEPA F 80", "FEPA F 220", "FEPA F 400", "600 mesh", "1500 mesh", "3000 mesh"]);
    expect(stages.map((x) => x.order)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it("turns of the handwheel = stock / downfeed per turn (0.060 in = 1.524 mm per turn, a common setting)", () => {
    const perTurn = unit(0.06, "inch").toNumber("mm"); // mathjs as the independent conversion
    const r = plan();
    expect(r.machine.downfeedPerTurnMm).toBeCloseTo(perTurn, 12);
    expect(r.surfaces[0].handwheelTurns).toBeCloseTo(3 / perTurn, 12); // 3 mm of stock ≈ 1.97 turns
  });

  it("the bowl flat's stock includes the cap ground off to make the flat", () => {
    const flat = plan().surfaces[2];
    const f = computeFontFigures(p);
    expect(flat.formMm).toBeCloseTo(f.flatCapHeightMm, 12);
    expect(flat.stockMm).toBeCloseTo(2 + f.flatCapHeightMm, 12);
  });

  it("uses the chosen machine and abrasive set, and notes an unknown choice", () => {
    const r = plan(p, s, { machineId: "bench-lap", abrasiveSetId: "diamond-wheels" });
    expect(r.machine.id).toBe("bench-lap");
    expect(r.surfaces[0].handwheelTurns).toBeCloseTo(3 / 0.5, 12);
    expect(r.abrasiveSet.id).toBe("diamond-wheels");
    const unknown = plan(p, s, { machineId: "nope" });
    expect(unknown.machine.id).toBe("flatbed");
    expect(unknown.notes[0]).toMatch(/nope/);
  });

  it("marks out the engravings by angle and arc along the rim from the datum", () => {
    const r = plan(p);
    expect(r.engravingMarks.map((m) => m.angleDeg)).toEqual([90, 210, 330]);
    // arc length s = rθ (θ in radians) round the outer edge of the rim
    expect(r.engravingMarks[1].arcFromDatumMm).toBeCloseTo(r.rimOuterRadiusMm * ((210 * Math.PI) / 180), 9);
    expect(r.rimCircumferenceMm).toBeCloseTo(2 * Math.PI * r.rimOuterRadiusMm, 9);
  });
});

describe("bad settings are refused by field, never thrown", () => {
  it("names the setting that is wrong", () => {
    const bad: StudioSettings = structuredClone(s);
    bad.machines[0].downfeedPerTurnMm = 0;
    bad.abrasiveSets[0].stages[1].grit = 60; // coarser than the F 80 before it
    const r = planColdWorking(p, bad);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const fields = r.problems.map((x) => x.field);
    expect(fields).toContain("studioSettings.machines.0.downfeedPerTurnMm");
    expect(fields).toContain("studioSettings.abrasiveSets.0.stages.1.grit");
  });

  it("grinding after polishing is refused", () => {
    const bad: StudioSettings = structuredClone(s);
    bad.abrasiveSets[0].stages.push({ kind: "grind", grit: 5000, gritScale: "mesh" });
    const r = studioSettingsSchema.safeParse(bad);
    expect(r.success).toBe(false);
  });

  it("any input at all gets an answer", () => {
    fc.assert(
      fc.property(fc.anything(), fc.anything(), (a, b) => {
        const r = planColdWorking(a, b);
        expect(r.ok).toBe(false);
      }),
      { numRuns: 300 },
    );
  });

  it("bad font parameters are named too", () => {
    const r = planColdWorking({ ...p, depth: -1 }, s);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toEqual({ field: "depth", message: "Depth must be more than 0." });
  });
});
