/**
 * Densities used for the mass figures. Values are nominal at room temperature.
 */

export const glassKinds = ["soda-lime", "low-iron", "borosilicate"] as const;
export type GlassKind = (typeof glassKinds)[number];

export interface GlassMaterial {
  kind: GlassKind;
  label: string;
  densityKgM3: number;
  source: string;
}

export const glassMaterials: Record<GlassKind, GlassMaterial> = {
  // EN 572-1 (Glass in building — basic soda-lime silicate glass products, part 1: definitions and
  // general physical and mechanical properties) gives 2500 kg/m³ for soda-lime silicate glass.
  "soda-lime": {
    kind: "soda-lime",
    label: "Soda-lime glass",
    densityKgM3: 2500,
    source: "EN 572-1, soda-lime silicate glass: 2500 kg/m³",
  },
  // Low-iron ("extra clear") glass is a soda-lime silicate glass with less iron oxide; EN 572-1 covers
  // it as soda-lime silicate glass, so the same nominal density is used. No separate published value
  // was found; treat this as the soda-lime figure applied to low-iron glass.
  "low-iron": {
    kind: "low-iron",
    label: "Low-iron soda-lime glass",
    densityKgM3: 2500,
    source: "taken as soda-lime silicate glass, EN 572-1: 2500 kg/m³",
  },
  // ISO 3585 (Borosilicate glass 3.3 — properties) gives a density of 2.23 g/cm³ at 20 °C; the same
  // value appears on makers' data sheets for borosilicate glass 3.3.
  borosilicate: {
    kind: "borosilicate",
    label: "Borosilicate glass 3.3",
    densityKgM3: 2230,
    source: "ISO 3585, borosilicate glass 3.3: 2.23 g/cm³ at 20 °C",
  },
};

// Pure air-free water at 20 °C and 101.325 kPa: 998.2071 kg/m³ in the standard density tables
// (e.g. the CRC Handbook of Chemistry and Physics table of water density); rounded to 998.2.
export const WATER_DENSITY_KG_M3 = 998.2;
export const WATER_DENSITY_SOURCE = "pure water at 20 °C: 998.2 kg/m³ (standard density tables)";
