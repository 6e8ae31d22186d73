import { describe, expect, it } from "vitest";
import { demoStudioSettings, studioSettingsSchema } from "@/models/font";
import { draftFromSettings, entryFromMm, move, payloadFromDraft, switchUnit, typed } from "@/components/studio/draft";

describe("the studio settings form's entries", () => {
  it("the demo settings round-trip through the form unchanged", () => {
    const out = studioSettingsSchema.parse(payloadFromDraft(draftFromSettings(demoStudioSettings, "mm")));
    expect(out).toEqual(demoStudioSettings);
  });

  it("switching mm → in → mm never drifts", () => {
    const d = switchUnit(switchUnit(draftFromSettings(demoStudioSettings, "mm"), "in"), "mm");
    expect(payloadFromDraft(d)).toEqual(payloadFromDraft(draftFromSettings(demoStudioSettings, "mm")));
  });

  it("shows 1.524 mm per turn as 0.06 in (a common setting: 0.060 in per turn)", () => {
    expect(entryFromMm(1.524, "in", "downfeed").text).toBe("0.06");
  });

  it("stores a downfeed typed in inches as millimetres (1 in = 25.4 mm)", () => {
    const d = draftFromSettings(demoStudioSettings, "in");
    d.machines[0].downfeed = typed("0.060");
    const out = payloadFromDraft(d) as { machines: { downfeedPerTurnMm: number }[] };
    expect(out.machines[0].downfeedPerTurnMm).toBeCloseTo(1.524, 12);
  });

  it("passes text that is not a number on for the server to refuse by field", () => {
    const d = draftFromSettings(demoStudioSettings, "mm");
    d.machines[0].downfeed = typed("about one");
    const r = studioSettingsSchema.safeParse(payloadFromDraft(d));
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({ path: ["machines", 0, "downfeedPerTurnMm"], message: "Downfeed per turn must be a number." });
  });

  it("moves a stage by one place and not off the ends", () => {
    expect(move([1, 2, 3], 0, 1)).toEqual([2, 1, 3]);
    expect(move([1, 2, 3], 0, -1)).toEqual([1, 2, 3]);
    expect(move([1, 2, 3], 2, 1)).toEqual([1, 2, 3]);
  });
});
