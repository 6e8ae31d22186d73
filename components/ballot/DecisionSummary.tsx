"use client";
import { Badge, Card, HashText } from "@/components/ui/card";
import { FROM_MEETING } from "@/models/ballot/state";
import type { DecisionTallyDto } from "@/models/decision";
import { showDate, showTime, useDecisionState } from "./api";

export function tallyLine(t: DecisionTallyDto | null): string {
  if (!t) return "No ballot was held on this revision.";
  const where = t.kind === "meeting" ? `at the meeting of ${showDate(t.meetingDate!)} (${FROM_MEETING})` : "by electronic ballot";
  const roll = t.roll.length ? ` The roll: ${t.roll.map((p) => `${p.name}${p.role === "chair" ? " (chair)" : ""}`).join(", ")}.` : "";
  return `${t.outcomeLabel} ${where}: ${t.inFavour} in favour, ${t.against} against, ${t.abstain} abstaining, of ${t.votingMembers} voting members.${roll}`;
}

/** The committee's decision on a revision, read-only, for everyone once it is recorded. */
export function DecisionSummary({ revisionId }: { revisionId: number }) {
  const q = useDecisionState(revisionId);
  const d = q.data?.decision;
  if (!d) return null;
  const tone = d.outcome === "approved" || d.outcome === "approved-as-noted" ? "ok" : d.outcome === "not-approved" ? "danger" : "neutral";
  return (
    <div data-testid="decision-summary" data-outcome={d.outcome}>
      <Card title="The committee's decision">
        <div className="grid gap-3">
          <p className="text-lg"><Badge tone={tone}>{d.outcomeLabel}</Badge></p>
          {d.conditions.length > 0 && (
            <div>
              <h4 className="font-medium">Conditions</h4>
              <ol className="list-decimal space-y-1 pl-6" data-testid="decision-conditions">{d.conditions.map((c, i) => <li key={i}>{c}</li>)}</ol>
            </div>
          )}
          {d.statement && <p className="whitespace-pre-line">{d.statement}</p>}
          <p className="text-sm">{tallyLine(d.tally)}</p>
          <p className="text-sm text-ink-soft">Recorded by {d.recordedByName}, chair, {showTime(d.recordedAt)}.</p>
          <p className="break-all text-sm">Revision {d.number}, content hash <HashText hash={d.contentHash} short={false} /></p>
        </div>
      </Card>
    </div>
  );
}
