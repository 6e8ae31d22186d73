import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { trailEvents } from "@/db/schema";
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

/**
 * Appends one event to the commission's chain, inside the caller's transaction: if the append fails the
 * whole change rolls back. The chain head is read under the commission's row lock.
 */
export async function appendTrail(tx: Tx, e: TrailEntry) {
  await lockCommission(tx, e.commissionId);
  const [last] = await tx
    .select({ seq: trailEvents.seq, hash: trailEvents.hash })
    .from(trailEvents)
    .where(eq(trailEvents.commissionId, e.commissionId))
    .orderBy(desc(trailEvents.seq))
    .limit(1);
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
  return { ...body, hash };
}
