import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defaultFontParameters as p, parseFontParameters } from "@/models/font";
import {
  candidateFromDraft,
  draftFromParams,
  draftProblems,
  editField,
  parseTyped,
  switchUnit,
} from "@/components/font/editor/draft";
import { validFontParams } from "./arbitraries";

describe("what the editor sends for validation", () => {
  it("the defaults round-trip through the entry fields", () => {
    const r = parseFontParameters(candidateFromDraft(draftFromParams(p, "mm")));
    expect(r.ok && r.params).toEqual(p);
  });

  it("switching mm → in → mm never drifts", () => {
    fc.assert(
      fc.property(validFontParams, (q) => {
        const d = switchUnit(switchUnit(draftFromParams(q, "mm"), "in"), "mm");
        expect(candidateFromDraft(d)).toEqual(candidateFromDraft(draftFromParams(q, "mm")));
      }),
      { numRuns: 100 },
    );
  });

  it("inches typed are stored as millimetres (1 in = 25.4 mm)", () => {
    const d = editField(draftFromParams(p, "in"), "depth", "6");
    expect(candidateFromDraft(d).depth).toBeCloseTo(152.4, 12);
  });

  it("shows converted inches to three places", () => {
    expect(switchUnit(draftFromParams(p, "mm"), "in").text.rimRadius).toBe("11.024"); // 280 / 25.4
  });

  it("accepts a decimal comma, and passes text that is not a number on for a clear message", () => {
    expect(parseTyped("12,5")).toBe(12.5);
    expect(parseTyped(" 40 ")).toBe(40);
    expect(parseTyped("")).toBeUndefined();
    expect(parseTyped("12 mm")).toBe("12 mm");
    const d = editField(draftFromParams(p, "mm"), "footHeight", "tall");
    const r = parseFontParameters(candidateFromDraft(d));
    expect(!r.ok && r.fieldErrors.footHeight).toEqual(["Foot height must be a number."]);
    const empty = parseFontParameters(candidateFromDraft(editField(d, "footHeight", "")));
    expect(!empty.ok && empty.fieldErrors.footHeight).toEqual(["Foot height is required."]);
  });

  // The figures print with a comma between thousands ("1,524 mm", en-GB grouping in Intl.NumberFormat
  // / CLDR), so a comma before exactly three digits is either a grouping or a decimal comma (de-DE
  // writes 1,2 for 1.2): ambiguous, refused with the field named; never guessed.
  it("refuses '1,200' for a height with a message naming the field; never reads it as 1.2 mm", () => {
    expect(parseTyped("1,200")).toBe("1,200");
    const d = editField(draftFromParams(p, "mm"), "pedestalHeight", "1,200");
    expect(draftProblems(d).pedestalHeight?.[0]).toBe(
      'Pedestal height: "1,200" could mean 1200 or 1.200. Type it without the comma (1200) or with a point (1.200).',
    );
    const r = parseFontParameters(candidateFromDraft(d));
    expect(r.ok).toBe(false);
  });

  it("refuses a comma and a point together, and grouped thousands", () => {
    expect(draftProblems(editField(draftFromParams(p, "mm"), "depth", "1,200.5")).depth?.[0]).toMatch(/^Depth: .*mixes a comma and a point/);
    expect(draftProblems(editField(draftFromParams(p, "mm"), "depth", "1,200,000")).depth?.[0]).toMatch(/^Depth: .*could mean/);
    expect(parseTyped("1,25")).toBe(1.25); // two digits after a comma cannot be a grouping
    expect(draftProblems(editField(draftFromParams(p, "mm"), "depth", "12,5"))).toEqual({});
  });
});
