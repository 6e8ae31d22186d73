/**
 * The derived figures of a font. Volumes and centroids come from integrating the lathe profile (the
 * same outline the 3D mesh is built from); see integrate.ts.
 */
import { engravingLayout, type EngravingPosition } from "./engravings";
import { integrateOutline } from "./integrate";
import { glassMaterials, WATER_DENSITY_KG_M3, type GlassKind } from "./materials";
import { fontProfile, type FontProfile } from "./profile";
import { pedestalMassKg as pedestalMass, wholeFontTipRadiusMm } from "./pedestal";
import { fixingAdvice, rimLoadsToTip, rimPushesToTip, type FixingAdvice, type TipCase } from "./stability";
import { radToDeg, STANDARD_GRAVITY } from "./units";
import type { FontParameters } from "./types";

export interface FontFigures {
  /** to the brim */
  capacityLitres: number;
  /** to the working level (workingDepthBelowRim below the rim) */
  workingCapacityLitres: number;
  workingWaterMassKg: number;
  pedestalMassKg: number;
  /** glass, pedestal and water at the working level */
  totalMassKg: number;
  /** whole font (pedestal included), water at the working level: height above the floor */
  wholeFontCentreOfMassHeightMm: number;
  /** tilt at which the whole font's centre of mass passes the pedestal's base edge */
  wholeFontTipAngleDeg: number;
  /** vertical load on the outer rim edge that starts each tipping, kgf; null where fixed or it cannot tip */
  rimLoadToTipKg: TipCase;
  /** horizontal push at the rim that starts each tipping, kgf */
  rimPushToTipKg: TipCase;
  fixing: FixingAdvice;
  bowlGlassVolumeCm3: number;
  footGlassVolumeCm3: number;
  bowlMassKg: number;
  footMassKg: number;
  waterMassKg: number;
  filledMassKg: number;
  outerRimRadiusMm: number;
  rimHeightMm: number;
  centreOfMassHeightMm: number;
  tipAngleDeg: number;
  bearingPressureKPa: number;
  laminationAreaCm2: number;
  engravings: EngravingPosition[];
  engravingArcSpacingMm: number | null;
  /** supporting values, shown beside the figures */
  glass: GlassKind;
  glassDensityKgM3: number;
  sphereRadiusMm: number;
  flatCapHeightMm: number;
  glassUnderInteriorMm: number;
  engravingCircleRadiusMm: number;
}

const MM3_PER_CM3 = 1000;
const MM3_PER_LITRE = 1e6;
const MM3_PER_M3 = 1e9;

/**
 * Figures for parameters that passed fontParametersSchema. For raw input use evaluateFont, which
 * validates first and never throws. An optional profile already built from the same parameters can be
 * passed to skip rebuilding it.
 */
export function computeFontFigures(params: FontParameters, profile?: FontProfile): FontFigures {
  const prof = profile ?? fontProfile(params);
  const g = prof.geometry;
  const density = glassMaterials[params.glass]?.densityKgM3 ?? glassMaterials["soda-lime"].densityKgM3;

  const bowl = integrateOutline(prof.bowl.segments);
  const foot = integrateOutline(prof.foot.segments);
  const water = integrateOutline(prof.brimWater.segments);
  const working = integrateOutline(prof.water.segments);

  const bowlMassKg = (bowl.volume / MM3_PER_M3) * density;
  const footMassKg = (foot.volume / MM3_PER_M3) * density;
  const waterMassKg = (water.volume / MM3_PER_M3) * WATER_DENSITY_KG_M3;
  const filledMassKg = bowlMassKg + footMassKg + waterMassKg;
  const workingWaterMassKg = (working.volume / MM3_PER_M3) * WATER_DENSITY_KG_M3;
  const glassMassKg = bowlMassKg + footMassKg;
  const pedestalMassKg = pedestalMass(params);
  const totalMassKg = glassMassKg + workingWaterMassKg + pedestalMassKg;

  const glassMoment = bowlMassKg * bowl.centroidZ + footMassKg * foot.centroidZ + workingWaterMassKg * working.centroidZ;
  const centreOfMassHeightMm = glassMoment / (glassMassKg + workingWaterMassKg);
  const tipAngleDeg = radToDeg(Math.atan2(params.footBaseRadius, centreOfMassHeightMm - g.footBaseZ));
  const wholeFontCentreOfMassHeightMm = (glassMoment + (pedestalMassKg * params.pedestalHeight) / 2) / totalMassKg;
  const wholeTip = wholeFontTipRadiusMm(params);
  const wholeFontTipAngleDeg = radToDeg(Math.atan2(wholeTip, wholeFontCentreOfMassHeightMm));

  const baseAreaM2 = Math.PI * (params.footBaseRadius / 1000) ** 2;
  const bearingPressureKPa = (filledMassKg * STANDARD_GRAVITY) / baseAreaM2 / 1000;

  const tip = {
    glassMassKg, workingWaterMassKg, pedestalMassKg,
    outerRimRadiusMm: g.outerRimRadius, footBaseRadiusMm: params.footBaseRadius, wholeTipRadiusMm: wholeTip,
    rimAboveFootBaseMm: g.rimZ - g.footBaseZ, rimAboveFloorMm: g.rimZ, hasPedestal: params.pedestalHeight > 0,
    glassFixedToPedestal: params.glassFixedToPedestal, pedestalFixedToFloor: params.pedestalFixedToFloor,
  };
  const rimLoadToTipKg = rimLoadsToTip(tip);
  const rimPushToTipKg = rimPushesToTip(tip);

  const contact = Math.min(params.flatRadius, params.footTopRadius);
  const layout = engravingLayout(params, g);

  return {
    capacityLitres: water.volume / MM3_PER_LITRE,
    workingCapacityLitres: working.volume / MM3_PER_LITRE,
    workingWaterMassKg,
    pedestalMassKg,
    totalMassKg,
    wholeFontCentreOfMassHeightMm,
    wholeFontTipAngleDeg,
    rimLoadToTipKg,
    rimPushToTipKg,
    fixing: fixingAdvice(rimLoadToTipKg, rimPushToTipKg, {
      glassFixed: !tip.hasPedestal || params.glassFixedToPedestal,
      pedestalFixed: params.pedestalFixedToFloor,
    }),
    bowlGlassVolumeCm3: bowl.volume / MM3_PER_CM3,
    footGlassVolumeCm3: foot.volume / MM3_PER_CM3,
    bowlMassKg,
    footMassKg,
    waterMassKg,
    filledMassKg,
    outerRimRadiusMm: g.outerRimRadius,
    rimHeightMm: g.rimZ,
    centreOfMassHeightMm,
    tipAngleDeg,
    bearingPressureKPa,
    laminationAreaCm2: (Math.PI * contact * contact) / 100,
    engravings: layout.engravings,
    engravingArcSpacingMm: layout.arcSpacingMm,
    glass: params.glass,
    glassDensityKgM3: density,
    sphereRadiusMm: g.sphereRadius,
    flatCapHeightMm: g.flatCapHeight,
    glassUnderInteriorMm: g.glassUnderInterior,
    engravingCircleRadiusMm: layout.circleRadiusMm,
  };
}
