import "server-only";
import { desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { conditionAnswers, decisions, deposits, permissionPlans, requiredPermissions } from "@/db/schema";
import type { StoredRelease } from "@/models/release/facts";
import type { Tx } from "../trail";

export type DecisionRow = typeof decisions.$inferSelect;

/** The commission's latest decision: the one release follows. */
export async function latestDecision(db: Db | Tx, commissionId: number): Promise<DecisionRow | null> {
  const [d] = await db.select().from(decisions).where(eq(decisions.commissionId, commissionId)).orderBy(desc(decisions.id)).limit(1);
  return d ?? null;
}

/** Everything the release rule reads, loaded from storage (inside the caller's transaction when there is one). */
export async function loadReleaseFacts(db: Db | Tx, commissionId: number, now = new Date()): Promise<{ stored: StoredRelease; decision: DecisionRow | null }> {
  const decision = await latestDecision(db, commissionId);
  const answers = decision
    ? await db.select({ i: conditionAnswers.conditionIndex, answer: conditionAnswers.answer }).from(conditionAnswers).where(eq(conditionAnswers.decisionId, decision.id))
    : [];
  const [plan] = await db.select().from(permissionPlans).where(eq(permissionPlans.commissionId, commissionId));
  const permissions = await db.select().from(requiredPermissions).where(eq(requiredPermissions.commissionId, commissionId));
  const [deposit] = await db.select().from(deposits).where(eq(deposits.commissionId, commissionId));
  return {
    decision,
    stored: {
      approval: decision ? { outcome: decision.outcome, conditions: decision.conditions } : null,
      answered: answers.filter((a) => a.answer.trim()).map((a) => a.i),
      plan: plan ? { noneRequired: plan.noneRequired, reason: plan.reason } : null,
      permissions: permissions.map((p) => ({ reference: p.reference, grantedOn: p.grantedOn, documentKey: p.documentKey })),
      // Public notices are not published through Placet yet, so there is no notice period to wait for.
      noticeLastDay: null,
      today: now.toISOString().slice(0, 10),
      deposit: deposit ? { paid: deposit.paidAt !== null, waived: deposit.waivedAt !== null } : null,
    },
  };
}
