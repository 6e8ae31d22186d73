"use client";
import { useState, type FormEvent } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError, SelectField, TextField } from "@/components/ui/field";
import { CHOICE_LABELS, VOTE_CHOICES, type BallotStateDto, type VoteChoice } from "@/models/ballot/state";
import { ApiError, api, ballotKey } from "./api";

const today = () => { const d = new Date(); return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`; };
const whole = (s: string) => (s.trim() === "" ? Number.NaN : Number(s));

/** The chair records a vote taken at a meeting: its date, and the counts or each member's vote. */
export function MeetingVoteForm({ state }: { state: BallotStateDto }) {
  const qc = useQueryClient();
  const [meetingDate, setDate] = useState(today);
  const [mode, setMode] = useState<"counts" | "each">("counts");
  const [counts, setCounts] = useState({ inFavour: "", against: "", abstain: "" });
  const [each, setEach] = useState<Record<string, VoteChoice | "">>({});
  const [motion, setMotion] = useState("");
  const [minutesRef, setMinutes] = useState("");
  const save = useMutation({
    mutationFn: () => api(`/api/revisions/${state.revisionId}/meeting-vote`, {
      meetingDate, minutesRef, motion: motion.trim() || undefined,
      ...(mode === "counts"
        ? { counts: { inFavour: whole(counts.inFavour), against: whole(counts.against), abstain: whole(counts.abstain) } }
        : { perMember: Object.entries(each).filter(([, c]) => c).map(([userId, choice]) => ({ userId, choice })) }),
    }),
    onSuccess: (s) => qc.setQueryData(ballotKey(state.revisionId), s),
  });
  const f = save.error instanceof ApiError ? save.error.fields : {};
  const shownElsewhere = ["meetingDate", "minutesRef", "inFavour", "against", "abstain", "perMember", "motion"].some((k) => f[k]);
  const submit = (e: FormEvent) => { e.preventDefault(); save.mutate(); };
  const count = (k: keyof typeof counts, label: string) => (
    <TextField label={label} name={`meeting-${k}`} type="number" inputMode="numeric" min={0} max={state.votingMembers.length}
      value={counts[k]} onChange={(e) => setCounts({ ...counts, [k]: e.target.value })} error={f[k]} />
  );
  return (
    <form onSubmit={submit} className="grid gap-1" data-testid="meeting-vote-form" noValidate>
      <h4 className="font-serif text-lg font-semibold">Record the vote taken at a meeting</h4>
      <FormError message={save.isError && !shownElsewhere ? save.error.message : undefined} />
      <TextField label="Date of the meeting" name="meetingDate" type="date" max={today()} value={meetingDate} onChange={(e) => setDate(e.target.value)} error={f.meetingDate} />
      <TextField label="Where the minutes are" name="minutesRef" value={minutesRef} onChange={(e) => setMinutes(e.target.value)} maxLength={500}
        hint="The minute book and page, or the file or link where the signed minutes are kept." error={f.minutesRef} />
      <TextField label="Motion (optional)" name="meeting-motion" value={motion} onChange={(e) => setMotion(e.target.value)} maxLength={500}
        placeholder={`That Revision ${state.revisionNumber} be approved.`} error={f.motion} />
      <fieldset className="mb-4">
        <legend className="text-sm font-medium">What the minutes record</legend>
        <div className="mt-1 flex flex-wrap gap-4">
          {(["counts", "each"] as const).map((m) => (
            <label key={m} className="flex min-h-11 items-center gap-2">
              <input type="radio" name="meeting-mode" checked={mode === m} onChange={() => setMode(m)} className="h-5 w-5" />
              {m === "counts" ? "The counts" : "Each member's vote"}
            </label>
          ))}
        </div>
      </fieldset>
      {mode === "counts" ? (
        <div className="grid grid-cols-3 gap-2">{count("inFavour", "In favour")}{count("against", "Against")}{count("abstain", "Abstaining")}</div>
      ) : (
        <div className="grid gap-1" data-testid="per-member">
          {state.votingMembers.map((p) => (
            <SelectField key={p.userId} label={p.name} name={`vote-${p.userId}`} value={each[p.userId] ?? ""} onChange={(e) => setEach({ ...each, [p.userId]: e.target.value as VoteChoice | "" })}>
              <option value="">Did not vote</option>
              {VOTE_CHOICES.map((c) => <option key={c} value={c}>{CHOICE_LABELS[c]}</option>)}
            </SelectField>
          ))}
          {f.perMember && <p role="alert" className="mb-3 text-sm font-medium text-danger">{f.perMember}</p>}
        </div>
      )}
      <p className="mb-2 text-sm text-ink-soft">The committee has {state.votingMembers.length} voting members. The result follows from the rules above, and every view marks it as recorded by the chair from a meeting.</p>
      <Button type="submit" disabled={save.isPending}>{save.isPending ? "Recording…" : "Record the meeting's vote"}</Button>
    </form>
  );
}
