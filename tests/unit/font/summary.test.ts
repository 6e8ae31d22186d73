import { describe, expect, it } from "vitest";
import { computeFontFigures, defaultFontParameters as p, describeFont, formatLength, formatMass } from "@/models/font";

describe("the text summary and number formatting", () => {
  it("describes the form in plain words with its key sizes", () => {
    const text = describeFont(p, computeFontFigures(p), "mm");
    expect(text).toMatch(/rim stands 961 mm above the floor/);
    expect(text).toMatch(/560 mm across the inside/);
    expect(text).toMatch(/Three engravings sit 45 mm below the rim, at 90°, 210° and 330°/);
    expect(text).toMatch(/holds about 20\.2 L/);
  });

  it("speaks inches when asked", () => {
    const text = describeFont(p, computeFontFigures(p), "in");
    expect(text).toMatch(/22\.05 in across the inside/); // 560 / 25.4 = 22.047
    expect(text).toMatch(/lb/);
  });

  it("formats lengths and masses with their units", () => {
    expect(formatLength(1524, "mm")).toBe("1,524 mm");
    expect(formatLength(25.4, "in")).toBe("1 in");
    expect(formatMass(45.359237, "in")).toBe("100 lb");
    expect(formatLength(Number.NaN, "mm")).toBe("— mm");
  });
});
