"use client";
import { useState, type FormEvent } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError, TextField } from "@/components/ui/field";
import { ApiError, api, ballotKey } from "./api";

const pad = (n: number) => String(n).padStart(2, "0");
/** A datetime-local value (the viewer's own time zone) for a Date. */
export const localInput = (d: Date) => `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;

function defaultClose(): string {
  const d = new Date(Date.now() + 7 * 24 * 3600_000);
  d.setHours(18, 0, 0, 0);
  return localInput(d);
}

/** The chair opens an electronic ballot with a closing time (in their own time zone) and, if they like, the motion in words. */
export function OpenBallotForm({ revisionId, number }: { revisionId: number; number: number }) {
  const qc = useQueryClient();
  const [closesAt, setClosesAt] = useState(defaultClose);
  const [motion, setMotion] = useState("");
  const open = useMutation({
    mutationFn: () => {
      const when = new Date(closesAt);
      return api(`/api/revisions/${revisionId}/ballot`, { closesAt: Number.isNaN(when.getTime()) ? closesAt : when.toISOString(), motion: motion.trim() || undefined });
    },
    onSuccess: (state) => qc.setQueryData(ballotKey(revisionId), state),
  });
  const fields = open.error instanceof ApiError ? open.error.fields : {};
  const submit = (e: FormEvent) => { e.preventDefault(); open.mutate(); };
  const zone = Intl.DateTimeFormat().resolvedOptions().timeZone;
  return (
    <form onSubmit={submit} className="grid gap-1" data-testid="open-ballot-form" noValidate>
      <h4 className="font-serif text-lg font-semibold">Open a ballot on Revision {number}</h4>
      <FormError message={open.isError && !fields.closesAt && !fields.motion ? open.error.message : undefined} />
      <TextField label="Voting closes at" name="closesAt" type="datetime-local" value={closesAt} onChange={(e) => setClosesAt(e.target.value)}
        error={fields.closesAt} hint={`Your time zone: ${zone}. At most 60 days from now.`} required />
      <TextField label="Motion (optional)" name="motion" value={motion} onChange={(e) => setMotion(e.target.value)} maxLength={500}
        placeholder={`That Revision ${number} be approved.`} error={fields.motion} />
      <Button type="submit" disabled={open.isPending}>{open.isPending ? "Opening…" : "Open the ballot"}</Button>
    </form>
  );
}
