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

type RowData = [label: string, value: ReactNode, basis: string];

function engravingRows(f: Figures, L: (mm: number) => string): RowData[] {
  const n = f.engravings.length;
  if (n === 0) return [["Engravings", "None", "No engravings in this form"]];
  return [
    ["Number", formatNumber(n, 0), "Spaced evenly round the bowl"],
    [
      "Angles from the datum",
      formatList(f.engravings.map((e) => formatAngle(e.angleDeg))),
      "Anticlockwise seen from above",
    ],
    [
      "Spacing between centres",
      f.engravingArcSpacingMm === null ? "—" : L(f.engravingArcSpacingMm),
      "Along the circle through the centres",
    ],
  ];
}

/** Each figure with its value in the chosen units and how it was found, in the groups shown. */
function figureGroups(f: Figures, units: LengthUnit): { title: string; rows: RowData[] }[] {
  const L = (mm: number) => formatLength(mm, units);
  const M = (kg: number) => formatMass(kg, units);
  const glassOf = (cm3: number) => `${formatVolumeCm3(cm3, units)} of glass`;
  return [
    {
      title: "Bowl",
      rows: [
        ["Capacity, full to the brim", formatCapacity(f.capacityLitres, units), "Interior spherical cap"],
        ["Capacity at the working level", formatCapacity(f.workingCapacityLitres, units), "Water standing at the level set below the rim"],
        ["Across the outside of the rim", L(2 * f.outerRimRadiusMm), "Where the outer sphere meets the rim"],
        ["Rim height above the floor", L(f.rimHeightMm), "Pedestal, foot and bowl stacked"],
        ["Glass under the interior", L(f.glassUnderInteriorMm), "Wall less the cap ground off for the flat"],
        [
          "Lamination contact area",
          formatArea(f.laminationAreaCm2, units),
          "The smaller of the flat and the foot's top",
        ],
      ],
    },
    {
      title: "Weights",
      rows: [
        ["Bowl glass", M(f.bowlMassKg), glassOf(f.bowlGlassVolumeCm3)],
        ["Foot glass", M(f.footMassKg), glassOf(f.footGlassVolumeCm3)],
        ["Water when full", M(f.waterMassKg), "Water at 20 °C"],
        ["Filled weight", M(f.filledMassKg), "Glass and water to the brim; the pedestal is not included"],
        ["Pedestal", M(f.pedestalMassKg), "Its material's density times its volume"],
        ["Whole font, at the working level", M(f.totalMassKg), "Glass, pedestal and water at the working level"],
      ],
    },
    {
      title: "Standing",
      rows: [
        ["Centre of mass of the glass", L(f.centreOfMassHeightMm), "Height above the floor, glass and water at the working level"],
        ["Tip-over angle of the glass", formatAngle(f.tipAngleDeg), "Tilt at which it passes the foot's edge; a slow lean (water moves)"],
        ["Centre of mass of the whole font", L(f.wholeFontCentreOfMassHeightMm), "Pedestal included, water at the working level"],
        ["Tip-over angle of the whole font", formatAngle(f.wholeFontTipAngleDeg), "Tilt at which it passes the pedestal's base edge; a slow lean"],
        [
          "Pressure under the foot",
          formatPressure(f.bearingPressureKPa, units),
          "Filled weight over the foot's base area",
        ],
      ],
    },
    { title: "Engravings", rows: engravingRows(f, L) },
  ];
}

/** The derived figures of a font, with units and how each was found. */
export function FontFigures({
  figures: f,
  units,
  showCautions = true,
  stale = false,
  className = "",
}: FontFiguresProps) {
  const glass = glassMaterials[f.glass];
  return (
    <div className={`grid gap-4 font-sans ${stale ? "opacity-60" : ""} ${className}`} data-testid="font-figures">
      <div className="grid gap-4 md:grid-cols-2">
        {figureGroups(f, units).map((g) => (
          <Group key={g.title} title={g.title}>
            {g.rows.map(([label, value, basis]) => (
              <Row key={label} label={label} value={value} basis={basis} />
            ))}
          </Group>
        ))}
      </div>
      {f.rimLoadToTipKg && <StabilityFigures figures={f} />}
      <p className="text-xs text-ink-soft">
        Densities used: {glass?.label ?? "glass"}, {formatNumber(f.glassDensityKgM3, 0)} kg/m³ (
        {glass?.source ?? "nominal"}); {WATER_DENSITY_SOURCE}.
      </p>
      {showCautions && <FontCautions />}
    </div>
  );
}

export default FontFigures;
