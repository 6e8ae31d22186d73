import type { TrailEvent } from "./event";

const ROLE: Record<string, string> = {
  owner: "studio owner", designer: "designer", chair: "chair", member: "committee member", adviser: "adviser", system: "Placet",
};
const s = (v: unknown) => (typeof v === "string" ? v : v === undefined || v === null ? "" : JSON.stringify(v));

/** One plain sentence for an event, from its action and payload (the actor's name is shown beside it). */
export function describeEvent(e: Pick<TrailEvent, "action" | "payload" | "subjectType" | "subjectId">): string {
  const p = e.payload as Record<string, unknown>;
  switch (e.action) {
    case "commission created": return `Created the commission "${s(p.title)}" for ${s(p.clientBody)}.`;
    case "person invited": return `Invited ${s(p.name) || s(p.email)} as ${ROLE[s(p.role)] ?? s(p.role)}${p.treasurer ? " and treasurer" : ""}.`;
    case "role changed": {
      const from = p.from as { role?: string } | undefined, to = p.to as { role?: string; treasurer?: boolean } | undefined;
      return `Changed ${s(p.email)} from ${ROLE[s(from?.role)] ?? s(from?.role)} to ${ROLE[s(to?.role)] ?? s(to?.role)}${to?.treasurer ? " (treasurer)" : ""}.`;
    }
    case "ballot rules changed": return "Changed the committee's ballot rules.";
    case "stage changed": return `Moved the commission from ${s(p.from)} to ${s(p.to)}${p.reason ? `: ${s(p.reason)}` : "."}`;
    case "revision drafted": return `Started drafting Revision ${s(p.number)}.`;
    case "revision updated": return `Updated the draft of Revision ${s(p.number)}.`;
    case "attachment added": return `Attached "${s(p.name)}" to Revision ${s(p.number)}.`;
    case "attachment removed": return `Removed "${s(p.name)}" from Revision ${s(p.number)}.`;
    case "revision circulated": return `Circulated Revision ${s(p.number)} to the committee (content hash ${s(p.contentHash).slice(0, 12)}…).`;
    case "revision superseded": return `Revision ${s(p.number)} was superseded by Revision ${s(p.by)}.`;
    case "comment posted": return `Commented on Revision ${s(p.number)}.`;
    case "comment edited": return `Edited a comment on Revision ${s(p.number)}.`;
    case "comment resolved": return `Marked a comment thread on Revision ${s(p.number)} resolved.`;
    case "comment reopened": return `Reopened a comment thread on Revision ${s(p.number)}.`;
    case "ballot opened": return `Opened a ballot on Revision ${s(p.number)}, closing ${s(p.closesAt)}.`;
    case "vote cast": return `Voted ${s(p.choice)} on Revision ${s(p.number)}.`;
    case "vote changed": return `Changed their vote to ${s(p.choice)} on Revision ${s(p.number)}.`;
    case "ballot closed": return `The ballot on Revision ${s(p.number)} closed: ${s(p.outcome)} (${s(p.inFavour)} in favour, ${s(p.against)} against, ${s(p.abstain)} abstaining).`;
    case "ballot withdrawn": return `The ballot on Revision ${s(p.number)} was withdrawn${p.reason ? `: ${s(p.reason)}` : "."}`;
    case "meeting vote recorded": return `Recorded the vote taken at the meeting of ${s(p.meetingDate)} on Revision ${s(p.number)}: ${s(p.outcome)}.`;
    case "decision recorded": return `Recorded the decision on Revision ${s(p.number)}: ${s(p.outcomeLabel) || s(p.outcome)}.`;
    case "studio settings changed": return "Changed the studio's settings.";
    default: return `${e.action[0].toUpperCase()}${e.action.slice(1)}.`;
  }
}
