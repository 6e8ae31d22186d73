import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissionMembers, studioMembers, users } from "@/db/schema";
import { can, ROLE_LABELS } from "@/models/permissions/policy";
import { fieldErrors, inviteSchema } from "@/models/schemas/people";
import { env } from "../env";
import { ConflictError, ForbiddenError, ValidationError } from "../errors";
import { enqueueMail } from "../outbox";
import { changesVotingRights } from "@/models/ballot/tally";
import { appendTrail, type Tx } from "../trail";
import { loadAccess } from "./access";
import { closeDueBallots, openBallotOnCommission } from "./ballot-core";
import { lockedFor } from "./locked";
import type { Viewer } from "./viewer";

export interface InviteResult {
  userId: string;
  created: boolean;
  roleChanged: boolean;
}

/**
 * Invites a person to the commission's committee. Sending the same invitation twice leaves exactly one
 * membership; inviting an existing member with another role changes their role (studio only).
 */
export async function invitePerson(viewer: Viewer, commissionId: number, input: unknown): Promise<InviteResult> {
  const parsed = inviteSchema.safeParse(input);
  if (!parsed.success) throw new ValidationError(fieldErrors(parsed.error));
  const { email, name, role, treasurer } = parsed.data;
  const db = getDb();
  const access = await loadAccess(db, viewer, commissionId);
  await closeDueBallots({ commissionId });
  const needed = role === "adviser" ? "people.inviteAdviser" : "people.inviteCommittee";
  if (!can(access.actor, needed)) {
    throw new ForbiddenError(role === "adviser" ? "Only the studio or the chair may invite advisers." : "Only the studio may invite chairs and members.");
  }
  if (treasurer && role === "adviser") throw new ValidationError({ treasurer: "An adviser cannot be the treasurer." });

  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: needed, refusal: role === "adviser" ? "Only the studio or the chair may invite advisers." : "Only the studio may invite chairs and members." });
    let [user] = await tx.select().from(users).where(eq(users.email, email)).limit(1);
    if (!user) {
      const uid = crypto.randomUUID();
      await tx.insert(users).values({ id: uid, email, name });
      [user] = await tx.select().from(users).where(eq(users.id, uid));
    }
    const staff = await tx.select({ id: studioMembers.id }).from(studioMembers)
      .where(and(eq(studioMembers.studioId, locked.commission.studioId), eq(studioMembers.userId, user.id)));
    if (staff.length) throw new ValidationError({ email: "That person is on the studio's staff; the committee is the client's side." });

    const [existing] = await tx.select().from(commissionMembers)
      .where(and(eq(commissionMembers.commissionId, commissionId), eq(commissionMembers.userId, user.id))).limit(1);
    if (existing?.role === role && existing.treasurer === treasurer) return { userId: user.id, created: false, roleChanged: false };
    if (existing && !can(locked.actor, "people.inviteCommittee")) throw new ForbiddenError("Only the studio may change a person's role.");
    await refuseDuringBallot(tx, commissionId, existing?.role ?? null, role);
    if (role === "chair") {
      const [chair] = await tx.select({ userId: commissionMembers.userId }).from(commissionMembers)
        .where(and(eq(commissionMembers.commissionId, commissionId), eq(commissionMembers.role, "chair"))).limit(1);
      if (chair && chair.userId !== user.id) {
        throw new ValidationError({ role: "This commission already has a chair. A committee has one chair; a change of chair is the committee's to make, and is not done by invitation." });
      }
    }
    if (existing) {
      await tx.update(commissionMembers).set({ role, treasurer }).where(eq(commissionMembers.id, existing.id));
      await appendTrail(tx, {
        commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "role changed",
        subjectType: "person", subjectId: user.id,
        payload: { email, from: { role: existing.role, treasurer: existing.treasurer }, to: { role, treasurer } },
      });
      return { userId: user.id, created: false, roleChanged: true };
    }
    await tx.insert(commissionMembers).values({ commissionId, userId: user.id, role, treasurer, invitedBy: viewer.id });
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "person invited",
      subjectType: "person", subjectId: user.id, payload: { email, name: user.name ?? name, role, treasurer },
    });
    await enqueueMail(tx, [{
      dedupeKey: `invite:${commissionId}:${user.id}`,
      to: email,
      subject: `You are invited to review "${access.commission.title}"`,
      text:
        `${viewer.name} has added you as ${ROLE_LABELS[role].toLowerCase()} for "${access.commission.title}" ` +
        `(${access.commission.clientBody}).\n\nSign in with this address at ${env.appUrl}/sign-in to see the designs and take part.\n`,
    }]);
    return { userId: user.id, created: true, roleChanged: false };
  });
}


/** The message for a change of voting rights while a ballot is open: the roll is fixed until it closes. */
export function duringBallotRefusal(b: { number: number; closesAt: Date | null }): string {
  const when = b.closesAt ? ` (it closes ${b.closesAt.toISOString().slice(0, 16).replace("T", " ")} UTC)` : "";
  return `A ballot on Revision ${b.number} is open${when}. Who may vote is fixed while it is open, so changes to voting rights are refused until it closes; nothing was changed.`;
}

/** Refuses a change to or from member or chair while a ballot is open on the commission. */
export async function refuseDuringBallot(tx: Tx, commissionId: number, before: string | null, after: string | null): Promise<void> {
  if (!changesVotingRights(before, after)) return;
  const open = await openBallotOnCommission(tx, commissionId);
  if (open) throw new ConflictError(duringBallotRefusal(open));
}
