/**
 * The cold-working plan: each worked surface with its area, the stages of the chosen abrasive set in
 * order, the stock to remove and the downfeed as handwheel turns, plus the engraving marking-out list.
 * Never throws: unusable input comes back as problems that name the field.
 */
import { fontParametersSchema } from "./schema";
import { fontProfile, type FontProfile } from "./profile";
import { engravingAngles } from "./engravings";
import { degToRad } from "./units";
import {
  coldWorkedSurfaceLabel,
  coldWorkedSurfaces,
  studioSettingsSchema,
  type AbrasiveStage,
  type ColdWorkedSurface,
  type Machine,
} from "./studio";

export interface ColdWorkingChoice {
  machineId?: string;
  abrasiveSetId?: string;
}

export interface PlannedStage extends AbrasiveStage {
  order: number;
  /** e.g. "FEPA F 220" */
  label: string;
}

export interface PlannedSurface {
  surface: ColdWorkedSurface;
  label: string;
  areaCm2: number;
  /** the studio's usual stock for this surface */
  allowanceMm: number;
  /** glass the design itself removes here (the cap ground off to make the bowl's flat) */
  formMm: number;
  /** allowance + form */
  stockMm: number;
  handwheelTurns: number;
  stages: PlannedStage[];
}

export interface EngravingMark {
  index: number;
  angleDeg: number;
  /** distance along the outer edge of the rim from the datum mark, anticlockwise seen from above */
  arcFromDatumMm: number;
  dropBelowRimMm: number;
}

export interface ColdWorkingProblem {
  field: string;
  message: string;
}

export interface ColdWorkingPlan {
  ok: true;
  machine: Machine;
  abrasiveSet: { id: string; name: string };
  surfaces: PlannedSurface[];
  engravingMarks: EngravingMark[];
  rimOuterRadiusMm: number;
  rimCircumferenceMm: number;
  /** plain notes, e.g. that a chosen machine was not found and the first was used */
  notes: string[];
}

export type ColdWorkingResult = ColdWorkingPlan | { ok: false; problems: ColdWorkingProblem[] };

function problemsFrom(prefix: string, issues: { path: PropertyKey[]; message: string }[]): ColdWorkingProblem[] {
  return issues.map((i) => ({
    field: [prefix, ...i.path.map(String)].filter(Boolean).join("."),
    message: i.message,
  }));
}

/** "600 mesh" for the mesh scale, otherwise the scale then the number, e.g. "FEPA F 220". */
export function gritLabel(st: Pick<AbrasiveStage, "grit" | "gritScale">): string {
  return st.gritScale.toLowerCase() === "mesh" ? `${st.grit} mesh` : `${st.gritScale} ${st.grit}`;
}

/**
 * A profile already built from the same parameters (e.g. a FontModel's) can be passed to skip
 * rebuilding it.
 */
export function planColdWorking(
  params: unknown,
  studioSettings: unknown,
  choice: ColdWorkingChoice = {},
  profile?: FontProfile,
): ColdWorkingResult {
  const p = fontParametersSchema.safeParse(params);
  const s = studioSettingsSchema.safeParse(studioSettings);
  if (!p.success || !s.success) {
    return {
      ok: false,
      problems: [
        ...(p.success ? [] : problemsFrom("", p.error.issues)),
        ...(s.success ? [] : problemsFrom("studioSettings", s.error.issues)),
      ],
    };
  }
  const params_ = p.data;
  const settings = s.data;
  const notes: string[] = [];

  let machine = settings.machines.find((m) => m.id === choice.machineId);
  if (!machine) {
    if (choice.machineId) notes.push(`Machine "${choice.machineId}" was not found; using ${settings.machines[0].name}.`);
    machine = settings.machines[0];
  }
  let set = settings.abrasiveSets.find((a) => a.id === choice.abrasiveSetId);
  if (!set) {
    if (choice.abrasiveSetId) notes.push(`Abrasive set "${choice.abrasiveSetId}" was not found; using ${settings.abrasiveSets[0].name}.`);
    set = settings.abrasiveSets[0];
  }
  const stages: PlannedStage[] = set.stages.map((st, i) => ({ ...st, order: i + 1, label: gritLabel(st) }));

  const g = (profile ?? fontProfile(params_)).geometry;
  const areaMm2: Record<ColdWorkedSurface, number> = {
    footBase: Math.PI * params_.footBaseRadius ** 2,
    footTop: Math.PI * params_.footTopRadius ** 2,
    bowlFlat: Math.PI * params_.flatRadius ** 2,
    rim: Math.PI * (g.outerRimRadius ** 2 - params_.rimRadius ** 2),
  };
  const formMm: Record<ColdWorkedSurface, number> = { footBase: 0, footTop: 0, bowlFlat: g.flatCapHeight, rim: 0 };

  const surfaces = coldWorkedSurfaces.map((surface): PlannedSurface => {
    const allowanceMm = settings.defaultStockMm[surface];
    const stockMm = allowanceMm + formMm[surface];
    return {
      surface,
      label: coldWorkedSurfaceLabel[surface],
      areaCm2: areaMm2[surface] / 100,
      allowanceMm,
      formMm: formMm[surface],
      stockMm,
      handwheelTurns: stockMm / machine.downfeedPerTurnMm,
      stages,
    };
  });

  const rimR = g.outerRimRadius;
  const engravingMarks = engravingAngles(params_.engravingCount, params_.engravingStartAngle).map((angleDeg, index) => ({
    index,
    angleDeg,
    arcFromDatumMm: rimR * degToRad(angleDeg),
    dropBelowRimMm: params_.engravingDrop,
  }));

  return {
    ok: true,
    machine,
    abrasiveSet: { id: set.id, name: set.name },
    surfaces,
    engravingMarks,
    rimOuterRadiusMm: rimR,
    rimCircumferenceMm: 2 * Math.PI * rimR,
    notes,
  };
}
