import type { CommissionDto } from "@/lib/dal/commissions";
import { Card } from "./ui/card";

/** What happens next, in plain words, for the viewer's role and the commission's stage. */
export function NextSteps({ commission: c }: { commission: CommissionDto }) {
  const studio = Boolean(c.you.studioRole);
  const chair = c.you.committeeRole === "chair";
  const steps: string[] = [];
  switch (c.stage) {
    case "brief":
    case "concept":
    case "design-development":
      if (studio) steps.push("Draft the next revision and circulate it to the committee when it is ready.");
      if (chair) steps.push("When a revision has been circulated and discussed, open a ballot or record the meeting's vote, then record the decision.");
      if (!studio && !chair) steps.push("Read each circulated revision, comment on anything you want changed, and vote when the chair opens a ballot.");
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
      <ul className="list-disc space-y-1 pl-5" data-testid="next-steps">{steps.map((s) => <li key={s}>{s}</li>)}</ul>
    </Card>
  );
}
