import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissions, conditionAnswers, revisions, users } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { conditionAnswerSchema, parseWith } from "@/models/release/inputs";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import { lockCommission } from "../trail";
import { loadAccess } from "./access";
import { assertNotReleased, trail } from "./permissions";
import { latestDecision } from "./release-facts";
import { mailCommission } from "./release-mail";
import type { Viewer } from "./viewer";
import type { ConditionsDto } from "@/models/release/dto";

export type { ConditionsDto };


/** The conditions of the latest approval as noted, with the studio's answers, for everyone on the commission. */
export async function getConditions(viewer: Viewer, commissionId: number): Promise<ConditionsDto> {
  const db = getDb();
  const access = await loadAccess(db, viewer, commissionId);
  const d = await latestDecision(db, commissionId);
  const you = { mayAnswer: can(access.actor, "condition.answer") };
  if (!d || d.outcome !== "approved-as-noted") return { decision: null, conditions: [], you };
  const [r] = await db.select({ number: revisions.number }).from(revisions).where(eq(revisions.id, d.revisionId));
  const answers = await db.select({ a: conditionAnswers, by: users.name }).from(conditionAnswers)
    .leftJoin(users, eq(users.id, conditionAnswers.answeredBy)).where(eq(conditionAnswers.decisionId, d.id));
  return {
    decision: { id: d.id, number: r.number },
    conditions: d.conditions.map((text, index) => {
      const got = answers.find((x) => x.a.conditionIndex === index);
      return { index, text, answer: got?.a.answer ?? null, answeredByName: got?.by ?? null, answeredAt: got?.a.answeredAt.toISOString() ?? null };
    }),
    you,
  };
}

/** The studio says how one condition of the approval will be met (condition numbers start at 1). Answering again replaces it. */
export async function answerCondition(viewer: Viewer, commissionId: number, conditionNumber: number, input: unknown): Promise<ConditionsDto> {
  const db = getDb();
  const access = await loadAccess(db, viewer, commissionId);
  if (!can(access.actor, "condition.answer")) throw new ForbiddenError("Only the studio answers the conditions of an approval.");
  const parsed = parseWith(conditionAnswerSchema, input);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await db.transaction(async (tx) => {
    await lockCommission(tx, commissionId);
    await assertNotReleased(tx, commissionId);
    const d = await latestDecision(tx, commissionId);
    if (!d || d.outcome !== "approved-as-noted") throw new ConflictError("There is no approval as noted with conditions to answer.");
    const index = conditionNumber - 1;
    if (!Number.isInteger(index) || index < 0 || index >= d.conditions.length) throw new NotFoundError(`The approval has no condition ${conditionNumber}.`);
    const now = new Date();
    const { answer } = parsed.data;
    await tx.insert(conditionAnswers).values({ decisionId: d.id, commissionId, conditionIndex: index, answer, answeredBy: viewer.id, answeredAt: now })
      .onDuplicateKeyUpdate({ set: { answer, answeredBy: viewer.id, answeredAt: now } });
    const [r] = await tx.select({ number: revisions.number }).from(revisions).where(eq(revisions.id, d.revisionId));
    await trail(tx, access, viewer, "condition answered", "decision", d.id, { number: r.number, condition: conditionNumber, text: d.conditions[index], answer });
    const [c] = await tx.select().from(commissions).where(eq(commissions.id, commissionId));
    await mailCommission(tx, c, {
      key: `condition:${d.id}:${index}:${now.getTime()}`, subject: `Condition ${conditionNumber} answered`, roles: ["chair", "member", "adviser"],
      path: `/commissions/${commissionId}/release`,
      lines: [`${viewer.name}, for the studio, answered condition ${conditionNumber} of the approval of Revision ${r.number}:`, `“${d.conditions[index]}”`, `How it will be met:\n${answer}`],
    });
  });
  return getConditions(viewer, commissionId);
}
