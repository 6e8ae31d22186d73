import "server-only";
import { and, asc, eq, inArray, lte } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { ballots, commissionMembers, commissions, revisions, users, votes } from "@/db/schema";
import { decideBallot, type BallotRules } from "@/models/ballot";
import type { FrozenResult, VoteChoice } from "@/models/ballot/state";
import { appendTrail, lockCommission, type Tx } from "../trail";
import { rulesOf } from "./commissions";

export type BallotRow = typeof ballots.$inferSelect;
export type Voter = { userId: string; name: string; role: "chair" | "member" };

/** The people entitled to vote now: the members, and the chair if the rules say the chair votes. */
export async function votingMembersOf(db: Db | Tx, commissionId: number, chairVotes: boolean): Promise<Voter[]> {
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: commissionMembers.role })
    .from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId))
    .where(and(eq(commissionMembers.commissionId, commissionId), inArray(commissionMembers.role, chairVotes ? ["chair", "member"] : ["member"])))
    .orderBy(asc(commissionMembers.id));
  return rows.map((r) => ({ userId: r.userId, name: r.name ?? r.email, role: r.role as Voter["role"] }));
}

export function countChoices(choices: VoteChoice[]) {
  const c = { inFavour: 0, against: 0, abstain: 0 };
  for (const v of choices) c[v === "in-favour" ? "inFavour" : v] += 1;
  return c;
}

/** The result under the rules, by the one pure function in models/ballot. */
export function freeze(rules: BallotRules, votingMembers: number, counts: { inFavour: number; against: number; abstain: number }): FrozenResult {
  const r = decideBallot({ votingMembers, quorum: rules.quorum, threshold: rules.threshold, ...counts });
  return { rules, votingMembers, ...counts, ...r };
}

/**
 * Closes an open electronic ballot inside the caller's transaction (commission lock held): counts the
 * votes of those entitled to vote at the close, freezes the result and appends "ballot closed".
 */
export async function closeBallotTx(
  tx: Tx, ballot: BallotRow, number: number, actor: { id: string | null; role: string }, by: "chair" | "closing time",
): Promise<FrozenResult> {
  const [c] = await tx.select().from(commissions).where(eq(commissions.id, ballot.commissionId));
  const rules = rulesOf(c);
  const voters = await votingMembersOf(tx, ballot.commissionId, rules.chairVotes);
  const entitled = new Set(voters.map((v) => v.userId));
  const cast = await tx.select({ userId: votes.userId, choice: votes.choice }).from(votes).where(eq(votes.ballotId, ballot.id));
  const result = freeze(rules, voters.length, countChoices(cast.filter((v) => entitled.has(v.userId)).map((v) => v.choice)));
  const closedAt = by === "closing time" && ballot.closesAt ? ballot.closesAt : new Date();
  await tx.update(ballots).set({ status: "closed", closedAt, result: { ...result } }).where(eq(ballots.id, ballot.id));
  await appendTrail(tx, {
    commissionId: ballot.commissionId, actorId: actor.id, actorRole: actor.role, action: "ballot closed",
    subjectType: "ballot", subjectId: ballot.id,
    payload: { number, ...result, closedBy: by, closesAt: ballot.closesAt?.toISOString() ?? null, closedAt: closedAt.toISOString() },
  });
  return result;
}

/**
 * Closes every open ballot whose closing time has passed, each in its own transaction under the
 * commission's lock (safe on several nodes: the ballot is re-read under the lock). Run by the worker and
 * before every read and write of a ballot, so a ballot is never seen open after its time.
 */
export async function closeDueBallots(scope: { revisionId?: number; ballotId?: number } = {}, now = new Date()): Promise<number> {
  const db = getDb();
  const conds = [eq(ballots.status, "open"), eq(ballots.kind, "electronic"), lte(ballots.closesAt, now)];
  if (scope.revisionId) conds.push(eq(ballots.revisionId, scope.revisionId));
  if (scope.ballotId) conds.push(eq(ballots.id, scope.ballotId));
  const due = await db.select({ id: ballots.id, commissionId: ballots.commissionId }).from(ballots).where(and(...conds)).limit(200);
  let closed = 0;
  for (const d of due) {
    const done = await db.transaction(async (tx) => {
      await lockCommission(tx, d.commissionId);
      const [b] = await tx.select().from(ballots).where(eq(ballots.id, d.id));
      if (!b || b.status !== "open" || !b.closesAt || b.closesAt.getTime() > now.getTime()) return false;
      const [r] = await tx.select({ number: revisions.number }).from(revisions).where(eq(revisions.id, b.revisionId));
      await closeBallotTx(tx, b, r.number, { id: null, role: "system" }, "closing time");
      return true;
    });
    if (done) closed++;
  }
  return closed;
}

export function revisionStateRefusal(state: string, number: number): string | null {
  if (state === "circulated") return null;
  if (state === "decided") return `Revision ${number} has already been decided.`;
  if (state === "superseded") return `Revision ${number} has been superseded by a newer revision; work on the current one.`;
  return `Revision ${number} has not been circulated yet.`;
}
