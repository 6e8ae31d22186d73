import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { ballots, commissions, decisions, revisions, users } from "@/db/schema";
import { BALLOT_OUTCOME_LABELS, type FrozenResult } from "@/models/ballot/state";
import {
  DECISION_LABELS, DECISION_OUTCOMES, decisionRefusal, parseDecision, stageAfterDecision,
  type DecisionDto, type DecisionOutcome, type DecisionStateDto, type DecisionTallyDto,
} from "@/models/decision";
import { can } from "@/models/permissions/policy";
import { ConflictError, ForbiddenError, FreshSignInRequired, ValidationError } from "../errors";
import { appendTrail, type Tx } from "../trail";
import { closeDueBallots, loadRoll, revisionStateRefusal, type BallotRow } from "./ballot-core";
import { freshness, lockedFor } from "./locked";
import { mailDecision } from "./decision-mail";
import { loadRevisionById } from "./revision-access";
import type { Viewer } from "./viewer";

/** The frozen result of a ballot, with the roll it was counted on. */
async function tallyOf(db: Db | Tx, b: BallotRow | undefined): Promise<DecisionTallyDto | null> {
  const r = b?.result as FrozenResult | null | undefined;
  if (!b || !r) return null;
  const roll = (await loadRoll(db, b.id)).map((p) => ({ name: p.name, role: p.role }));
  return {
    ballotId: b.id, kind: b.kind, meetingDate: b.meetingDate, minutesRef: b.minutesRef, inFavour: r.inFavour, against: r.against, abstain: r.abstain,
    votingMembers: r.votingMembers, outcome: r.outcome, outcomeLabel: BALLOT_OUTCOME_LABELS[r.outcome], roll,
  };
}

async function latestBallot(db: Db | Tx, revisionId: number): Promise<BallotRow | undefined> {
  const [b] = await db.select().from(ballots).where(eq(ballots.revisionId, revisionId)).orderBy(desc(ballots.id)).limit(1);
  return b;
}

const basisOf = (number: number, b: BallotRow | undefined) => ({
  number, latest: b ? { status: b.status, outcome: (b.result as FrozenResult | null)?.outcome ?? null } : null,
});

const CHAIR_ONLY = "Only the chair records the committee's decision.";
const FRESH = "You signed in more than 10 minutes ago. Before you record a decision, confirm it is you with a new sign-in link.";

function isDuplicate(err: unknown): boolean {
  const e = err as { code?: string; errno?: number; cause?: { code?: string; errno?: number } };
  return e?.code === "ER_DUP_ENTRY" || e?.errno === 1062 || e?.cause?.code === "ER_DUP_ENTRY" || e?.cause?.errno === 1062;
}

/**
 * The chair records the committee's decision on the current circulated revision. Approval needs a carried
 * ballot on it; the chair must have signed in within the last ten minutes. One decision per revision,
 * however many times it is sent: the commission's lock orders them and the unique key is the backstop.
 */
export async function recordDecision(viewer: Viewer, revisionId: number, input: unknown): Promise<DecisionDto> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "decision.record")) throw new ForbiddenError(CHAIR_ONLY);
  const parsed = parseDecision(input);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  const d = parsed.data;
  await closeDueBallots({ revisionId });
  // Say what stands in the way before asking the chair to sign in again; checked once more under the lock.
  const state = revisionStateRefusal(revision.state, revision.number);
  if (state) throw new ConflictError(state);
  const early = decisionRefusal(d.outcome, basisOf(revision.number, await latestBallot(db, revisionId)));
  if (early) throw new ValidationError({ outcome: early });
  if ((await freshness(viewer)).needed) throw new FreshSignInRequired(FRESH);
  try {
    return await db.transaction(async (tx) => {
      // Role, freshness and state again under the lock: a chair demoted a moment ago is refused here.
      const locked = await lockedFor(tx, viewer, revision.commissionId, { action: "decision.record", refusal: CHAIR_ONLY, fresh: { message: FRESH } });
      const [r] = await tx.select().from(revisions).where(eq(revisions.id, revisionId));
      const [already] = await tx.select({ id: decisions.id }).from(decisions).where(eq(decisions.revisionId, revisionId));
      if (already) throw new ConflictError(`Revision ${r.number} has already been decided.`);
      const refusal = revisionStateRefusal(r.state, r.number);
      if (refusal) throw new ConflictError(refusal);
      const b = await latestBallot(tx, revisionId);
      const why = decisionRefusal(d.outcome, basisOf(r.number, b));
      if (why) throw new ValidationError({ outcome: why });
      const tally = await tallyOf(tx, b);
      const now = new Date();
      const c = locked.commission;
      const [res] = await tx.insert(decisions).values({
        revisionId, commissionId: r.commissionId, outcome: d.outcome, conditions: d.conditions, statement: d.statement,
        ballotId: tally?.ballotId ?? null, contentHash: r.contentHash!, recordedBy: viewer.id, recordedAt: now,
      }).$returningId();
      await tx.update(revisions).set({ state: "decided", updatedAt: now }).where(eq(revisions.id, revisionId));
      const label = DECISION_LABELS[d.outcome];
      await appendTrail(tx, {
        commissionId: r.commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "decision recorded",
        subjectType: "revision", subjectId: revisionId,
        payload: { number: r.number, outcome: d.outcome, outcomeLabel: label, conditions: d.conditions, statement: d.statement, tally, ballotId: tally?.ballotId ?? null, contentHash: r.contentHash },
      });
      const to = stageAfterDecision(c.stage, d.outcome);
      if (to !== c.stage) {
        await tx.update(commissions).set({ stage: to, updatedAt: now }).where(eq(commissions.id, c.id));
        await appendTrail(tx, {
          commissionId: c.id, actorId: viewer.id, actorRole: locked.actingRole, action: "stage changed",
          subjectType: "commission", subjectId: c.id, payload: { from: c.stage, to, reason: `Revision ${r.number}: ${label.toLowerCase()}` },
        });
      }
      const dto: DecisionDto = {
        id: res.id, revisionId, number: r.number, outcome: d.outcome, outcomeLabel: label, conditions: d.conditions, statement: d.statement,
        contentHash: r.contentHash!, recordedByName: viewer.name, recordedAt: now.toISOString(), tally,
      };
      await mailDecision(tx, c, dto);
      return dto;
    });
  } catch (err) {
    if (isDuplicate(err)) throw new ConflictError(`Revision ${revision.number} has already been decided.`);
    throw err;
  }
}

/** The decision on a revision (for everyone who may see it) and, for the chair, what may be recorded now. */
export async function getDecision(viewer: Viewer, revisionId: number): Promise<DecisionStateDto> {
  const db = getDb();
  const { access, revision: r } = await loadRevisionById(db, viewer, revisionId);
  await closeDueBallots({ revisionId });
  const [row] = await db.select().from(decisions).where(eq(decisions.revisionId, revisionId));
  let decision: DecisionDto | null = null;
  if (row) {
    const [who] = await db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, row.recordedBy));
    const [b] = row.ballotId ? await db.select().from(ballots).where(eq(ballots.id, row.ballotId)) : [];
    decision = {
      id: row.id, revisionId, number: r.number, outcome: row.outcome, outcomeLabel: DECISION_LABELS[row.outcome],
      conditions: row.conditions, statement: row.statement, contentHash: row.contentHash,
      recordedByName: who?.name ?? who?.email ?? "The chair", recordedAt: row.recordedAt.toISOString(), tally: await tallyOf(db, b),
    };
  }
  const latest = await latestBallot(db, revisionId);
  const state = revisionStateRefusal(r.state, r.number);
  const refusals = Object.fromEntries(DECISION_OUTCOMES.map((o: DecisionOutcome) => [o, state ?? decisionRefusal(o, basisOf(r.number, latest))])) as DecisionStateDto["refusals"];
  const mayRecord = can(access.actor, "decision.record") && !state && !row;
  const fresh = mayRecord ? await freshness(viewer) : { needed: false, signedInAt: null };
  return {
    revisionId, number: r.number, revisionState: r.state, contentHash: r.contentHash, decision,
    basis: latest?.status === "closed" ? await tallyOf(db, latest) : null, refusals,
    you: { mayRecord, freshSignInNeeded: fresh.needed, signedInAt: fresh.signedInAt },
  };
}

/** For the fresh sign-in link: only the chair of this revision's commission, and only while it can be decided. */
export async function decisionSignInTarget(viewer: Viewer, revisionId: number): Promise<{ email: string; path: string }> {
  const { access, revision } = await loadRevisionById(getDb(), viewer, revisionId);
  if (!can(access.actor, "decision.record")) throw new ForbiddenError(CHAIR_ONLY);
  return { email: viewer.email, path: `/commissions/${revision.commissionId}/revisions/${revision.number}` };
}
