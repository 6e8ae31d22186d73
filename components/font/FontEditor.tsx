"use client";

/**
 * The font's parameter editor: sizes in millimetres or inches, each field's errors beside it, and the
 * 3D view, the figures and the cold-working plan following every change. Each change is evaluated
 * once (parameters, profile, figures) and the plan is made from that same profile; the views below
 * only read the result. Reused by the revision pages (onChange, readOnly, inputName for a form post).
 */
import { useDeferredValue, useId, useMemo, useState } from "react";
import {
  defaultFontParameters,
  demoStudioSettings,
  fontFields,
  formatCapacity,
  formatMass,
  modelFont,
  planColdWorking,
  type FontFieldErrors,
  type FontFigures as Figures,
  type FontModel,
  type FontParameters,
  type LengthUnit,
  type StudioSettings,
} from "@/models/font";
import { FontViewer } from "./FontViewer";
import { FontFigures } from "./FontFigures";
import { FontFieldInput } from "./editor/FontFieldInput";
import { PlanSection, type PlanChoice } from "./editor/PlanSection";
import { UnitChoice } from "./editor/UnitChoice";
import { editField, switchUnit, type DraftState } from "./editor/draft";
import { useFontDraft, useReportChange } from "./editor/useFontDraft";

export interface FontEditorProps {
  /** the form to start from; defaults to a plausible demo font */
  initialParams?: FontParameters;
  /** the studio's machines, abrasive sets and stock; defaults to the demo studio's */
  studioSettings?: StudioSettings;
  initialUnits?: LengthUnit;
  /**
   * Called after every change. When `valid` is false the entry has a problem and `params` are the last
   * valid ones, so nothing half-typed ever escapes.
   */
  onChange?: (params: FontParameters, valid: boolean) => void;
  readOnly?: boolean;
  /** when set, a hidden input of this name carries the valid parameters as JSON (for form posts) */
  inputName?: string;
  /** an older form drawn faintly in the 3D view */
  ghostParams?: FontParameters | null;
}

const groups: { key: (typeof fontFields)[number]["group"]; title: string }[] = [
  { key: "bowl", title: "Bowl" },
  { key: "foot", title: "Foot" },
  { key: "pedestal", title: "Pedestal" },
  { key: "water", title: "Water" },
  { key: "glass", title: "Glass" },
  { key: "engravings", title: "Engravings" },
];

function StatusLine({ errorCount, figures, unit }: { errorCount: number; figures: Figures | null; unit: LengthUnit }) {
  return (
    <p className="text-sm" role="status" data-testid="font-status">
      {errorCount > 0 ? (
        <span className="font-medium text-danger">
          {errorCount === 1 ? "One value needs" : `${errorCount} values need`} attention. The picture and figures show
          the last form that worked.
        </span>
      ) : figures ? (
        <span className="text-ink-soft">
          Holds {formatCapacity(figures.capacityLitres, unit)}; weighs {formatMass(figures.filledMassKg, unit)} when
          full.
        </span>
      ) : null}
    </p>
  );
}

interface FieldGroupsProps {
  idPrefix: string;
  draft: DraftState;
  errors: FontFieldErrors;
  readOnly: boolean;
  update: (change: (d: DraftState) => DraftState) => void;
}

function FieldGroups({ idPrefix, draft, errors, readOnly, update }: FieldGroupsProps) {
  return groups.map((g) => (
    <fieldset key={g.key} className="mb-4 rounded-lg border border-line bg-card px-4 pt-3">
      <legend className="px-1 font-serif text-lg font-semibold">{g.title}</legend>
      {fontFields
        .filter((f) => f.group === g.key)
        .map((f) => (
          <FontFieldInput
            key={f.name}
            field={f}
            idPrefix={idPrefix}
            value={draft.text[f.name]}
            unit={draft.unit}
            errors={errors[f.name]}
            readOnly={readOnly}
            onChange={(v) => update((d) => editField(d, f.name, v))}
          />
        ))}
    </fieldset>
  ));
}

function FiguresSection({ idPrefix, figures, unit, stale }: { idPrefix: string; figures: Figures; unit: LengthUnit; stale: boolean }) {
  return (
    <section aria-labelledby={`${idPrefix}-figures`}>
      <h2 id={`${idPrefix}-figures`} className="mb-3 font-serif text-xl font-semibold">
        Figures
      </h2>
      <FontFigures figures={figures} units={unit} stale={stale} />
    </section>
  );
}

/** The ghost form is worked out once, when it changes (not on every keystroke). */
function useGhost(ghostParams: FontParameters | null | undefined) {
  return useMemo(() => (ghostParams ? modelFont(ghostParams) : null), [ghostParams]);
}

/** The plan for the shown form, made from its profile (not worked out again) for the chosen machine and set. */
function usePlan(params: FontParameters, studioSettings: StudioSettings, model: FontModel | null) {
  const [choice, setChoice] = useState<PlanChoice>({
    machineId: studioSettings.machines[0]?.id ?? "",
    abrasiveSetId: studioSettings.abrasiveSets[0]?.id ?? "",
  });
  const plan = useMemo(
    () => planColdWorking(params, studioSettings, choice, model?.profile), // validates both; never throws
    [params, studioSettings, choice, model],
  );
  return { plan, choice, setChoice };
}

export function FontEditor({
  initialParams = defaultFontParameters,
  studioSettings = demoStudioSettings,
  initialUnits = "mm",
  onChange,
  readOnly = false,
  inputName,
  ghostParams,
}: FontEditorProps) {
  const idPrefix = useId();
  const { draft, evaluation, lastValid, update } = useFontDraft(initialParams, initialUnits);
  const shownParams = lastValid?.params ?? initialParams;
  const { plan, choice, setChoice } = usePlan(shownParams, studioSettings, lastValid);
  const viewerModel = useDeferredValue(lastValid);
  const ghost = useGhost(ghostParams);
  useReportChange(onChange, shownParams, evaluation.ok);

  const unit = draft.unit;
  const errors = evaluation.ok ? {} : evaluation.fieldErrors;
  const formErrors = evaluation.ok ? [] : evaluation.formErrors;
  return (
    <div
      className="grid items-start gap-6 font-sans lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]"
      data-testid="font-editor"
    >
      {/* On a phone the picture comes first, so a change can be seen as it is made. */}
      <div className="grid min-w-0 content-start gap-3 lg:col-start-2 lg:row-start-1">
        {viewerModel && <FontViewer model={viewerModel} ghost={ghost} units={unit} />}
        <StatusLine errorCount={Object.keys(errors).length + formErrors.length} figures={lastValid?.figures ?? null} unit={unit} />
      </div>
      <form
        className="min-w-0 lg:col-start-1 lg:row-span-2 lg:row-start-1"
        onSubmit={(e) => e.preventDefault()}
        noValidate
        aria-label="Font parameters"
      >
        <UnitChoice name={`${idPrefix}-unit`} unit={unit} onChange={(u) => update((d) => switchUnit(d, u))} />
        <FieldGroups idPrefix={idPrefix} draft={draft} errors={errors} readOnly={readOnly} update={update} />
        {formErrors.length > 0 && <p className="text-sm font-medium text-danger">{formErrors.join(" ")}</p>}
        {inputName && <input type="hidden" name={inputName} value={JSON.stringify(shownParams)} />}
      </form>
      <div className="grid min-w-0 content-start gap-5 lg:col-start-2 lg:row-start-2">
        {lastValid && <FiguresSection idPrefix={idPrefix} figures={lastValid.figures} unit={unit} stale={!evaluation.ok} />}
        <PlanSection {...{ idPrefix, plan, unit, studioSettings, choice }} onChoose={setChoice} />
      </div>
    </div>
  );
}

export default FontEditor;
