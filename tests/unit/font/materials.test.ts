import { describe, expect, it } from "vitest";
import { glassMaterials, WATER_DENSITY_KG_M3 } from "@/models/font";

describe("densities against their cited standard values", () => {
  it("soda-lime silicate glass is 2500 kg/m³ (EN 572-1)", () => {
    expect(glassMaterials["soda-lime"].densityKgM3).toBe(2500);
    expect(glassMaterials["soda-lime"].source).toMatch(/EN 572-1/);
  });

  it("low-iron glass is taken as soda-lime silicate glass (EN 572-1)", () => {
    expect(glassMaterials["low-iron"].densityKgM3).toBe(glassMaterials["soda-lime"].densityKgM3);
  });

  it("borosilicate glass 3.3 is 2.23 g/cm³ (ISO 3585)", () => {
    expect(glassMaterials.borosilicate.densityKgM3).toBe(2230);
    expect(glassMaterials.borosilicate.source).toMatch(/ISO 3585/);
  });

  it("water at 20 °C is 998.2 kg/m³ (standard tables list 998.2071)", () => {
    expect(WATER_DENSITY_KG_M3).toBeCloseTo(998.2071, 1);
  });
});
