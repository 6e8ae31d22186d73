import type { BallotResultDto, TallyDto, VoterDto } from "@/models/ballot/state";
import { CHOICE_LABELS } from "@/models/ballot/state";
import { Badge } from "@/components/ui/card";

function Bar({ label, n, of, className }: { label: string; n: number; of: number; className: string }) {
  const pct = of > 0 ? Math.round((n / of) * 100) : 0;
  return (
    <div className="grid grid-cols-[7rem_1fr_2rem] items-center gap-2">
      <span>{label}</span>
      <span className="h-3 overflow-hidden rounded-full bg-paper-deep" aria-hidden="true"><span className={`block h-full ${className}`} style={{ width: `${pct}%` }} /></span>
      <span className="text-right font-semibold tabular-nums">{n}</span>
    </div>
  );
}

/** The counts so far (or frozen at the close), against the voting members and the quorum. */
export function TallyView({ tally, live }: { tally: TallyDto; live: boolean }) {
  const t = tally;
  return (
    <div className="grid gap-2" data-testid="tally" aria-live={live ? "polite" : undefined}>
      <Bar label="In favour" n={t.inFavour} of={t.votingMembers} className="bg-ok" />
      <Bar label="Against" n={t.against} of={t.votingMembers} className="bg-danger" />
      <Bar label="Abstain" n={t.abstain} of={t.votingMembers} className="bg-ink-soft" />
      <p className="text-sm text-ink-soft">
        {t.ballotsCast} of {t.votingMembers} voting members {live ? "have voted" : "voted"}; {t.quorumRequired} needed for a quorum
        {live ? (t.ballotsCast >= t.quorumRequired ? " (reached)." : ".") : "."}
      </p>
    </div>
  );
}

export function WhoVotedHow({ voters }: { voters: VoterDto[] }) {
  if (!voters.length) return null;
  return (
    <div>
      <h4 className="mb-1 font-medium">Who voted how</h4>
      <ul className="divide-y divide-line rounded-md border border-line" data-testid="who-voted-how">
        {voters.map((v) => (
          <li key={v.userId} className="flex items-center justify-between gap-2 px-3 py-2">
            <span>{v.name}{v.role === "chair" ? " (chair)" : ""}</span>
            <span className={v.choice ? "font-medium" : "text-ink-soft"}>{v.choice ? CHOICE_LABELS[v.choice] : "Not voted"}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

export function ResultView({ result }: { result: BallotResultDto }) {
  const tone = result.outcome === "carried" ? "ok" : result.outcome === "failed" ? "danger" : "neutral";
  return (
    <div className="rounded-md border border-line bg-paper p-3" data-testid="ballot-result">
      <p className="mb-1"><Badge tone={tone}>{result.outcomeLabel}</Badge></p>
      <p>{result.sentence}</p>
    </div>
  );
}
