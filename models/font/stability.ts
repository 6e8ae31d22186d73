/**
 * Will it tip? A rigid body of weight W standing on a base tips about the base's nearest edge (at b
 * from the axis) when a load at radius r > b gives a larger moment: a vertical load V tips it when
 * V·(r − b) > W·b, so V = W·b/(r − b); a horizontal push H at height h above the base tips it when
 * H·h > W·b, so H = W·b/h. Masses in kg give loads in kilograms-force.
 *
 * Water is treated as a liquid: at the first moment of tipping nothing has moved, so the loads hold;
 * but the tip angles assume the water stays where it is, which is only true for a slow lean.
 */

/** A person leaning on the rim: design loads compared with the tipping loads (from memory, see source). */
export const LEANING_DESIGN_LOAD = {
  /** vertical, at the outer rim edge */
  verticalKgf: 75,
  verticalSource:
    "a person's weight leaning on the edge, as furniture overturning tests use (EN 1730, tables; from memory): 75 kgf, about 735 N",
  /** horizontal, at the rim */
  horizontalKgf: 50,
  horizontalSource:
    "EN 1991-1-1 Table 6.12, barriers in areas where people may gather: about 0.5 kN per metre, taken on one metre of rim (from memory): 50 kgf, about 490 N",
} as const;

export const FIXING_CAUTION =
  "How the glass is fixed to the pedestal and the pedestal to the floor is for a structural engineer to design under the local building code.";

export interface TipCase {
  glassOffPedestalFull: number | null;
  glassOffPedestalEmpty: number | null;
  wholeFontFull: number | null;
  wholeFontEmpty: number | null;
}

export interface TipInput {
  glassMassKg: number;
  workingWaterMassKg: number;
  pedestalMassKg: number;
  outerRimRadiusMm: number;
  footBaseRadiusMm: number;
  /** nearest base edge of the whole font */
  wholeTipRadiusMm: number;
  /** rim above the foot's base, and above the floor */
  rimAboveFootBaseMm: number;
  rimAboveFloorMm: number;
  hasPedestal: boolean;
  glassFixedToPedestal: boolean;
  pedestalFixedToFloor: boolean;
}

/** Vertical load at radius r that tips weight W about an edge at b; null when r ≤ b (it cannot tip). */
export const verticalTipLoad = (w: number, b: number, r: number): number | null => (r > b ? (w * b) / (r - b) : null);
/** Horizontal push at height h that tips weight W about an edge at b. */
export const horizontalTipLoad = (w: number, b: number, h: number): number | null => (h > 0 ? (w * b) / h : null);

function cases(t: TipInput, load: (w: number, b: number, glass: boolean) => number | null): TipCase {
  const glass = !t.hasPedestal || t.glassFixedToPedestal;
  const whole = t.pedestalFixedToFloor;
  const gFull = t.glassMassKg + t.workingWaterMassKg;
  const allFull = gFull + t.pedestalMassKg;
  const allEmpty = t.glassMassKg + t.pedestalMassKg;
  return {
    glassOffPedestalFull: glass ? null : load(gFull, t.footBaseRadiusMm, true),
    glassOffPedestalEmpty: glass ? null : load(t.glassMassKg, t.footBaseRadiusMm, true),
    wholeFontFull: whole ? null : load(allFull, t.wholeTipRadiusMm, false),
    wholeFontEmpty: whole ? null : load(allEmpty, t.wholeTipRadiusMm, false),
  };
}

/** The vertical load on the outer rim edge that starts each tipping, kgf. */
export function rimLoadsToTip(t: TipInput): TipCase {
  return cases(t, (w, b) => verticalTipLoad(w, b, t.outerRimRadiusMm));
}

/** The horizontal push at the rim that starts each tipping, kgf. */
export function rimPushesToTip(t: TipInput): TipCase {
  return cases(t, (w, b, glass) => horizontalTipLoad(w, b, glass ? t.rimAboveFootBaseMm : t.rimAboveFloorMm));
}

const smallest = (...v: (number | null)[]) => {
  const n = v.filter((x): x is number => x !== null);
  return n.length ? Math.min(...n) : null;
};

export interface FixingAdvice {
  glassMustBeFixed: boolean;
  pedestalMustBeFixed: boolean;
  /** the joints the parameters say are fixed (no pedestal counts as the glass fixed) */
  glassFixed: boolean;
  pedestalFixed: boolean;
  /** plain sentences: what must be fixed and why, then the caution */
  lines: string[];
}

/** Which joints must be fixed, compared with the leaning design loads, in plain words. */
export function fixingAdvice(
  loads: TipCase,
  pushes: TipCase,
  fixed: { glassFixed: boolean; pedestalFixed: boolean },
): FixingAdvice {
  const d = LEANING_DESIGN_LOAD;
  const fails = (v: number | null, h: number | null) =>
    (v !== null && v < d.verticalKgf) || (h !== null && h < d.horizontalKgf);
  const glassV = smallest(loads.glassOffPedestalFull, loads.glassOffPedestalEmpty);
  const glassH = smallest(pushes.glassOffPedestalFull, pushes.glassOffPedestalEmpty);
  const wholeV = smallest(loads.wholeFontFull, loads.wholeFontEmpty);
  const wholeH = smallest(pushes.wholeFontFull, pushes.wholeFontEmpty);
  const glassMustBeFixed = fails(glassV, glassH);
  const pedestalMustBeFixed = fails(wholeV, wholeH);
  const lines: string[] = [];
  if (glassMustBeFixed)
    lines.push("The glass must be fixed to the pedestal: a person leaning on the rim could tip it off.");
  if (pedestalMustBeFixed)
    lines.push("The pedestal must be fixed to the floor: a person leaning on the rim could tip the whole font over.");
  if (!glassMustBeFixed && !pedestalMustBeFixed)
    lines.push("Against the leaning loads below, nothing that is left loose would tip.");
  lines.push(FIXING_CAUTION);
  lines.push("The tipping angles with water assume a slow lean: water moves when the font is jolted.");
  return { glassMustBeFixed, pedestalMustBeFixed, ...fixed, lines };
}
