import {
  formatAngle,
  formatArea,
  formatCapacity,
  formatLength,
  formatList,
  formatMass,
  formatNumber,
  formatPressure,
  formatVolumeCm3,
  glassMaterials,
  WATER_DENSITY_SOURCE,
  type FontFigures as Figures,
  type LengthUnit,
} from "@/models/font";
import { FontCautions } from "./FontCautions";
import { Group, Row } from "./FigureRows";
import { StabilityFigures } from "./StabilityFigures";

export interface FontFiguresProps {
  figures: Figures;
  units: LengthUnit;
  /** show the cautions beside the figures (default true) */
  showCautions?: boolean;
  /** dim the figures, e.g. while the entered values do not yet make a valid form */
  stale?: boolean;
  className?: string;
}

/** The derived figures of a font, with units and how each was found. */
export function FontFigures({ figures: f, units, showCautions = true, stale = false, className = "" }: FontFiguresProps) {
  const L = (mm: number) => formatLength(mm, units);
  const M = (kg: number) => formatMass(kg, units);
  const glass = glassMaterials[f.glass];
  const n = f.engravings.length;
  return (
    <div
      className={`grid gap-4 font-sans ${stale ? "opacity-60" : ""} ${className}`}
      data-testid="font-figures"
    >
      <div className="grid gap-4 md:grid-cols-2">
        <Group title="Bowl">
          <Row label="Capacity, full to the brim" value={formatCapacity(f.capacityLitres, units)} basis="Interior spherical cap" />
          <Row label="Capacity at the working level" value={formatCapacity(f.workingCapacityLitres, units)} basis="Water standing at the level set below the rim" />
          <Row label="Across the outside of the rim" value={L(2 * f.outerRimRadiusMm)} basis="Where the outer sphere meets the rim" />
          <Row label="Rim height above the floor" value={L(f.rimHeightMm)} basis="Pedestal, foot and bowl stacked" />
          <Row label="Glass under the interior" value={L(f.glassUnderInteriorMm)} basis="Wall less the cap ground off for the flat" />
          <Row label="Lamination contact area" value={formatArea(f.laminationAreaCm2, units)} basis="The smaller of the flat and the foot's top" />
        </Group>
        <Group title="Weights">
          <Row label="Bowl glass" value={M(f.bowlMassKg)} basis={`${formatVolumeCm3(f.bowlGlassVolumeCm3, units)} of glass`} />
          <Row label="Foot glass" value={M(f.footMassKg)} basis={`${formatVolumeCm3(f.footGlassVolumeCm3, units)} of glass`} />
          <Row label="Water when full" value={M(f.waterMassKg)} basis="Water at 20 °C" />
          <Row label="Filled weight" value={M(f.filledMassKg)} basis="Glass and water to the brim; the pedestal is not included" />
          <Row label="Pedestal" value={M(f.pedestalMassKg)} basis="Its material's density times its volume" />
          <Row label="Whole font, at the working level" value={M(f.totalMassKg)} basis="Glass, pedestal and water at the working level" />
        </Group>
        <Group title="Standing">
          <Row label="Centre of mass of the glass" value={L(f.centreOfMassHeightMm)} basis="Height above the floor, glass and water at the working level" />
          <Row label="Tip-over angle of the glass" value={formatAngle(f.tipAngleDeg)} basis="Tilt at which it passes the foot's edge; a slow lean (water moves)" />
          <Row label="Centre of mass of the whole font" value={L(f.wholeFontCentreOfMassHeightMm)} basis="Pedestal included, water at the working level" />
          <Row label="Tip-over angle of the whole font" value={formatAngle(f.wholeFontTipAngleDeg)} basis="Tilt at which it passes the pedestal's base edge; a slow lean" />
          <Row label="Pressure under the foot" value={formatPressure(f.bearingPressureKPa, units)} basis="Filled weight over the foot's base area" />
        </Group>
        <Group title="Engravings">
          {n === 0 ? (
            <Row label="Engravings" value="None" basis="No engravings in this form" />
          ) : (
            <>
              <Row label="Number" value={formatNumber(n, 0)} basis="Spaced evenly round the bowl" />
              <Row label="Angles from the datum" value={formatList(f.engravings.map((e) => formatAngle(e.angleDeg)))} basis="Anticlockwise seen from above" />
              <Row label="Spacing between centres" value={f.engravingArcSpacingMm === null ? "—" : L(f.engravingArcSpacingMm)} basis="Along the circle through the centres" />
            </>
          )}
        </Group>
      </div>
      {f.rimLoadToTipKg && <StabilityFigures figures={f} />}
      <p className="text-xs text-ink-soft">
        Densities used: {glass?.label ?? "glass"}, {formatNumber(f.glassDensityKgM3, 0)} kg/m³ ({glass?.source ?? "nominal"}); {WATER_DENSITY_SOURCE}.
      </p>
      {showCautions && <FontCautions />}
    </div>
  );
}

export default FontFigures;
