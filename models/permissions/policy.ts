/**
 * Who may do what on a commission. Pure: the data-access layer looks up the actor's roles and asks here.
 * Roles: studio side (owner, designer) and client side (chair, member, adviser; treasurer is a flag).
 */
import type { CommitteeRole, StudioRole } from "./roles";

export { COMMITTEE_ROLES, STUDIO_ROLES, type CommitteeRole, type StudioRole } from "./roles";

export interface Actor {
  /** Role in the studio that owns the commission, if any. */
  studioRole: StudioRole | null;
  /** Role on this commission's committee, if any. */
  committeeRole: CommitteeRole | null;
  treasurer: boolean;
}

export const ACTIONS = [
  "commission.view",
  "commission.create",
  "commission.changeStage",
  "people.view",
  "people.inviteCommittee",
  "people.inviteAdviser",
  "rules.edit",
  "revision.viewDraft",
  "revision.viewCirculated",
  "revision.draft",
  "revision.circulate",
  "attachment.upload",
  "comment.post",
  "comment.resolve",
  "progress.post",
  "ballot.open",
  "ballot.close",
  "ballot.vote",
  "ballot.recordMeeting",
  "decision.record",
  "permission.record",
  "handover.sign",
  "release.release",
  "money.set",
  "condition.answer",
  "deposit.pay",
  "deposit.waive",
  "studio.manage",
  "trail.view",
  "record.export",
] as const;
export type Action = (typeof ACTIONS)[number];

type Rule = (a: Actor) => boolean;
const studio: Rule = (a) => a.studioRole !== null;
const owner: Rule = (a) => a.studioRole === "owner";
const chair: Rule = (a) => a.committeeRole === "chair";
const committee: Rule = (a) => a.committeeRole !== null;
const anyone: Rule = (a) => studio(a) || committee(a);

/** Who may do what, one line an action. Ballot.vote is further narrowed by the rules (chair votes?). */
const RULES: Record<Action, Rule> = {
  "commission.view": anyone,
  "commission.create": studio,
  "commission.changeStage": studio,
  "people.view": anyone,
  "people.inviteCommittee": studio,
  "people.inviteAdviser": (a) => studio(a) || chair(a),
  "rules.edit": chair,
  "revision.viewDraft": studio,
  "revision.viewCirculated": anyone,
  "revision.draft": studio,
  "revision.circulate": studio,
  "attachment.upload": studio,
  "comment.post": anyone,
  "comment.resolve": studio,
  "progress.post": studio,
  "ballot.open": chair,
  "ballot.close": chair,
  "ballot.vote": (a) => a.committeeRole === "member" || a.committeeRole === "chair",
  "ballot.recordMeeting": chair,
  "decision.record": chair,
  "permission.record": chair,
  "handover.sign": chair,
  "release.release": owner,
  "money.set": owner,
  "condition.answer": studio,
  "deposit.pay": (a) => chair(a) || (a.treasurer && a.committeeRole === "member"),
  "deposit.waive": owner,
  "studio.manage": owner,
  "trail.view": anyone,
  "record.export": anyone,
};

export function can(actor: Actor, action: Action): boolean {
  return RULES[action](actor);
}

/** May this actor vote on a ballot under these rules? Members always; the chair only if the rules say so. */
export function mayVote(actor: Actor, chairVotes: boolean): boolean {
  if (actor.committeeRole === "member") return true;
  return actor.committeeRole === "chair" && chairVotes;
}

/** Which committee roles this actor may invite people into. */
export function invitableRoles(actor: Actor): CommitteeRole[] {
  if (can(actor, "people.inviteCommittee")) return ["chair", "member", "adviser"];
  if (can(actor, "people.inviteAdviser")) return ["adviser"];
  return [];
}

export const ROLE_LABELS: Record<StudioRole | CommitteeRole, string> = {
  owner: "Studio owner",
  designer: "Designer",
  chair: "Chair",
  member: "Committee member",
  adviser: "Adviser",
};
