"use client";
import { Button } from "@/components/ui/button";
import { newKey, type SetDraft, type StageDraft } from "./draft";
import { Input, ListError } from "./Input";
import { StageFields } from "./StageFields";

interface Props {
  sets: SetDraft[];
  errors: Record<string, string>;
  onChange: (sets: SetDraft[], structural?: boolean) => void;
}

/** A new stage one step finer than the last, as a starting point. */
function nextStage(stages: StageDraft[]): StageDraft {
  const last = stages[stages.length - 1];
  const grit = last && /^\d+$/.test(last.grit) ? String(Number(last.grit) * 2) : "";
  return { key: newKey("s"), kind: last?.kind ?? "grind", grit, gritScale: last?.gritScale ?? "mesh", abrasive: last?.abrasive ?? "" };
}

export function AbrasiveSetsFields({ sets, errors, onChange }: Props) {
  const set = (i: number, patch: Partial<SetDraft>, structural?: boolean) =>
    onChange(sets.map((s, j) => (j === i ? { ...s, ...patch } : s)), structural);
  return (
    <section aria-labelledby="sets-h" className="grid gap-3">
      <h3 id="sets-h" className="font-serif text-xl font-semibold">Abrasive sets</h3>
      <p className="text-sm text-ink-soft">
        Each set lists its stages in the order they are used: grinding first, then polishing, each finer than the one before.
      </p>
      <datalist id="grit-scales">
        <option value="FEPA F" />
        <option value="mesh" />
      </datalist>
      <ListError id="abrasiveSets" error={errors.abrasiveSets} />
      {sets.map((a, i) => {
        const p = `abrasiveSets.${i}`;
        return (
          <fieldset key={a.key} className="rounded-lg border border-line bg-card p-4" data-testid={`abrasive-set-${i}`}>
            <legend className="px-1 font-semibold">Abrasive set {i + 1}</legend>
            <Input id={`${p}.name`} label="Name" value={a.name} maxLength={120} onChange={(name) => set(i, { name })}
              error={errors[`${p}.name`] ?? errors[`${p}.id`]} />
            <ListError id={`${p}.stages`} error={errors[`${p}.stages`]} />
            <StageFields path={`${p}.stages`} stages={a.stages} errors={errors} onChange={(stages, structural) => set(i, { stages }, structural)} />
            <div className="mt-3 flex flex-wrap gap-2">
              <Button type="button" variant="secondary" disabled={a.stages.length >= 12}
                onClick={() => set(i, { stages: [...a.stages, nextStage(a.stages)] }, true)}>
                Add a stage<span className="sr-only"> to set {i + 1}</span>
              </Button>
              {sets.length > 1 && (
                <Button type="button" variant="quiet" onClick={() => onChange(sets.filter((_, j) => j !== i), true)}>
                  Remove this set
                </Button>
              )}
            </div>
          </fieldset>
        );
      })}
      <div>
        <Button type="button" variant="secondary" onClick={() =>
          onChange([...sets, { key: newKey("a"), id: newKey("set"), name: "", stages: [nextStage([])] }], true)}>
          Add an abrasive set
        </Button>
      </div>
    </section>
  );
}
