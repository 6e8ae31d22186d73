import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { ballots, commissionMembers, commissions, revisions } from "@/db/schema";
import { ballotRulesSchema, type BallotRules } from "@/models/ballot";
import { fieldErrors } from "@/models/schemas/people";
import { ConflictError, ForbiddenError, ValidationError } from "../errors";
import { appendTrail, type Tx } from "../trail";
import { can } from "@/models/permissions/policy";
import { loadAccess } from "./access";
import { closeDueBallots } from "./ballot-core";
import { rulesOf } from "./commissions";
import { lockedFor } from "./locked";
import type { Viewer } from "./viewer";

const CHAIR_ONLY = "The committee's rules are the committee's: only its chair may change or confirm them.";

/** A ballot counts as open until it is closed, even past its closing time, so the rules it closes under never move. */
async function refuseWhileOpen(tx: Tx, commissionId: number) {
  const [open] = await tx.select({ number: revisions.number }).from(ballots)
    .innerJoin(revisions, eq(revisions.id, ballots.revisionId))
    .where(and(eq(ballots.commissionId, commissionId), eq(ballots.status, "open"))).limit(1);
  if (open) throw new ConflictError(`A ballot on Revision ${open.number} is open; the rules cannot change until it closes. Nothing was changed.`);
}

/**
 * The chair changes the committee's rules (quorum, threshold, whether the chair votes, the authority for
 * electronic ballots), never while a ballot is open. The trail event shows the rules before and after.
 * A change by the chair also confirms the rules.
 */
export async function updateRules(viewer: Viewer, commissionId: number, input: unknown): Promise<BallotRules> {
  const db = getDb();
  await chairOnly(viewer, commissionId);
  const parsed = ballotRulesSchema.safeParse(input);
  if (!parsed.success) throw new ValidationError(fieldErrors(parsed.error));
  const next = { ...parsed.data, electronicAuthority: parsed.data.electronicAuthority?.trim() || null };
  await closeDueBallots({ commissionId });
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: "rules.edit", refusal: CHAIR_ONLY });
    await refuseWhileOpen(tx, commissionId);
    if (typeof next.quorum === "number") {
      const voters = await tx.select({ id: commissionMembers.id }).from(commissionMembers)
        .where(and(eq(commissionMembers.commissionId, commissionId), inArray(commissionMembers.role, next.chairVotes ? ["member", "chair"] : ["member"])));
      if (next.quorum > voters.length) throw new ValidationError({ quorum: `The quorum cannot be more than the ${voters.length} voting members.` });
    }
    const before = rulesOf(locked.commission);
    const now = new Date();
    await tx.update(commissions).set({
      quorum: String(next.quorum), threshold: next.threshold, chairVotes: next.chairVotes,
      electronicAuthority: next.electronicAuthority, rulesConfirmedAt: now, rulesConfirmedBy: viewer.id, updatedAt: now,
    }).where(eq(commissions.id, commissionId));
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "ballot rules changed",
      subjectType: "commission", subjectId: commissionId, payload: { before, after: next },
    });
    return next;
  });
}

/** The chair confirms the rules the studio proposed, as they stand; needed before the first ballot. */
export async function confirmRules(viewer: Viewer, commissionId: number): Promise<{ rules: BallotRules; confirmed: boolean }> {
  const db = getDb();
  await chairOnly(viewer, commissionId);
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: "rules.edit", refusal: CHAIR_ONLY });
    const rules = rulesOf(locked.commission);
    if (locked.commission.rulesConfirmedAt) return { rules, confirmed: false };
    await refuseWhileOpen(tx, commissionId);
    const now = new Date();
    await tx.update(commissions).set({ rulesConfirmedAt: now, rulesConfirmedBy: viewer.id, updatedAt: now }).where(eq(commissions.id, commissionId));
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "ballot rules confirmed",
      subjectType: "commission", subjectId: commissionId, payload: { rules },
    });
    return { rules, confirmed: true };
  });
}

/** Before reading input: anyone but the chair is refused (and anyone without standing gets "not found"). */
async function chairOnly(viewer: Viewer, commissionId: number) {
  const access = await loadAccess(getDb(), viewer, commissionId);
  if (!can(access.actor, "rules.edit")) throw new ForbiddenError(CHAIR_ONLY);
}
