import { describe, expect, it } from "vitest";
import { computeFontFigures, defaultFontParameters as p } from "@/models/font";
import { attachmentChanges, compareValue, figureRows, formatChange, parameterRows } from "@/components/compare/diff";

describe("changes between two revisions, in words", () => {
  it("says a longer depth with a plus and the unit", () => {
    const rows = parameterRows(p, { ...p, depth: p.depth + 12 }, "mm");
    const depth = rows.find((r) => r.key === "depth")!;
    expect(depth).toMatchObject({ older: "150 mm", newer: "162 mm", change: "+12 mm", direction: "more" });
    expect(rows.filter((r) => r.change)).toHaveLength(1);
  });

  it("uses a true minus sign for less", () => {
    expect(formatChange("mass", -1.8, "mm")).toBe("−1.8 kg");
    expect(formatChange("length", -120, "mm")).toBe("−120 mm");
  });

  it("gives the change in inches when inches are chosen (1 in = 25.4 mm, exact)", () => {
    expect(formatChange("length", 25.4, "in")).toBe("+1 in");
    expect(formatChange("length", 12.7, "in")).toBe("+0.5 in");
  });

  it("gives the change in pounds when inches are chosen (1 lb = 0.45359237 kg, exact)", () => {
    expect(formatChange("mass", 0.45359237 * 10, "in")).toBe("+10 lb");
  });

  it("never shows a change as zero", () => {
    expect(formatChange("length", 0.0001, "mm")).toBe("+less than 0.001 mm");
  });

  it("treats floating-point noise as no change", () => {
    expect(compareValue("x", "X", "length", 0.1 + 0.2, 0.3, "mm").change).toBeNull();
  });

  it("names a change of glass without a sign", () => {
    const glass = parameterRows(p, { ...p, glass: "borosilicate" }, "mm").find((r) => r.key === "glass")!;
    expect(glass).toMatchObject({ older: "Low-iron soda-lime glass", newer: "Borosilicate glass 3.3", change: "Changed" });
  });

  it("carries a deeper bowl into the figures: more capacity and weight, nothing else about the foot", () => {
    const rows = figureRows(computeFontFigures(p), computeFontFigures({ ...p, depth: 170 }), "mm");
    const by = (k: string) => rows.find((r) => r.key === k)!;
    expect(by("capacityLitres").direction).toBe("more");
    expect(by("filledMassKg").change).toMatch(/^\+/);
    expect(by("footMassKg").change).toBeNull();
    expect(by("glassDensityKgM3").change).toBeNull();
  });

  it("shows a missing figure as a dash", () => {
    const rows = figureRows(null, computeFontFigures(p), "mm");
    expect(rows[0].older).toBe("—");
    expect(rows[0].change).not.toBeNull();
  });
});

describe("attachments matched by SHA-256", () => {
  const f = (sha256: string, name = sha256) => ({ sha256, name, kind: "png" });
  it("a renamed file is the same file; new and dropped files are listed", () => {
    const r = attachmentChanges([f("aa", "plan.png"), f("bb")], [f("aa", "plan-v2.png"), f("cc")]);
    expect(r.kept.map((x) => x.name)).toEqual(["plan-v2.png"]);
    expect(r.added.map((x) => x.sha256)).toEqual(["cc"]);
    expect(r.removed.map((x) => x.sha256)).toEqual(["bb"]);
  });
});
