"use client";

/**
 * The font's parameter editor: sizes in millimetres or inches, each field's errors beside it, and the
 * 3D view, the figures and the cold-working plan following every change. Reused by the revision pages
 * (onChange, readOnly, inputName for a form post).
 */
import { useDeferredValue, useEffect, useId, useMemo, useRef, useState } from "react";
import {
  defaultFontParameters,
  demoStudioSettings,
  evaluateFont,
  fontFields,
  formatCapacity,
  formatMass,
  planColdWorking,
  type FontParameters,
  type LengthUnit,
  type StudioSettings,
} from "@/models/font";
import { FontViewer } from "./FontViewer";
import { FontFigures } from "./FontFigures";
import { ColdWorkingPlanView } from "./ColdWorkingPlanView";
import { FontFieldInput } from "./editor/FontFieldInput";
import { candidateFromDraft, draftFromParams, editField, switchUnit, type DraftState } from "./editor/draft";

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
  { key: "glass", title: "Glass" },
  { key: "engravings", title: "Engravings" },
];

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
  const [state, setState] = useState(() => {
    const draft = draftFromParams(initialParams, initialUnits);
    const evaluation = evaluateFont(candidateFromDraft(draft));
    return { draft, evaluation, lastValid: evaluation.ok ? evaluation : null };
  });
  const update = (change: (d: DraftState) => DraftState) =>
    setState((s) => {
      const draft = change(s.draft);
      const evaluation = evaluateFont(candidateFromDraft(draft));
      return { draft, evaluation, lastValid: evaluation.ok ? evaluation : s.lastValid };
    });
  const { draft, evaluation, lastValid } = state;
  const [machineId, setMachineId] = useState(studioSettings.machines[0]?.id ?? "");
  const [abrasiveSetId, setAbrasiveSetId] = useState(studioSettings.abrasiveSets[0]?.id ?? "");

  const shownParams = lastValid?.params ?? initialParams;
  const shownFigures = lastValid?.figures ?? null;
  const viewerParams = useDeferredValue(shownParams);

  const plan = useMemo(
    () => planColdWorking(shownParams, studioSettings, { machineId, abrasiveSetId }), // validates both; never throws
    [shownParams, studioSettings, machineId, abrasiveSetId],
  );

  const onChangeRef = useRef(onChange);
  useEffect(() => {
    onChangeRef.current = onChange;
  });
  useEffect(() => {
    onChangeRef.current?.(shownParams, evaluation.ok);
  }, [shownParams, evaluation.ok]);

  const unit = draft.unit;
  const errors = evaluation.ok ? {} : evaluation.fieldErrors;
  const formErrors = evaluation.ok ? [] : evaluation.formErrors;
  const errorCount = Object.keys(errors).length + formErrors.length;

  return (
    <div
      className="grid items-start gap-6 font-sans lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]"
      data-testid="font-editor"
    >
      {/* On a phone the picture comes first, so a change can be seen as it is made. */}
      <div className="grid min-w-0 content-start gap-3 lg:col-start-2 lg:row-start-1">
        {lastValid && <FontViewer params={viewerParams} ghostParams={ghostParams} units={unit} />}
        <p className="text-sm" role="status" data-testid="font-status">
          {errorCount > 0 ? (
            <span className="font-medium text-danger">
              {errorCount === 1 ? "One value needs" : `${errorCount} values need`} attention. The picture and figures show the
              last form that worked.
            </span>
          ) : shownFigures ? (
            <span className="text-ink-soft">
              Holds {formatCapacity(shownFigures.capacityLitres, unit)}; weighs {formatMass(shownFigures.filledMassKg, unit)} when
              full.
            </span>
          ) : null}
        </p>
      </div>

      <form className="min-w-0 lg:col-start-1 lg:row-span-2 lg:row-start-1" onSubmit={(e) => e.preventDefault()} noValidate aria-label="Font parameters">
        <fieldset className="mb-5">
          <legend className="mb-2 text-sm font-medium text-ink">Enter sizes in</legend>
          <div className="inline-flex rounded-md border border-line bg-card p-1">
            {(["mm", "in"] as const).map((u) => (
              <label
                key={u}
                className={`flex min-h-11 min-w-28 cursor-pointer items-center justify-center rounded px-3 text-sm font-medium ${
                  unit === u ? "bg-action text-action-ink" : "text-action"
                } has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-action`}
              >
                <input
                  type="radio"
                  name={`${idPrefix}-unit`}
                  value={u}
                  checked={unit === u}
                  onChange={() => update((d) => switchUnit(d, u))}
                  className="sr-only"
                />
                {u === "mm" ? "Millimetres" : "Inches"}
              </label>
            ))}
          </div>
        </fieldset>

        {groups.map((g) => (
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
                  unit={unit}
                  errors={errors[f.name]}
                  readOnly={readOnly}
                  onChange={(v) => update((d) => editField(d, f.name, v))}
                />
              ))}
          </fieldset>
        ))}
        {formErrors.length > 0 && <p className="text-sm font-medium text-danger">{formErrors.join(" ")}</p>}
        {inputName && <input type="hidden" name={inputName} value={JSON.stringify(shownParams)} />}
      </form>

      <div className="grid min-w-0 content-start gap-5 lg:col-start-2 lg:row-start-2">
        {shownFigures && (
          <section aria-labelledby={`${idPrefix}-figures`}>
            <h2 id={`${idPrefix}-figures`} className="mb-3 font-serif text-xl font-semibold">
              Figures
            </h2>
            <FontFigures figures={shownFigures} units={unit} stale={!evaluation.ok} />
          </section>
        )}
        <section aria-labelledby={`${idPrefix}-plan`} className="rounded-lg border border-line bg-card p-4">
          <h2 id={`${idPrefix}-plan`} className="mb-3 font-serif text-xl font-semibold">
            Cold-working plan
          </h2>
          <div className="mb-3 grid gap-3 sm:grid-cols-2">
            <label className="text-sm font-medium">
              Machine
              <select
                value={machineId}
                onChange={(e) => setMachineId(e.target.value)}
                className="mt-1 block min-h-11 w-full rounded-md border border-line bg-card px-3 text-base"
              >
                {studioSettings.machines.map((m) => (
                  <option key={m.id} value={m.id}>
                    {m.name}
                  </option>
                ))}
              </select>
            </label>
            <label className="text-sm font-medium">
              Abrasive set
              <select
                value={abrasiveSetId}
                onChange={(e) => setAbrasiveSetId(e.target.value)}
                className="mt-1 block min-h-11 w-full rounded-md border border-line bg-card px-3 text-base"
              >
                {studioSettings.abrasiveSets.map((a) => (
                  <option key={a.id} value={a.id}>
                    {a.name}
                  </option>
                ))}
              </select>
            </label>
          </div>
          <ColdWorkingPlanView plan={plan} units={unit} />
        </section>
      </div>
    </div>
  );
}

export default FontEditor;
