"use client";
import { formatNumber, mmToIn, type LengthUnit } from "@/models/font";
import { Button } from "@/components/ui/button";
import { entryMm, newKey, typed, type MachineDraft } from "./draft";
import { Input, ListError } from "./Input";

interface Props {
  machines: MachineDraft[];
  unit: LengthUnit;
  errors: Record<string, string>;
  onChange: (machines: MachineDraft[], structural?: boolean) => void;
}

/** "= 0.06 in" under a downfeed typed in mm, and the other way round. */
function otherUnit(m: MachineDraft, unit: LengthUnit): string {
  const mm = entryMm(m.downfeed, unit);
  if (mm === null || mm <= 0) return "Downfeed is how far the grinding head comes down for one full turn of the handwheel.";
  return unit === "mm" ? `That is ${mmToIn(mm).toFixed(4).replace(/0$/, "")} in per turn.` : `That is ${formatNumber(mm, 3)} mm per turn.`;
}

export function MachinesFields({ machines, unit, errors, onChange }: Props) {
  const set = (i: number, patch: Partial<MachineDraft>) => onChange(machines.map((m, j) => (j === i ? { ...m, ...patch } : m)));
  return (
    <section aria-labelledby="machines-h" className="grid gap-3">
      <h3 id="machines-h" className="font-serif text-xl font-semibold">Machines</h3>
      <ListError id="machines" error={errors.machines} />
      {machines.map((m, i) => {
        const p = `machines.${i}`;
        return (
          <fieldset key={m.key} className="rounded-lg border border-line bg-card p-4" data-testid={`machine-${i}`}>
            <legend className="px-1 font-semibold">Machine {i + 1}</legend>
            <div className="grid gap-x-4 sm:grid-cols-2">
              <Input id={`${p}.name`} label="Name" value={m.name} maxLength={120} onChange={(name) => set(i, { name })}
                error={errors[`${p}.name`] ?? errors[`${p}.id`]} />
              <Input id={`${p}.downfeedPerTurnMm`} label="Downfeed per full turn of the handwheel" inputMode="decimal" suffix={unit}
                value={m.downfeed.text} onChange={(text) => set(i, { downfeed: typed(text) })}
                error={errors[`${p}.downfeedPerTurnMm`]} hint={otherUnit(m, unit)} />
            </div>
            {machines.length > 1 && (
              <Button type="button" variant="quiet" onClick={() => onChange(machines.filter((_, j) => j !== i), true)}>
                Remove {m.name.trim() || `machine ${i + 1}`}
              </Button>
            )}
          </fieldset>
        );
      })}
      <div>
        <Button type="button" variant="secondary" onClick={() =>
          onChange([...machines, { key: newKey("m"), id: newKey("machine"), name: "", downfeed: typed("") }], true)}>
          Add a machine
        </Button>
      </div>
    </section>
  );
}
