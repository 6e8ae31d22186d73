import type { Stage } from "@/models/stages";
import type { BallotOutcome } from "@/models/ballot/decide";

/** What a committee can decide about a circulated revision, in the trade's words. */
export const DECISION_OUTCOMES = ["approved", "approved-as-noted", "revise-and-resubmit", "not-approved"] as const;
export type DecisionOutcome = (typeof DECISION_OUTCOMES)[number];

export const DECISION_LABELS: Record<DecisionOutcome, string> = {
  approved: "Approved",
  "approved-as-noted": "Approved as noted",
  "revise-and-resubmit": "Revise and resubmit",
  "not-approved": "Not approved",
};

export const needsCarriedBallot = (o: DecisionOutcome) => o === "approved" || o === "approved-as-noted";

export const CONDITION_MAX = 500;
export const CONDITIONS_MAX = 40;
export const STATEMENT_MAX = 4000;

export interface DecisionInput {
  outcome: DecisionOutcome;
  conditions: string[];
  statement: string;
}

type Parsed<T> = { ok: true; data: T } | { ok: false; errors: Record<string, string> };

/** Conditions come one per line (a string) or as a list; blank lines are dropped. */
export function splitConditions(raw: unknown): string[] | null {
  if (raw === undefined || raw === null) return [];
  const lines = typeof raw === "string" ? raw.split(/\r?\n/) : Array.isArray(raw) && raw.every((x) => typeof x === "string") ? (raw as string[]) : null;
  if (!lines) return null;
  return lines.map((l) => l.trim()).filter(Boolean);
}

export function parseDecision(input: unknown): Parsed<DecisionInput> {
  const o = (input && typeof input === "object" ? input : {}) as Record<string, unknown>;
  const errors: Record<string, string> = {};
  const outcome = o.outcome as DecisionOutcome;
  if (!(DECISION_OUTCOMES as readonly unknown[]).includes(outcome)) {
    errors.outcome = "Choose approved, approved as noted, revise and resubmit, or not approved.";
  }
  let conditions = splitConditions(o.conditions);
  if (!conditions) errors.conditions = "Write the conditions as text, one per line.";
  else if (outcome === "approved-as-noted" && !conditions.length) errors.conditions = "Approved as noted needs at least one condition, one per line.";
  else if (conditions.length > CONDITIONS_MAX) errors.conditions = `Keep to ${CONDITIONS_MAX} conditions or fewer.`;
  else if (conditions.some((c) => c.length > CONDITION_MAX)) errors.conditions = `Keep each condition under ${CONDITION_MAX} characters.`;
  else if (outcome !== "approved-as-noted" && conditions.length) {
    errors.conditions = "Conditions belong only to approved as noted; clear them or choose approved as noted.";
  }
  const statement = o.statement === undefined || o.statement === null ? "" : o.statement;
  if (typeof statement !== "string") errors.statement = "The statement must be text.";
  else if (statement.trim().length > STATEMENT_MAX) errors.statement = `Keep the statement under ${STATEMENT_MAX} characters.`;
  if (Object.keys(errors).length) return { ok: false, errors };
  conditions = conditions ?? [];
  return { ok: true, data: { outcome, conditions, statement: (statement as string).trim() } };
}

/** The ballot a decision rests on: the latest one held on the revision (open, closed or withdrawn). */
export interface DecisionBasis {
  number: number;
  latest: { status: "open" | "closed" | "withdrawn"; outcome: BallotOutcome | null } | null;
}

/** Why the chair may not record this outcome now, in plain words, or null if they may. */
export function decisionRefusal(outcome: DecisionOutcome, basis: DecisionBasis): string | null {
  const b = basis.latest;
  if (b?.status === "open") return `The ballot on Revision ${basis.number} is still open. Close it, or wait for its closing time, before recording the decision.`;
  if (!needsCarriedBallot(outcome)) return null;
  if (!b || b.status === "withdrawn") {
    return `Approval needs a carried ballot on Revision ${basis.number}, and none has been held. Open a ballot or record the meeting's vote first.`;
  }
  if (b.outcome === "failed") return `The ballot on Revision ${basis.number} failed, so it cannot be approved. You may record revise and resubmit, or not approved.`;
  if (b.outcome === "no-quorum") return `The ballot on Revision ${basis.number} did not reach its quorum, so nothing was decided. Hold another ballot before approving.`;
  return null;
}

/** Where the commission stands after the decision (only stages before approval move). */
export function stageAfterDecision(stage: Stage, outcome: DecisionOutcome): Stage {
  const early = stage === "brief" || stage === "concept" || stage === "design-development";
  if (!early) return stage;
  return needsCarriedBallot(outcome) ? "approved" : "design-development";
}

// --- What the decision form and summary receive (GET /api/revisions/{id}/decision) -------------

export interface DecisionTallyDto {
  ballotId: number;
  kind: "electronic" | "meeting";
  meetingDate: string | null;
  inFavour: number;
  against: number;
  abstain: number;
  votingMembers: number;
  outcome: BallotOutcome;
  outcomeLabel: string;
  /** For a meeting vote: where the minutes are. */
  minutesRef: string | null;
  /** Who was entitled to vote (fixed when the ballot opened); empty when not recorded. */
  roll: { name: string; role: "chair" | "member" }[];
}

export interface DecisionDto {
  id: number;
  revisionId: number;
  number: number;
  outcome: DecisionOutcome;
  outcomeLabel: string;
  conditions: string[];
  statement: string;
  contentHash: string;
  recordedByName: string;
  recordedAt: string;
  tally: DecisionTallyDto | null;
}

export interface DecisionStateDto {
  revisionId: number;
  number: number;
  revisionState: "draft" | "circulated" | "superseded" | "decided";
  contentHash: string | null;
  decision: DecisionDto | null;
  /** The ballot the decision would rest on now. */
  basis: DecisionTallyDto | null;
  /** Per outcome: null if allowed now, else why not. */
  refusals: Record<DecisionOutcome, string | null>;
  you: { mayRecord: boolean; freshSignInNeeded: boolean; signedInAt: string | null };
}
