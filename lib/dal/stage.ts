import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissions, STAGES } from "@/db/schema";
import { ValidationError } from "../errors";
import { appendTrail } from "../trail";
import { lockedFor } from "./locked";
import { authorize } from "./access";
import type { Viewer } from "./viewer";

/** Stages the studio may set by hand; approval and release move the stage through their own steps. */
const MANUAL = new Set(["brief", "concept", "design-development", "on-hold", "withdrawn"]);

export async function changeStage(viewer: Viewer, commissionId: number, stage: string, reason = ""): Promise<void> {
  const db = getDb();
  const access = await authorize(db, viewer, commissionId, "commission.changeStage");
  if (!(STAGES as readonly string[]).includes(stage) || !MANUAL.has(stage)) {
    throw new ValidationError({ stage: "Choose brief, concept, design development, on hold or withdrawn; approval comes from the committee's decision." });
  }
  await db.transaction(async (tx) => {
    await lockedFor(tx, viewer, commissionId, { action: "commission.changeStage" });
    const [c] = await tx.select({ stage: commissions.stage }).from(commissions).where(eq(commissions.id, commissionId));
    if (c.stage === stage) return;
    await tx.update(commissions).set({ stage: stage as (typeof STAGES)[number], updatedAt: new Date() }).where(eq(commissions.id, commissionId));
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "stage changed",
      subjectType: "commission", subjectId: commissionId, payload: { from: c.stage, to: stage, reason },
    });
  });
}
