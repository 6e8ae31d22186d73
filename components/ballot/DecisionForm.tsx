"use client";
import { useEffect, useState, type FormEvent } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { Card, HashText } from "@/components/ui/card";
import { FormError, TextArea } from "@/components/ui/field";
import { DECISION_LABELS, DECISION_OUTCOMES, splitConditions, type DecisionOutcome, type DecisionStateDto } from "@/models/decision";
import { ApiError, api, ballotKey, decisionKey, showTime, useDecisionState } from "./api";
import { tallyLine } from "./DecisionSummary";

type Draft = { outcome: DecisionOutcome | ""; conditions: string; statement: string };
const EMPTY: Draft = { outcome: "", conditions: "", statement: "" };

/** What the chair is signing, in one plain sentence. */
export function signingSentence(outcome: DecisionOutcome | "", number: number, conditions: number): string {
  const what = {
    "": `the committee's decision on Revision ${number}`,
    approved: `that the committee approved Revision ${number}`,
    "approved-as-noted": `that the committee approved Revision ${number} subject to the ${conditions === 1 ? "condition" : `${conditions || "written"} conditions`} above`,
    "revise-and-resubmit": `that the committee asks the studio to revise Revision ${number} and resubmit it`,
    "not-approved": `that the committee did not approve Revision ${number}`,
  }[outcome];
  return `You are recording, as chair, ${what}.`;
}

/** Keeps the chair's unfinished decision in this tab, so a confirmation sign-in does not lose it. */
function useDraft(revisionId: number): [Draft, (d: Draft) => void, () => void] {
  const key = `placet:decision-draft:${revisionId}`;
  const [draft, setDraft] = useState<Draft>(EMPTY);
  useEffect(() => {
    try { const saved = sessionStorage.getItem(key); if (saved) setDraft({ ...EMPTY, ...JSON.parse(saved) }); } catch { /* storage unavailable */ }
  }, [key]);
  const update = (d: Draft) => { setDraft(d); try { sessionStorage.setItem(key, JSON.stringify(d)); } catch { /* storage unavailable */ } };
  const clear = () => { setDraft(EMPTY); try { sessionStorage.removeItem(key); } catch { /* storage unavailable */ } };
  return [draft, update, clear];
}

function ConfirmIdentity({ revisionId, signedInAt }: { revisionId: number; signedInAt: string | null }) {
  const [state, setState] = useState<{ sending?: boolean; sentTo?: string; error?: string }>({});
  const send = async () => {
    setState({ sending: true });
    try {
      const res = await api<{ email: string }>(`/api/revisions/${revisionId}/decision/sign-in-link`, {});
      setState({ sentTo: res.email });
    } catch (e) {
      setState({ error: (e as Error).message });
    }
  };
  return (
    <div className="grid gap-2 rounded-md border border-record bg-record-soft p-3" data-testid="confirm-identity">
      <p>
        {signedInAt ? `You signed in ${showTime(signedInAt)}, more than 10 minutes ago.` : "We could not tell when you signed in."} Before you record
        the decision, confirm it is you: we will e-mail you a new sign-in link. Open it in this browser; it brings you back here, and what you
        have written is kept.
      </p>
      {state.sentTo ? <p role="status" className="font-medium">A link is on its way to {state.sentTo}.</p> : (
        <Button variant="secondary" onClick={send} disabled={state.sending}>{state.sending ? "Sending…" : "E-mail me a confirmation link"}</Button>
      )}
      {state.error && <p role="alert" className="text-sm font-medium text-danger">{state.error}</p>}
    </div>
  );
}

function OutcomeChoice({ s, value, onChange, error }: { s: DecisionStateDto; value: Draft["outcome"]; onChange: (o: DecisionOutcome) => void; error?: string }) {
  return (
    <fieldset className="mb-4 grid gap-2" aria-describedby={error ? "outcome-error" : undefined}>
      <legend className="mb-1 font-medium">The committee's decision</legend>
      {DECISION_OUTCOMES.map((o) => {
        const why = s.refusals[o];
        return (
          <label key={o} className={`flex min-h-11 items-start gap-3 rounded-md border border-line p-3 ${why ? "opacity-70" : "cursor-pointer"}`}>
            <input type="radio" name="outcome" value={o} checked={value === o} disabled={Boolean(why)} onChange={() => onChange(o)} className="mt-1 h-5 w-5" />
            <span>
              <span className="font-medium">{DECISION_LABELS[o]}</span>
              {why && <span className="block text-sm text-ink-soft">Not available: {why}</span>}
            </span>
          </label>
        );
      })}
      {error && <p id="outcome-error" role="alert" className="text-sm font-medium text-danger">{error}</p>}
    </fieldset>
  );
}

/** The chair's form for the committee's decision; renders nothing for anyone else (the server decides anyway). */
export function DecisionForm({ revisionId, contentHash, number }: { revisionId: number; contentHash: string; number: number }) {
  const qc = useQueryClient();
  const q = useDecisionState(revisionId);
  const [draft, setDraft, clearDraft] = useDraft(revisionId);
  const [needFresh, setNeedFresh] = useState(false);
  const record = useMutation({
    mutationFn: () => api<DecisionStateDto>(`/api/revisions/${revisionId}/decision`, draft),
    onSuccess: (state) => {
      clearDraft();
      qc.setQueryData(decisionKey(revisionId), state);
      qc.invalidateQueries({ queryKey: ballotKey(revisionId) });
      qc.invalidateQueries({ queryKey: ["revision", revisionId] });
    },
    onError: (e) => { if (e instanceof ApiError && e.code === "fresh-sign-in-required") setNeedFresh(true); },
  });
  const s = q.data;
  if (!s || !s.you.mayRecord) return null;
  const f = record.error instanceof ApiError ? record.error.fields : {};
  const fresh = s.you.freshSignInNeeded || needFresh;
  const conditions = splitConditions(draft.conditions) ?? [];
  const refused = draft.outcome ? s.refusals[draft.outcome] : null;
  const submit = (e: FormEvent) => { e.preventDefault(); record.mutate(); };
  const otherError = record.isError && !f.outcome && !f.conditions && !f.statement && !(record.error instanceof ApiError && record.error.code) ? record.error.message : undefined;
  return (
    <div data-testid="decision-form">
      <Card title={`Record the decision on Revision ${number}`}>
        <form onSubmit={submit} noValidate className="grid gap-1">
          <FormError message={otherError} />
          <OutcomeChoice s={s} value={draft.outcome} onChange={(o) => setDraft({ ...draft, outcome: o })} error={f.outcome ?? refused ?? undefined} />
          {draft.outcome === "approved-as-noted" && (
            <TextArea label="Conditions, one per line" name="conditions" rows={4} value={draft.conditions} error={f.conditions}
              onChange={(e) => setDraft({ ...draft, conditions: e.target.value })}
              hint="Each line becomes a condition the studio ticks off on the shop traveler." />
          )}
          <TextArea label="Statement (optional)" name="statement" rows={3} value={draft.statement} error={f.statement}
            onChange={(e) => setDraft({ ...draft, statement: e.target.value })} hint="For the minutes: anything the committee wants said with the decision." />
          <div className="mb-3 grid gap-2 rounded-md border border-line bg-paper p-3" data-testid="signing-statement">
            <p className="font-medium">{signingSentence(draft.outcome, number, conditions.length)}</p>
            <p className="break-all text-sm">Revision {number}, content hash <HashText hash={contentHash} short={false} /></p>
            <p className="text-sm">The vote it rests on: {tallyLine(s.basis)}</p>
            <p className="text-sm text-ink-soft">It goes into the decision trail, is e-mailed to everyone on the commission, and cannot be changed afterwards.</p>
          </div>
          {fresh ? <ConfirmIdentity revisionId={revisionId} signedInAt={s.you.signedInAt} /> : (
            <Button type="submit" disabled={!draft.outcome || Boolean(refused) || record.isPending}>
              {record.isPending ? "Recording…" : "Record and sign the decision"}
            </Button>
          )}
        </form>
      </Card>
    </div>
  );
}
