"use client";
import { useActionState } from "react";
import { inviteAction, type InviteState } from "./actions";
import { TextField, SelectField, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { ROLE_LABELS, type CommitteeRole } from "@/models/permissions/policy";

export function InviteForm({ commissionId, roles }: { commissionId: number; roles: CommitteeRole[] }) {
  const [state, action, pending] = useActionState<InviteState, FormData>(inviteAction.bind(null, commissionId), {});
  return (
    <form action={action} noValidate data-testid="invite-form">
      <FormError message={state.errors?._form} />
      {state.ok && <p role="status" className="mb-4 rounded-md border border-ok bg-ok-soft px-3 py-2 text-sm text-ok">{state.ok}</p>}
      <TextField label="Name" name="name" autoComplete="off" defaultValue={state.values?.name} error={state.errors?.name} />
      <TextField label="E-mail address" name="email" type="email" inputMode="email" autoComplete="off" defaultValue={state.values?.email} error={state.errors?.email} />
      <SelectField label="Role" name="role" defaultValue={state.values?.role ?? roles[roles.length - 1]} error={state.errors?.role}>
        {roles.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
      </SelectField>
      {roles.includes("member") && (
        <label className="mb-4 flex min-h-11 items-center gap-3">
          <input type="checkbox" name="treasurer" className="size-5" /> Treasurer (pays the deposit invoice)
        </label>
      )}
      {state.errors?.treasurer && <p role="alert" className="mb-3 text-sm text-danger">{state.errors.treasurer}</p>}
      <Button type="submit" disabled={pending}>{pending ? "Inviting…" : "Send invitation"}</Button>
    </form>
  );
}
