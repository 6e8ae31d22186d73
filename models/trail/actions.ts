/**
 * The closed list of things that can happen to a commission. Each trail event's
 * `action` is one of these short verb phrases, shown to people as written.
 * Adding an action is a one-line change here; removing or renaming one would
 * make older records fail verification, so never do that.
 */
export const TRAIL_ACTIONS = [
  // commission and people
  "commission created",
  "person invited",
  "invitation accepted",
  "role changed",
  "person removed",
  "ballot rules changed",
  "ballot rules confirmed",
  "stage changed",
  "studio settings changed",
  // revisions
  "revision drafted",
  "revision updated",
  "attachment added",
  "attachment removed",
  "revision circulated",
  "revision superseded",
  // comments
  "comment posted",
  "comment edited",
  "comment resolved",
  "comment reopened",
  // ballots and decisions
  "ballot opened",
  "vote cast",
  "vote changed",
  "ballot closed",
  "ballot withdrawn",
  "meeting vote recorded",
  "decision recorded",
  // release, fabrication and handover
  "permission required",
  "permission dropped",
  "no permission required",
  "permission recorded",
  "condition answered",
  "deposit invoiced",
  "deposit paid",
  "deposit waived",
  "released to fabrication",
  "progress posted",
  "condition ticked",
  "handover signed",
] as const;

export type TrailAction = (typeof TRAIL_ACTIONS)[number];

const known: ReadonlySet<string> = new Set(TRAIL_ACTIONS);

export function isTrailAction(value: unknown): value is TrailAction {
  return typeof value === "string" && known.has(value);
}
