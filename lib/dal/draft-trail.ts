import "server-only";
import { appendTrail, type Tx } from "../trail";

/**
 * The one trail event for any change to a draft (its values, note or files). A draft is the studio's
 * alone and the trail is read by the whole commission, so the event says only that the draft changed,
 * who changed it and when; hashes and names of its content enter the trail when it is circulated.
 */
export async function draftChanged(tx: Tx, e: { commissionId: number; actorId: string; actorRole: string; revisionId: number; number: number }) {
  await appendTrail(tx, {
    commissionId: e.commissionId, actorId: e.actorId, actorRole: e.actorRole, action: "revision updated",
    subjectType: "revision", subjectId: e.revisionId, payload: { number: e.number },
  });
}
