import "server-only";
import { and, asc, eq, gt, lte } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { ballotRoll, ballots, commissionMembers, commissions, revisions, users, votes } from "@/db/schema";
import type { BallotOnRevision } from "@/models/ballot/route";
import type { FrozenResult } from "@/models/ballot/state";
import { closingResult, rollOf, type RollEntry } from "@/models/ballot/tally";
import { ConflictError } from "../errors";
import { appendTrail, lockCommission, type Tx } from "../trail";
import { rulesOf } from "./commissions";

export type BallotRow = typeof ballots.$inferSelect;
export type Voter = RollEntry;

/** The committee as it stands, in the order people joined. */
export async function committeeOf(db: Db | Tx, commissionId: number) {
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: commissionMembers.role })
    .from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId))
    .where(eq(commissionMembers.commissionId, commissionId))
    .orderBy(asc(commissionMembers.id));
  return rows.map((r) => ({ userId: r.userId, name: r.name ?? r.email, role: r.role }));
}

/** Who would be on the roll if a ballot opened now (models/ballot/tally decides). */
export async function currentRoll(db: Db | Tx, commissionId: number, chairVotes: boolean): Promise<RollEntry[]> {
  return rollOf(await committeeOf(db, commissionId), chairVotes);
}

/** A ballot's roll as stored when it opened (or when a meeting vote was recorded). */
export async function loadRoll(db: Db | Tx, ballotId: number): Promise<RollEntry[]> {
  return db.select({ userId: ballotRoll.userId, name: ballotRoll.name, role: ballotRoll.role })
    .from(ballotRoll).where(eq(ballotRoll.ballotId, ballotId)).orderBy(asc(ballotRoll.position));
}

export async function storeRoll(tx: Tx, ballotId: number, roll: RollEntry[]): Promise<void> {
  if (!roll.length) return;
  await tx.insert(ballotRoll).values(roll.map((r, i) => ({ ballotId, userId: r.userId, name: r.name, role: r.role, position: i })));
}

/** The revision's ballots, oldest first, as the route rules (models/ballot/route) read them. */
export async function ballotsOn(db: Db | Tx, revisionId: number): Promise<BallotOnRevision[]> {
  const rows = await db.select({ kind: ballots.kind, status: ballots.status, result: ballots.result })
    .from(ballots).where(eq(ballots.revisionId, revisionId)).orderBy(asc(ballots.id));
  return rows.map((b) => ({ kind: b.kind, status: b.status, result: (b.result as FrozenResult | null) ?? null }));
}

/**
 * Closes an open electronic ballot inside the caller's transaction (commission lock held): counts the
 * votes of the people on its roll, freezes the result and appends "ballot closed".
 */
export async function closeBallotTx(
  tx: Tx, ballot: BallotRow, number: number, actor: { id: string | null; role: string }, by: "chair" | "closing time",
): Promise<FrozenResult> {
  const [c] = await tx.select().from(commissions).where(eq(commissions.id, ballot.commissionId));
  const rules = rulesOf(c);
  const roll = await loadRoll(tx, ballot.id);
  const cast = await tx.select({ userId: votes.userId, choice: votes.choice }).from(votes).where(eq(votes.ballotId, ballot.id));
  const result = closingResult(rules, roll, cast);
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
 * commission's lock (safe on several nodes: the ballot is re-read under the lock). Run by the worker and,
 * as a read that writes, before every read and write of a ballot, so a ballot is never seen open after
 * its time.
 */
export async function closeDueBallots(scope: { revisionId?: number; ballotId?: number; commissionId?: number } = {}, now = new Date()): Promise<number> {
  const db = getDb();
  const conds = [eq(ballots.status, "open"), eq(ballots.kind, "electronic"), lte(ballots.closesAt, now)];
  if (scope.revisionId) conds.push(eq(ballots.revisionId, scope.revisionId));
  if (scope.ballotId) conds.push(eq(ballots.id, scope.ballotId));
  if (scope.commissionId) conds.push(eq(ballots.commissionId, scope.commissionId));
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

/**
 * The ballot open on the commission now (any revision), if any, with its revision's number. One past its
 * closing time is not open any more (its roll decides its result, whatever happens after).
 */
export async function openBallotOnCommission(db: Db | Tx, commissionId: number, now = new Date()) {
  const [b] = await db.select({ id: ballots.id, closesAt: ballots.closesAt, number: revisions.number }).from(ballots)
    .innerJoin(revisions, eq(revisions.id, ballots.revisionId))
    .where(and(eq(ballots.commissionId, commissionId), eq(ballots.status, "open"), gt(ballots.closesAt, now))).limit(1);
  return b;
}

/** The revision re-read under the lock; only a circulated one can be voted on. */
export async function freshRevision(tx: Tx, revisionId: number) {
  const [r] = await tx.select().from(revisions).where(eq(revisions.id, revisionId));
  const refusal = revisionStateRefusal(r.state, r.number);
  if (refusal) throw new ConflictError(refusal);
  return r;
}

export async function openBallotOn(tx: Tx, revisionId: number): Promise<BallotRow | undefined> {
  const [b] = await tx.select().from(ballots).where(and(eq(ballots.revisionId, revisionId), eq(ballots.status, "open"))).limit(1);
  return b;
}

export const UNCONFIRMED_RULES = "The studio proposed this committee's rules and the chair has not confirmed them yet. Confirm (or change) them on the rules page before the first vote.";

export function revisionStateRefusal(state: string, number: number): string | null {
  if (state === "circulated") return null;
  if (state === "decided") return `Revision ${number} has already been decided.`;
  if (state === "superseded") return `Revision ${number} has been superseded by a newer revision; work on the current one.`;
  return `Revision ${number} has not been circulated yet.`;
}
