/**
 * The pedestal the glass stands on: its shape, size and material, and so its mass and centre of mass.
 * A hollow pedestal is taken as four (or one round) walls of the given thickness, open at top and
 * bottom: the boards that close it are left out, which errs light — the safe side for tipping.
 */

export const pedestalShapes = ["round", "square"] as const;
export type PedestalShape = (typeof pedestalShapes)[number];

export const pedestalMaterialKeys = ["oak", "ash", "limestone", "granite"] as const;
export type PedestalMaterialKey = (typeof pedestalMaterialKeys)[number];

export interface PedestalMaterial {
  key: PedestalMaterialKey;
  label: string;
  densityKgM3: number;
  source: string;
}

// Timbers: EN 338 (structural timber — strength classes) gives a mean density for each hardwood
// class; oak is commonly graded D30 and ash D35 (from memory). Class means sit at the light end of
// seasoned oak and ash (about 650–750 kg/m³), which is the safe side for tipping.
// Stone: EN 1991-1-1 Annex A (densities of construction materials) gives ranges for natural stone;
// the values below sit inside them (from memory).
export const pedestalMaterials: Record<PedestalMaterialKey, PedestalMaterial> = {
  oak: { key: "oak", label: "Oak", densityKgM3: 640, source: "EN 338 class D30 mean density, 640 kg/m³ (from memory)" },
  ash: { key: "ash", label: "Ash", densityKgM3: 650, source: "EN 338 class D35 mean density, 650 kg/m³ (from memory)" },
  limestone: {
    key: "limestone",
    label: "Limestone",
    densityKgM3: 2300,
    source: "EN 1991-1-1 Annex A, limestone 20–29 kN/m³; 2300 kg/m³ taken (from memory)",
  },
  granite: {
    key: "granite",
    label: "Granite",
    densityKgM3: 2700,
    source: "EN 1991-1-1 Annex A, granite 27–30 kN/m³; 2700 kg/m³ taken (from memory)",
  },
};

export interface PedestalSize {
  pedestalHeight: number;
  pedestalShape: PedestalShape;
  pedestalWidth: number;
  pedestalMaterial: PedestalMaterialKey;
  pedestalHollowWall: number;
}

/** Plan area of the pedestal's material, mm²: the whole footprint, or its walls when hollow. */
export function pedestalSectionAreaMm2(p: PedestalSize): number {
  const w = p.pedestalWidth;
  const t = p.pedestalHollowWall;
  const full = (s: number) => (p.pedestalShape === "square" ? s * s : (Math.PI * s * s) / 4);
  if (t <= 0 || 2 * t >= w) return full(w);
  return full(w) - full(w - 2 * t);
}

/** Mass in kg (0 when there is no pedestal); its centre of mass is half-way up. */
export function pedestalMassKg(p: PedestalSize): number {
  if (p.pedestalHeight <= 0) return 0;
  const density = pedestalMaterials[p.pedestalMaterial]?.densityKgM3 ?? pedestalMaterials.oak.densityKgM3;
  return ((pedestalSectionAreaMm2(p) * p.pedestalHeight) / 1e9) * density;
}

/**
 * Distance from the axis to the edge the font tips about: the radius of a round base, half the side of
 * a square one (its nearest edge). With no pedestal the foot stands on the floor: its base radius.
 */
export function wholeFontTipRadiusMm(p: PedestalSize & { footBaseRadius: number }): number {
  if (p.pedestalHeight <= 0) return p.footBaseRadius;
  return p.pedestalWidth / 2;
}
