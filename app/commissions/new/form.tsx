"use client";
import { useActionState } from "react";
import { createCommissionAction, type NewCommissionState } from "./actions";
import { TextField, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function NewCommissionForm() {
  const [state, action, pending] = useActionState<NewCommissionState, FormData>(createCommissionAction, {});
  return (
    <form action={action} noValidate>
      <FormError message={state.errors?._form} />
      <TextField label="Title" name="title" defaultValue={state.values?.title} error={state.errors?.title} hint="For example: Baptismal font for the west end" />
      <TextField label="Commissioning body" name="clientBody" defaultValue={state.values?.clientBody} error={state.errors?.clientBody} hint="The committee or council that decides" />
      <TextField label="Site" name="site" defaultValue={state.values?.site} error={state.errors?.site} hint="The building and where in it the piece will stand" />
      <p className="mb-4 text-sm text-ink-soft">The studio proposes the committee's ballot rules at the usual defaults (a majority quorum, a simple majority to carry, votes taken at meetings); they are the committee's, so its chair confirms or changes them before the first vote.</p>
      <Button type="submit" disabled={pending}>{pending ? "Creating…" : "Create the commission"}</Button>
    </form>
  );
}
