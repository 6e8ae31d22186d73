"use client";
import { useActionState, useState } from "react";
import { confirmRulesAction, rulesAction, type RulesState } from "./actions";
import { TextField, SelectField, TextArea, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import type { BallotRules } from "@/models/ballot";

/** The chair confirms the rules the studio proposed, as they stand. */
function ConfirmRules({ commissionId }: { commissionId: number }) {
  const [state, action, pending] = useActionState<RulesState, FormData>(confirmRulesAction.bind(null, commissionId), {});
  return (
    <form action={action} className="mb-6 rounded-md border border-line bg-paper-deep p-3" data-testid="confirm-rules">
      <p className="mb-2">The studio proposed these rules when it set up the commission. They take effect when you, as chair, confirm them (or change them below).</p>
      <FormError message={state.errors?._form} />
      <Button type="submit" disabled={pending}>{pending ? "Confirming…" : "Confirm the rules as they stand"}</Button>
    </form>
  );
}

export function RulesForm({ commissionId, rules, confirmed }: { commissionId: number; rules: BallotRules; confirmed: boolean }) {
  const [state, action, pending] = useActionState<RulesState, FormData>(rulesAction.bind(null, commissionId), {});
  const [mode, setMode] = useState(rules.quorum === "majority" ? "majority" : "count");
  return (
    <>
    {!confirmed && <ConfirmRules commissionId={commissionId} />}
    <form action={action} noValidate>
      <FormError message={state.errors?._form} />
      <fieldset className="mb-4">
        <legend className="text-sm font-medium">Quorum</legend>
        <label className="flex min-h-11 items-center gap-3"><input type="radio" name="quorumMode" value="majority" checked={mode === "majority"} onChange={() => setMode("majority")} className="size-5" /> A majority of the voting members</label>
        <label className="flex min-h-11 items-center gap-3"><input type="radio" name="quorumMode" value="count" checked={mode === "count"} onChange={() => setMode("count")} className="size-5" /> A fixed number of voting members</label>
      </fieldset>
      {mode === "count" && (
        <TextField label="How many voting members make a quorum" name="quorumCount" inputMode="numeric" defaultValue={typeof rules.quorum === "number" ? String(rules.quorum) : ""} error={state.errors?.quorum} />
      )}
      {mode === "majority" && state.errors?.quorum && <p role="alert" className="mb-3 text-sm text-danger">{state.errors.quorum}</p>}
      <SelectField label="What carries a motion" name="threshold" defaultValue={rules.threshold} error={state.errors?.threshold}>
        <option value="majority">More in favour than against (abstentions not counted)</option>
        <option value="two-thirds">Two-thirds of the votes cast in favour</option>
        <option value="unanimous">Every voting member in favour</option>
      </SelectField>
      <label className="mb-4 flex min-h-11 items-center gap-3"><input type="checkbox" name="chairVotes" defaultChecked={rules.chairVotes} className="size-5" /> The chair votes with the members</label>
      <TextArea label="Authority for electronic ballots" name="electronicAuthority" rows={2} defaultValue={rules.electronicAuthority ?? ""} error={state.errors?.electronicAuthority}
        hint="The bylaw clause or resolution that lets this committee vote electronically. Leave empty if votes are taken at meetings; the chair then records them here." />
      <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save the rules"}</Button>
      <p className="mt-3 text-sm text-ink-soft">Only the chair changes the rules, never while a ballot is open; each change is recorded in the decision trail with the rules before and after.</p>
    </form>
    </>
  );
}
