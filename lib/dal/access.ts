import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { commissionMembers, commissions } from "@/db/schema";
import { can, type Action, type Actor, type CommitteeRole, type StudioRole } from "@/models/permissions/policy";
import type { Tx } from "../trail";
import { ForbiddenError, NotFoundError } from "../errors";
import type { Viewer } from "./viewer";

export type CommissionRow = typeof commissions.$inferSelect;

export interface Access {
  commission: CommissionRow;
  actor: Actor;
  /** The role the viewer acts in, for the trail: their committee role, else their studio role. */
  actingRole: string;
}

/**
 * Loads a commission and the viewer's standing on it. Anyone with no standing gets "not found",
 * whether or not the commission exists.
 */
export async function loadAccess(db: Db, viewer: Viewer, commissionId: number): Promise<Access> {
  if (!Number.isSafeInteger(commissionId) || commissionId <= 0) throw new NotFoundError();
  const [c] = await db.select().from(commissions).where(eq(commissions.id, commissionId)).limit(1);
  if (!c) throw new NotFoundError();
  const studioRole = viewer.studios.find((s) => s.studioId === c.studioId)?.role ?? null;
  return accessFrom(c, studioRole, await committeeStanding(db, viewer.id, commissionId));
}

/** The viewer's seat on the commission's committee, if any. */
export async function committeeStanding(db: Db | Tx, userId: string, commissionId: number) {
  const [m] = await db
    .select({ role: commissionMembers.role, treasurer: commissionMembers.treasurer })
    .from(commissionMembers)
    .where(and(eq(commissionMembers.commissionId, commissionId), eq(commissionMembers.userId, userId)))
    .limit(1);
  return m ?? null;
}

/** The access a standing gives; no standing at all is "not found". */
export function accessFrom(c: CommissionRow, studioRole: StudioRole | null, seat: { role: CommitteeRole; treasurer: boolean } | null): Access {
  const actor: Actor = { studioRole, committeeRole: seat?.role ?? null, treasurer: seat?.treasurer ?? false };
  if (!can(actor, "commission.view")) throw new NotFoundError();
  return { commission: c, actor, actingRole: actor.committeeRole ?? actor.studioRole ?? "none" };
}

/** Loads access and insists on one action; refusals of people who can see the commission say why. */
export async function authorize(db: Db, viewer: Viewer, commissionId: number, action: Action): Promise<Access> {
  const access = await loadAccess(db, viewer, commissionId);
  if (!can(access.actor, action)) throw new ForbiddenError(refusal(action));
  return access;
}

export function refusal(action: Action): string {
  if (action.startsWith("ballot.") || action === "decision.record") return "Only the chair (or voting members, for votes) may do that.";
  if (action === "people.inviteAdviser") return "Only the studio or the chair may invite advisers.";
  if (action === "people.inviteCommittee") return "Only the studio may invite committee members; the chair may invite advisers.";
  return "Your role on this commission does not allow that.";
}
