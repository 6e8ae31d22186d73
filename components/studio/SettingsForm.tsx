"use client";
import { useState, useTransition } from "react";
import type { LengthUnit, StudioSettings } from "@/models/font";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { UnitsToggle } from "@/components/revision/UnitsToggle";
import { draftFromSettings, payloadFromDraft, switchUnit, type SettingsDraft } from "./draft";
import { MachinesFields } from "./MachinesFields";
import { AbrasiveSetsFields } from "./AbrasiveSetsFields";
import { StockFields } from "./StockFields";

export type SaveStudioResult = { ok: true; settings: StudioSettings } | { ok: false; errors: Record<string, string> };

interface Props {
  initial: StudioSettings;
  initialUnits: LengthUnit;
  /** the server action; it checks who is asking and every value */
  save: (input: unknown) => Promise<SaveStudioResult>;
}

/** The owner's form for the studio's machines, abrasive sets and usual stock. */
export function SettingsForm({ initial, initialUnits, save }: Props) {
  const [draft, setDraft] = useState<SettingsDraft>(() => draftFromSettings(initial, initialUnits));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const [pending, startTransition] = useTransition();

  const change = (patch: Partial<SettingsDraft>, structural = false) => {
    setDraft((d) => ({ ...d, ...patch }));
    setSaved(false);
    if (structural) setErrors({}); // positions moved, so old messages would point at the wrong rows
  };

  const submit = () =>
    startTransition(async () => {
      let result: SaveStudioResult;
      try {
        result = await save(payloadFromDraft(draft));
      } catch {
        result = { ok: false, errors: { _form: "The settings could not be sent. Check the connection and try again." } };
      }
      if (result.ok) {
        setDraft(draftFromSettings(result.settings, draft.unit));
        setErrors({});
        setSaved(true);
      } else {
        setErrors(result.errors);
        setSaved(false);
      }
    });

  const count = Object.keys(errors).filter((k) => k !== "_form").length;
  return (
    <form noValidate aria-label="Studio settings" data-testid="studio-settings-form" className="grid gap-5"
      onSubmit={(e) => { e.preventDefault(); submit(); }}>
      <div>
        <p className="mb-1 text-sm font-medium">Enter lengths in</p>
        <UnitsToggle units={draft.unit} onChange={(u) => setDraft((d) => switchUnit(d, u))} />
      </div>
      <MachinesFields machines={draft.machines} unit={draft.unit} errors={errors} onChange={(machines, s) => change({ machines }, s)} />
      <AbrasiveSetsFields sets={draft.abrasiveSets} errors={errors} onChange={(abrasiveSets, s) => change({ abrasiveSets }, s)} />
      <StockFields stock={draft.stock} unit={draft.unit} errors={errors} onChange={(stock) => change({ stock })} />
      <div className="sticky bottom-0 -mx-1 grid gap-2 bg-paper/95 px-1 py-3">
        <FormError message={errors._form} />
        {count > 0 && (
          <p role="alert" className="text-sm font-medium text-danger" data-testid="settings-errors">
            {count === 1 ? "One value needs" : `${count} values need`} attention: see the {count === 1 ? "message beside it" : "messages beside them"}. Nothing was saved.
          </p>
        )}
        <p role="status" className="text-sm text-ok" data-testid="settings-saved">{saved ? "Saved. New cold-working plans use these settings." : ""}</p>
        <div><Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save the studio's settings"}</Button></div>
      </div>
    </form>
  );
}
