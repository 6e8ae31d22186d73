import "server-only";
import { eq, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { commissions, trailEvents } from "@/db/schema";
import { GENESIS_HASH, type TrailAction, type TrailEventBody } from "@/models/trail";
import { hashEventSync } from "@/models/trail/node-hash";

export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/** Takes the commission's row lock: every write to a commission goes through it, so its chain cannot fork. */
export async function lockCommission(tx: Tx, commissionId: number): Promise<void> {
  await tx.execute(sql`SELECT id FROM commissions WHERE id = ${commissionId} FOR UPDATE`);
}

export interface TrailEntry {
  commissionId: number;
  actorId: string | null;
  actorRole: string;
  action: TrailAction;
  subjectType: string;
  subjectId: string | number;
  payload: Record<string, unknown>;
}

/** The head the commission row holds: the last appended event's seq and hash (seq 0 and 64 zeros: none yet). */
export interface TrailHead {
  seq: number;
  hash: string;
}

/**
 * Appends one event to the commission's chain, inside the caller's transaction: if the append fails the
 * whole change rolls back. The head is read from the commission row under its lock and moved to the new
 * event in the same transaction, so the row always names the chain's true end.
 */
export async function appendTrail(tx: Tx, e: TrailEntry) {
  const [head] = await tx
    .select({ seq: commissions.trailHeadSeq, hash: commissions.trailHeadHash })
    .from(commissions)
    .where(eq(commissions.id, e.commissionId))
    .for("update");
  if (!head) throw new Error(`no commission ${e.commissionId} to append to`);
  const last = head.seq > 0 ? head : null;
  const at = new Date();
  const body: TrailEventBody = {
    commissionId: e.commissionId,
    seq: (last?.seq ?? 0) + 1,
    at: at.toISOString(),
    actorId: e.actorId,
    actorRole: e.actorRole,
    action: e.action,
    subjectType: e.subjectType,
    subjectId: String(e.subjectId),
    payload: JSON.parse(JSON.stringify(e.payload)) as Record<string, unknown>,
    prevHash: last?.hash ?? GENESIS_HASH,
  };
  const hash = hashEventSync(body.prevHash, body);
  await tx.insert(trailEvents).values({ ...body, at, hash });
  await tx.update(commissions).set({ trailHeadSeq: body.seq, trailHeadHash: hash }).where(eq(commissions.id, e.commissionId));
  return { ...body, hash };
}
