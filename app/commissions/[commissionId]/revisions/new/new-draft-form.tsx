"use client";
import { useActionState } from "react";
import { createDraftAction, type DraftState } from "../actions";
import { TextArea, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function NewDraftForm({ commissionId, basedOn }: { commissionId: number; basedOn: number | null }) {
  const [state, action, pending] = useActionState<DraftState, FormData>(createDraftAction.bind(null, commissionId), {});
  return (
    <form action={action}>
      <FormError message={state.error} />
      <p className="mb-3 text-ink-soft">{basedOn ? `The new draft starts from Revision ${basedOn}'s model; change what you need.` : "The first draft starts from a typical font; change what you need."}</p>
      <TextArea label="What changed and why (you can finish this later)" name="note" rows={4} />
      <Button type="submit" disabled={pending}>{pending ? "Starting…" : "Start the draft"}</Button>
    </form>
  );
}
