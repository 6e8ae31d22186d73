import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissions, conditionAnswers, releases, revisions } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { releaseFacts } from "@/models/release/facts";
import { releaseReadiness } from "@/models/release/rule";
import { ConflictError, ForbiddenError } from "../errors";
import { appendTrail, lockCommission } from "../trail";
import { loadAccess } from "./access";
import { loadReleaseFacts } from "./release-facts";
import { mailRelease } from "./release-mail";
import type { Viewer } from "./viewer";

/** The answer of GET /api/commissions/{id}/release, exactly. */
export interface ReleaseStatusDto {
  ready: boolean;
  missing: string[];
  releasedAt: string | null;
}

function isDuplicate(err: unknown): boolean {
  const e = err as { code?: string; errno?: number; cause?: { code?: string; errno?: number } };
  return e?.code === "ER_DUP_ENTRY" || e?.errno === 1062 || e?.cause?.code === "ER_DUP_ENTRY" || e?.cause?.errno === 1062;
}

/** What stands between the commission and release, for everyone on it; outsiders get not found. */
export async function getReleaseStatus(viewer: Viewer, commissionId: number): Promise<ReleaseStatusDto> {
  const db = getDb();
  await loadAccess(db, viewer, commissionId);
  const [done] = await db.select({ at: releases.releasedAt }).from(releases).where(eq(releases.commissionId, commissionId));
  if (done) return { ready: true, missing: [], releasedAt: done.at.toISOString() };
  const { stored } = await loadReleaseFacts(db, commissionId);
  return { ...releaseReadiness(releaseFacts(stored)), releasedAt: null };
}

/**
 * The studio owner releases the commission to fabrication once nothing is missing. The approved revision is
 * frozen into the release (its parameters, figures, note, hash, the decision's conditions and the studio's
 * answers); the stage moves to in fabrication; everyone is told. Checked again under the commission's lock.
 */
export async function releaseToFabrication(viewer: Viewer, commissionId: number): Promise<ReleaseStatusDto> {
  const db = getDb();
  const access = await loadAccess(db, viewer, commissionId);
  if (!can(access.actor, "release.release")) throw new ForbiddenError("Only the studio owner releases a commission to fabrication.");
  try {
    return await db.transaction(async (tx) => {
      await lockCommission(tx, commissionId);
      const [done] = await tx.select({ id: releases.id }).from(releases).where(eq(releases.commissionId, commissionId));
      if (done) throw new ConflictError("This commission has already been released to fabrication.");
      const now = new Date();
      const { stored, decision } = await loadReleaseFacts(tx, commissionId, now);
      const readiness = releaseReadiness(releaseFacts(stored));
      if (!readiness.ready || !decision) throw new ConflictError(`Not ready for release. Still missing: ${readiness.missing.join("; ")}.`);
      const [r] = await tx.select().from(revisions).where(eq(revisions.id, decision.revisionId));
      const answers = await tx.select().from(conditionAnswers).where(eq(conditionAnswers.decisionId, decision.id));
      const frozen = {
        number: r.number, contentHash: decision.contentHash, params: r.params, figures: r.figures, note: r.note,
        decision: { id: decision.id, outcome: decision.outcome, statement: decision.statement, recordedAt: decision.recordedAt.toISOString() },
        conditions: decision.conditions.map((text, i) => ({ text, answer: answers.find((a) => a.conditionIndex === i)?.answer ?? null })),
      };
      await tx.insert(releases).values({
        commissionId, revisionId: r.id, decisionId: decision.id, contentHash: decision.contentHash, frozen, releasedBy: viewer.id, releasedAt: now,
      });
      await appendTrail(tx, {
        commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "released to fabrication",
        subjectType: "revision", subjectId: r.id, payload: { number: r.number, contentHash: decision.contentHash, decisionId: decision.id },
      });
      const [c] = await tx.select().from(commissions).where(eq(commissions.id, commissionId));
      if (c.stage !== "in-fabrication") {
        await tx.update(commissions).set({ stage: "in-fabrication", updatedAt: now }).where(eq(commissions.id, commissionId));
        await appendTrail(tx, {
          commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "stage changed",
          subjectType: "commission", subjectId: commissionId, payload: { from: c.stage, to: "in-fabrication", reason: `Revision ${r.number} released to fabrication` },
        });
      }
      await mailRelease(tx, c, { number: r.number, contentHash: decision.contentHash, byName: viewer.name, at: now });
      return { ready: true, missing: [], releasedAt: now.toISOString() };
    });
  } catch (err) {
    if (isDuplicate(err)) throw new ConflictError("This commission has already been released to fabrication.");
    throw err;
  }
}
