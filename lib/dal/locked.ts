import "server-only";
import { and, eq } from "drizzle-orm";
import { commissions, sessions, studioMembers } from "@/db/schema";
import { can, type Action } from "@/models/permissions/policy";
import { env } from "../env";
import { ForbiddenError, FreshSignInRequired, NotFoundError } from "../errors";
import { lockCommission, type Tx } from "../trail";
import { accessFrom, committeeStanding, refusal, type Access } from "./access";
import { sessionStartedAt, type Viewer } from "./viewer";

export interface LockedOptions {
  /** The policy action the write needs; checked against the standing read under the lock. */
  action?: Action;
  /** A refusal in the words of the caller, instead of the general one for the action. */
  refusal?: string;
  /** The write needs a recent sign-in (the chair signing a decision). */
  fresh?: { message: string };
}

/**
 * Takes the commission's row lock and reads, under it, the commission and the viewer's standing on it
 * (studio role, committee role, treasurer flag, and if asked the freshness of their sign-in). Every write
 * that checks role, state or freshness checks them here, so a change committed a moment before the lock
 * was granted (a demotion, a removal, a stage change) is seen and the write is refused.
 */
export async function lockedFor(tx: Tx, viewer: Viewer, commissionId: number, opts: LockedOptions = {}): Promise<Access> {
  await lockCommission(tx, commissionId);
  const [c] = await tx.select().from(commissions).where(eq(commissions.id, commissionId)).limit(1);
  if (!c) throw new NotFoundError();
  const [staff] = await tx.select({ role: studioMembers.role }).from(studioMembers)
    .where(and(eq(studioMembers.studioId, c.studioId), eq(studioMembers.userId, viewer.id))).limit(1);
  const access = accessFrom(c, staff?.role ?? null, await committeeStanding(tx, viewer.id, commissionId));
  if (opts.action && !can(access.actor, opts.action)) throw new ForbiddenError(opts.refusal ?? refusal(opts.action));
  if (opts.fresh && (await freshness(viewer, tx)).needed) throw new FreshSignInRequired(opts.fresh.message);
  return access;
}

/**
 * How long ago the viewer signed in, against the window for signing a decision. Outside a transaction
 * this asks the viewer API; under the lock it reads the same rows through the transaction's own
 * connection (a second connection from the pool could be the one the waiting writers hold).
 */
export async function freshness(viewer: Viewer, tx?: Tx): Promise<{ needed: boolean; signedInAt: string | null }> {
  const started = tx ? await sessionStartedIn(tx, viewer) : await sessionStartedAt(viewer);
  const needed = !started || Date.now() - started.getTime() > env.freshSignInSeconds * 1000;
  return { needed, signedInAt: started?.toISOString() ?? null };
}

/** sessionStartedAt (lib/dal/viewer.ts), read in the caller's transaction: this request's session if known. */
async function sessionStartedIn(tx: Tx, viewer: Viewer): Promise<Date | null> {
  if (!viewer.sessionId) return null;
  const [row] = await tx.select({ createdAt: sessions.createdAt }).from(sessions)
    .where(and(eq(sessions.userId, viewer.id), eq(sessions.sessionToken, viewer.sessionId))).limit(1);
  return row?.createdAt ?? null;
}
