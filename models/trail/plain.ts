import type { TrailEvent } from "./event";
import { STAGE_LABELS } from "../stages";

const ROLE: Record<string, string> = {
  owner: "studio owner", designer: "designer", chair: "chair", member: "committee member", adviser: "adviser", system: "Placet",
};
const CHOICE: Record<string, string> = { "in-favour": "voted in favour", against: "voted against", abstain: "abstained" };
const CHOICE_NOW: Record<string, string> = { "in-favour": "in favour", against: "against", abstain: "abstaining" };
const OUTCOME: Record<string, string> = { carried: "carried", failed: "failed", "no-quorum": "no quorum" };
const cap = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);
/** An ISO instant as "2026-12-05 18:00 UTC"; anything else as written. */
const when = (v: unknown) => (typeof v === "string" && /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/.test(v) ? `${v.slice(0, 16).replace("T", " ")} UTC` : s(v));
/** People's words, quoted and cut to a line (the full text stays in the payload). */
const said = (v: unknown) => { const t = s(v).replace(/\s+/g, " ").trim(); return `“${t.length > 160 ? `${t.slice(0, 157)}…` : t}”`; };
const stage = (v: unknown) => (STAGE_LABELS as Record<string, string>)[String(v)]?.toLowerCase() ?? String(v);
const s = (v: unknown) => (typeof v === "string" ? v : v === undefined || v === null ? "" : JSON.stringify(v));

/** "; the roll: Ann, Ben (chair)" from a roll in a payload, or nothing. */
function rollWords(v: unknown): string {
  if (!Array.isArray(v) || !v.length) return "";
  return `; on the roll: ${v.map((r: { name?: unknown; role?: unknown }) => `${s(r.name)}${r.role === "chair" ? " (chair)" : ""}`).join(", ")}`;
}

/** ": threshold majority → two-thirds" for the rules that changed, or nothing. */
function rulesDiff(before: unknown, after: unknown): string {
  if (!before || !after || typeof before !== "object" || typeof after !== "object") return "";
  const b = before as Record<string, unknown>, a = after as Record<string, unknown>;
  const names: Record<string, string> = { quorum: "quorum", threshold: "threshold", chairVotes: "chair votes", electronicAuthority: "authority for electronic ballots" };
  const parts = Object.keys(names).filter((k) => s(b[k]) !== s(a[k])).map((k) => `${names[k]} ${s(b[k]) || "none"} → ${s(a[k]) || "none"}`);
  return parts.length ? `: ${parts.join("; ")}` : " (no change)";
}

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
    case "ballot rules changed": return `Changed the committee's ballot rules${rulesDiff(p.before, p.after)}.`;
    case "ballot rules confirmed": return "Confirmed the ballot rules the studio proposed.";
    case "stage changed": return `Moved the commission from ${stage(p.from)} to ${stage(p.to)}${p.reason ? `: ${s(p.reason)}.` : "."}`;
    case "revision drafted": return `Started drafting Revision ${s(p.number)}.`;
    case "revision updated": return `Worked on the draft of Revision ${s(p.number)}${Array.isArray(p.changed) && p.changed.length ? ` (${p.changed.length} value${p.changed.length === 1 ? "" : "s"} changed)` : ""}.`;
    case "attachment added": return `Attached a file (${s(p.kind).toUpperCase()}) to the draft of Revision ${s(p.number)}.`;
    case "attachment removed": return `Removed a file from the draft of Revision ${s(p.number)}.`;
    case "revision circulated": return `Circulated Revision ${s(p.number)} to the committee (content hash ${s(p.contentHash).slice(0, 12)}…).`;
    case "revision superseded": return `Revision ${s(p.number)} was superseded by Revision ${s(p.by)}.`;
    case "comment posted": {
      const t = p.target as { kind?: string; part?: string } | undefined;
      const where = t?.kind === "attachment" ? " (on a drawing)" : t?.kind === "model" ? ` (on the ${s(t.part)})` : "";
      const what = p.body ? `: ${said(p.body)}` : ".";
      return p.parentId ? `Replied to a comment on Revision ${s(p.number)}${what}` : `Commented on Revision ${s(p.number)}${where}${what}`;
    }
    case "comment edited": return `Edited a comment on Revision ${s(p.number)}${p.to ? `, now reading ${said(p.to)}` : "."}`;
    case "comment resolved": return `Marked a comment thread on Revision ${s(p.number)} resolved.`;
    case "comment reopened": return `Reopened a comment thread on Revision ${s(p.number)}.`;
    case "ballot opened": return `Opened a ballot on Revision ${s(p.number)}, closing ${when(p.closesAt)}${rollWords(p.roll)}.`;
    case "vote cast": return `${cap(CHOICE[s(p.choice)] ?? `voted ${s(p.choice)}`)} on Revision ${s(p.number)}.`;
    case "vote changed": return `Changed their vote on Revision ${s(p.number)}: now ${CHOICE_NOW[s(p.choice)] ?? s(p.choice)}${p.previous ? `, was ${CHOICE_NOW[s(p.previous)] ?? s(p.previous)}` : ""}.`;
    case "ballot closed": return `The ballot on Revision ${s(p.number)} closed${p.closedBy === "closing time" ? " at its closing time" : ""}: ${OUTCOME[s(p.outcome)] ?? s(p.outcome)} (${s(p.inFavour)} in favour, ${s(p.against)} against, ${s(p.abstain)} abstaining).`;
    case "ballot withdrawn": return `The ballot on Revision ${s(p.number)} was withdrawn${p.reason ? `: ${s(p.reason)}` : "."}`;
    case "meeting vote recorded": return `Recorded the vote taken at the meeting of ${s(p.meetingDate)} on Revision ${s(p.number)} (recorded by the chair from a meeting${p.minutesRef ? `; minutes: ${s(p.minutesRef)}` : ""}): ${OUTCOME[s(p.outcome)] ?? s(p.outcome)} (${s(p.inFavour)} in favour, ${s(p.against)} against, ${s(p.abstain)} abstaining).`;
    case "decision recorded": {
      const n = Array.isArray(p.conditions) ? p.conditions.length : 0;
      return `Recorded the decision on Revision ${s(p.number)}: ${s(p.outcomeLabel) || s(p.outcome)}${n ? ` (${n} condition${n === 1 ? "" : "s"})` : ""}.`;
    }
    case "studio settings changed": return "Changed the studio's settings.";
    case "permission required": return `Listed a permission the commission needs: ${s(p.name)}${p.authority ? ` (from ${s(p.authority)})` : ""}.`;
    case "permission dropped": return `Took ${s(p.name)} off the list of permissions needed.`;
    case "no permission required": return `Recorded that no outside permission is needed: ${said(p.reason)}`;
    case "permission recorded": return `Recorded ${s(p.name)}: granted by ${s(p.authority)} on ${s(p.grantedOn)}, reference ${s(p.reference)}.`;
    case "condition answered": return `Answered condition ${s(p.condition)} of the approval of Revision ${s(p.number)}: ${said(p.answer)}`;
    case "released to fabrication": return `Released Revision ${s(p.number)} to fabrication (content hash ${s(p.contentHash).slice(0, 12)}…).`;
    default: return `${e.action[0].toUpperCase()}${e.action.slice(1)}.`;
  }
}
