"use client";
import { Button } from "@/components/ui/button";
import { move, type StageDraft } from "./draft";
import { Input } from "./Input";

interface Props {
  path: string;
  stages: StageDraft[];
  errors: Record<string, string>;
  onChange: (stages: StageDraft[], structural?: boolean) => void;
}

const select =
  "mt-1 block w-full min-h-11 rounded-md border border-line bg-card px-3 py-2 text-base text-ink aria-[invalid=true]:border-danger";

/** The stages of one abrasive set, in the order they are used. */
export function StageFields({ path, stages, errors, onChange }: Props) {
  const set = (i: number, patch: Partial<StageDraft>) => onChange(stages.map((s, j) => (j === i ? { ...s, ...patch } : s)));
  return (
    <ol className="grid gap-3">
      {stages.map((s, i) => {
        const p = `${path}.${i}`;
        const kindError = errors[`${p}.kind`];
        return (
          <li key={s.key} className="rounded-md border border-line bg-paper p-3" data-testid={`${p}`}>
            <p className="mb-2 text-sm font-semibold">Stage {i + 1}</p>
            <div className="grid grid-cols-2 gap-x-3">
              <div className="col-span-2 mb-3 sm:col-span-1">
                <label htmlFor={`${p}.kind`} className="block text-sm font-medium">Grinding or polishing</label>
                <select id={`${p}.kind`} value={s.kind} className={select} aria-invalid={kindError ? true : undefined}
                  aria-describedby={kindError ? `${p}.kind-error` : undefined}
                  onChange={(e) => set(i, { kind: e.target.value === "polish" ? "polish" : "grind" })}>
                  <option value="grind">Grinding</option>
                  <option value="polish">Polishing</option>
                </select>
                {kindError && <p id={`${p}.kind-error`} role="alert" className="mt-1 text-sm font-medium text-danger" data-testid={`error-${p}.kind`}>{kindError}</p>}
              </div>
              <Input id={`${p}.grit`} label="Grit number" inputMode="numeric" value={s.grit} onChange={(grit) => set(i, { grit })}
                error={errors[`${p}.grit`]} hint={i === 0 ? "A larger number is finer." : undefined} />
              <Input id={`${p}.gritScale`} label="Grit scale" value={s.gritScale} list="grit-scales" maxLength={40}
                onChange={(gritScale) => set(i, { gritScale })} error={errors[`${p}.gritScale`]} />
              <Input id={`${p}.abrasive`} className="col-span-2 sm:col-span-1" label="Abrasive (optional)" value={s.abrasive} maxLength={120}
                onChange={(abrasive) => set(i, { abrasive })} error={errors[`${p}.abrasive`]} />
            </div>
            <div className="flex flex-wrap gap-1">
              <Button type="button" variant="quiet" disabled={i === 0} onClick={() => onChange(move(stages, i, -1), true)}>
                Move up<span className="sr-only"> stage {i + 1}</span>
              </Button>
              <Button type="button" variant="quiet" disabled={i === stages.length - 1} onClick={() => onChange(move(stages, i, 1), true)}>
                Move down<span className="sr-only"> stage {i + 1}</span>
              </Button>
              {stages.length > 1 && (
                <Button type="button" variant="quiet" onClick={() => onChange(stages.filter((_, j) => j !== i), true)}>
                  Remove<span className="sr-only"> stage {i + 1}</span>
                </Button>
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
