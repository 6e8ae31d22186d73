import Link from "next/link";
import type { RevisionSummaryDto } from "@/lib/dal/revisions-read";
import type { BallotStateDto } from "@/models/ballot/state";
import { Badge, Card } from "./ui/card";
import { CopyHash } from "./copy-hash";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

/** The overview's card for the revision now in front of the committee, and its ballot. */
export function CurrentRevision({ commissionId, revision, ballot, draft }: { commissionId: number; revision: RevisionSummaryDto | null; ballot: BallotStateDto | null; draft: RevisionSummaryDto | null }) {
  const base = `/commissions/${commissionId}/revisions`;
  return (
    <Card title="Current revision" action={<Link href={base} className="min-h-11 py-2">All revisions</Link>}>
      {revision ? (
        <div className="grid gap-2" data-testid="current-revision">
          <div className="flex flex-wrap items-center gap-2">
            <Link href={`${base}/${revision.number}`} className="font-serif text-xl font-semibold">Revision {revision.number}</Link>
            <Badge tone={revision.state === "decided" ? "ok" : "action"}>{revision.stateLabel}</Badge>
          </div>
          <p className="line-clamp-3 text-ink-soft">{revision.note}</p>
          {revision.contentHash && <p className="text-sm text-ink-soft">Content hash <CopyHash hash={revision.contentHash} label="content hash" /></p>}
          {ballot?.ballot?.status === "open" && ballot.tally && (
            <p className="rounded-md bg-record-soft px-3 py-2 text-sm">
              Ballot open{ballot.ballot.closesAt ? ` until ${when.format(new Date(ballot.ballot.closesAt))} UTC` : ""}: {ballot.tally.ballotsCast} of {ballot.tally.votingMembers} have voted
              ({ballot.tally.inFavour} in favour, {ballot.tally.against} against, {ballot.tally.abstain} abstaining).
            </p>
          )}
          {ballot?.result && ballot.ballot?.status === "closed" && <p className="text-sm">Last ballot: <strong>{ballot.result.outcomeLabel}</strong>.</p>}
        </div>
      ) : (
        <p className="text-ink-soft">Nothing has been circulated yet.</p>
      )}
      {draft && <p className="mt-3 text-sm"><Link href={`${base}/${draft.number}/edit`}>Revision {draft.number} is being drafted</Link> (studio only).</p>}
    </Card>
  );
}
