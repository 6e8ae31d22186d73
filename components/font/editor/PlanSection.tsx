import type { ColdWorkingResult, LengthUnit, StudioSettings } from "@/models/font";
import { ColdWorkingPlanView } from "../ColdWorkingPlanView";

export interface PlanChoice {
  machineId: string;
  abrasiveSetId: string;
}

interface PlanSectionProps {
  idPrefix: string;
  plan: ColdWorkingResult;
  unit: LengthUnit;
  studioSettings: StudioSettings;
  choice: PlanChoice;
  onChoose: (choice: PlanChoice) => void;
}

function Choice(props: {
  label: string;
  value: string;
  options: { id: string; name: string }[];
  onChange: (id: string) => void;
}) {
  return (
    <label className="text-sm font-medium">
      {props.label}
      <select
        value={props.value}
        onChange={(e) => props.onChange(e.target.value)}
        className="mt-1 block min-h-11 w-full rounded-md border border-line bg-card px-3 text-base"
      >
        {props.options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </select>
    </label>
  );
}

/** The cold-working plan with the machine and abrasive set it is made for. */
export function PlanSection({ idPrefix, plan, unit, studioSettings, choice, onChoose }: PlanSectionProps) {
  return (
    <section aria-labelledby={`${idPrefix}-plan`} className="rounded-lg border border-line bg-card p-4">
      <h2 id={`${idPrefix}-plan`} className="mb-3 font-serif text-xl font-semibold">
        Cold-working plan
      </h2>
      <div className="mb-3 grid gap-3 sm:grid-cols-2">
        <Choice
          label="Machine"
          value={choice.machineId}
          options={studioSettings.machines}
          onChange={(machineId) => onChoose({ ...choice, machineId })}
        />
        <Choice
          label="Abrasive set"
          value={choice.abrasiveSetId}
          options={studioSettings.abrasiveSets}
          onChange={(abrasiveSetId) => onChoose({ ...choice, abrasiveSetId })}
        />
      </div>
      <ColdWorkingPlanView plan={plan} units={unit} />
    </section>
  );
}
