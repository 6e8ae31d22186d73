import type { ReactNode } from "react";
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

export interface FontFiguresProps {
  figures: Figures;
  units: LengthUnit;
  /** show the cautions beside the figures (default true) */
  showCautions?: boolean;
  /** dim the figures, e.g. while the entered values do not yet make a valid form */
  stale?: boolean;
  className?: string;
}

function Row({ label, value, basis }: { label: string; value: ReactNode; basis: string }) {
  return (
    <div className="border-line grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 border-b py-2 last:border-b-0">
      <dt className="text-ink">{label}</dt>
      <dd className="text-ink text-right font-semibold tabular-nums">{value}</dd>
      <dd className="text-ink-soft col-span-2 text-xs">{basis}</dd>
    </div>
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="border-line bg-card rounded-lg border p-4">
      <h3 className="mb-1 font-serif text-lg font-semibold">{title}</h3>
      <dl className="text-sm">{children}</dl>
    </section>
  );
}

/** The derived figures of a font, with units and how each was found. */
export function FontFigures({
  figures: f,
  units,
  showCautions = true,
  stale = false,
  className = "",
}: FontFiguresProps) {
  const L = (mm: number) => formatLength(mm, units);
  const M = (kg: number) => formatMass(kg, units);
  const glass = glassMaterials[f.glass];
  const n = f.engravings.length;
  return (
    <div className={`grid gap-4 font-sans ${stale ? "opacity-60" : ""} ${className}`} data-testid="font-figures">
      <div className="grid gap-4 md:grid-cols-2">
        <Group title="Bowl">
          <Row
            label="Capacity, full to the brim"
            value={formatCapacity(f.capacityLitres, units)}
            basis="Interior spherical cap"
          />
          <Row
            label="Across the outside of the rim"
            value={L(2 * f.outerRimRadiusMm)}
            basis="Where the outer sphere meets the rim"
          />
          <Row label="Rim height above the floor" value={L(f.rimHeightMm)} basis="Pedestal, foot and bowl stacked" />
          <Row
            label="Glass under the interior"
            value={L(f.glassUnderInteriorMm)}
            basis="Wall less the cap ground off for the flat"
          />
          <Row
            label="Lamination contact area"
            value={formatArea(f.laminationAreaCm2, units)}
            basis="The smaller of the flat and the foot's top"
          />
        </Group>
        <Group title="Weights">
          <Row
            label="Bowl glass"
            value={M(f.bowlMassKg)}
            basis={`${formatVolumeCm3(f.bowlGlassVolumeCm3, units)} of glass`}
          />
          <Row
            label="Foot glass"
            value={M(f.footMassKg)}
            basis={`${formatVolumeCm3(f.footGlassVolumeCm3, units)} of glass`}
          />
          <Row label="Water when full" value={M(f.waterMassKg)} basis="Water at 20 °C" />
          <Row label="Filled weight" value={M(f.filledMassKg)} basis="Glass and water; the pedestal is not included" />
        </Group>
        <Group title="Standing">
          <Row
            label="Centre of mass, full"
            value={L(f.centreOfMassHeightMm)}
            basis="Height above the floor, glass and water"
          />
          <Row
            label="Tip-over angle"
            value={formatAngle(f.tipAngleDeg)}
            basis="Tilt at which the centre of mass passes the foot's edge"
          />
          <Row
            label="Pressure under the foot"
            value={formatPressure(f.bearingPressureKPa, units)}
            basis="Filled weight over the foot's base area"
          />
        </Group>
        <Group title="Engravings">
          {n === 0 ? (
            <Row label="Engravings" value="None" basis="No engravings in this form" />
          ) : (
            <>
              <Row label="Number" value={formatNumber(n, 0)} basis="Spaced evenly round the bowl" />
              <Row
                label="Angles from the datum"
                value={formatList(f.engravings.map((e) => formatAngle(e.angleDeg)))}
                basis="Anticlockwise seen from above"
              />
              <Row
                label="Spacing between centres"
                value={f.engravingArcSpacingMm === null ? "—" : L(f.engravingArcSpacingMm)}
                basis="Along the circle through the centres"
              />
            </>
          )}
        </Group>
      </div>
      <p className="text-ink-soft text-xs">
        Densities used: {glass?.label ?? "glass"}, {formatNumber(f.glassDensityKgM3, 0)} kg/m³ (
        {glass?.source ?? "nominal"}); {WATER_DENSITY_SOURCE}.
      </p>
      {showCautions && <FontCautions />}
    </div>
  );
}

export default FontFigures;
