import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissions, trailEvents, users } from "@/db/schema";
import { buildRecord, type TrailEvent, type TrailHead, type TrailRecord } from "@/models/trail";
import { describeEvent } from "@/models/trail/plain";
import { authorize } from "./access";
import type { Viewer } from "./viewer";

export type TrailRow = typeof trailEvents.$inferSelect;

/** A stored row as the event that was hashed. */
export function rowToEvent(r: TrailRow): TrailEvent {
  return {
    commissionId: r.commissionId, seq: r.seq, at: r.at.toISOString(), actorId: r.actorId, actorRole: r.actorRole,
    action: r.action as TrailEvent["action"], subjectType: r.subjectType, subjectId: r.subjectId,
    payload: r.payload, prevHash: r.prevHash, hash: r.hash,
  };
}

export async function loadChain(commissionId: number): Promise<TrailEvent[]> {
  return (await loadChainWithHead(commissionId)).events;
}

/**
 * The chain and the head the commission row holds, read in one transaction (one consistent snapshot
 * under REPEATABLE READ), so an append in between cannot make them disagree.
 */
export async function loadChainWithHead(commissionId: number): Promise<{ events: TrailEvent[]; head: TrailHead | null }> {
  return getDb().transaction(async (tx) => {
    const [c] = await tx.select({ seq: commissions.trailHeadSeq, hash: commissions.trailHeadHash }).from(commissions).where(eq(commissions.id, commissionId));
    const rows = await tx.select().from(trailEvents).where(eq(trailEvents.commissionId, commissionId)).orderBy(asc(trailEvents.seq));
    return { events: rows.map(rowToEvent), head: c ? { seq: c.seq, hash: c.hash } : null };
  });
}

export interface TrailEntryDto {
  seq: number;
  at: string;
  actorName: string;
  actorRole: string;
  action: string;
  sentence: string;
  hash: string;
  prevHash: string;
}

/** The trail in plain words, for the commission's people. */
export async function listTrail(viewer: Viewer, commissionId: number): Promise<{ entries: TrailEntryDto[]; finalHash: string | null; head: TrailHead }> {
  await authorize(getDb(), viewer, commissionId, "trail.view");
  const { events, head } = await loadChainWithHead(commissionId);
  const ids = [...new Set(events.map((e) => e.actorId).filter((x): x is string => Boolean(x)))];
  const people = ids.length ? await getDb().select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, ids)) : [];
  const nameOf = (id: string | null) => (id ? (people.find((p) => p.id === id)?.name ?? people.find((p) => p.id === id)?.email ?? "Someone") : "Placet");
  return {
    entries: events.map((e) => ({
      seq: e.seq, at: e.at, actorName: nameOf(e.actorId), actorRole: e.actorRole, action: e.action,
      sentence: describeEvent(e), hash: e.hash, prevHash: e.prevHash,
    })),
    finalHash: events.length ? events[events.length - 1].hash : null,
    head: head!,
  };
}

/** The commission's whole chain and what is needed to check it offline. */
export async function exportRecord(viewer: Viewer, commissionId: number): Promise<TrailRecord> {
  const { commission } = await authorize(getDb(), viewer, commissionId, "record.export");
  const { events, head } = await loadChainWithHead(commissionId);
  return buildRecord({ id: commission.id, title: commission.title }, events, { head: head ?? undefined });
}
