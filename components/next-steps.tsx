import Link from "next/link";
import type { CommissionDto } from "@/lib/dal/commissions";
import type { RevisionSummaryDto } from "@/lib/dal/revisions-read";
import type { BallotStateDto } from "@/models/ballot/state";
import { Card } from "./ui/card";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

interface Props { commission: CommissionDto; current?: RevisionSummaryDto | null; ballot?: BallotStateDto | null }

/** What happens next, in plain words, for the viewer's role, the commission's stage and the current ballot. */
export function NextSteps({ commission: c, current = null, ballot = null }: Props) {
  const studio = Boolean(c.you.studioRole);
  const chair = c.you.committeeRole === "chair";
  const open = ballot?.ballot?.status === "open" ? ballot.ballot : null;
  const closed = ballot?.ballot?.status === "closed" ? ballot : null;
  const link = current ? `/commissions/${c.id}/revisions/${current.number}` : `/commissions/${c.id}/revisions`;
  const steps: React.ReactNode[] = [];
  if (chair && !c.rulesConfirmed) steps.push(<>The studio proposed the committee&apos;s rules: <Link href={`/commissions/${c.id}/rules`}>confirm or change them</Link> before the first vote.</>);
  switch (c.stage) {
    case "brief":
    case "concept":
    case "design-development":
      if (!current) {
        steps.push(studio ? "Draft the first revision and circulate it to the committee when it is ready." : "The studio will circulate the first revision here; you will get an e-mail.");
        break;
      }
      if (open) {
        const until = open.closesAt ? ` until ${when.format(new Date(open.closesAt))} UTC` : "";
        if (ballot?.youMayVote) steps.push(<>A ballot on <Link href={link}>Revision {current.number}</Link> is open{until}. {ballot.yourVote ? "You have voted; you may change your vote until it closes." : "Your vote is awaited."}</>);
        else steps.push(<>A ballot on <Link href={link}>Revision {current.number}</Link> is open{until}; {ballot?.tally?.ballotsCast ?? 0} of {ballot?.tally?.votingMembers ?? 0} have voted.</>);
        if (chair) steps.push("When it closes (or when you close it), record the committee's decision.");
      } else if (chair && current.state === "circulated") {
        steps.push(closed ? <>The ballot on <Link href={link}>Revision {current.number}</Link> closed: {closed.result?.outcomeLabel ?? "see the result"}. Record the committee&apos;s decision.</> : <>Open a ballot on <Link href={link}>Revision {current.number}</Link>, or record the vote taken at a meeting, then record the decision.</>);
      } else if (!studio) {
        steps.push(<>Read <Link href={link}>Revision {current.number}</Link> and comment on anything you want changed, on the drawing or the model itself.</>);
      } else {
        steps.push(<>Revision {current.number} is with the committee. Answer their comments; draft the next revision when changes are asked for.</>);
      }
      break;
    case "approved":
      steps.push("The design is approved. Fabrication is released once every required permission is recorded and the deposit is paid.");
      break;
    case "in-fabrication":
      steps.push("The studio is making the piece and posts progress here.");
      break;
    case "installed":
      steps.push(chair ? "Tick off each condition and sign the handover." : "The piece is installed; the chair signs the handover.");
      break;
    default:
      steps.push("Nothing is waiting on you.");
  }
  return (
    <Card title="What happens next">
      <ul className="list-disc space-y-1 pl-5" data-testid="next-steps">{steps.map((s, i) => <li key={i}>{s}</li>)}</ul>
    </Card>
  );
}
