import "server-only";
import { and, eq, lte, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outbox } from "@/db/schema";
import { headerText, MAX_SUBJECT_CHARS, sendMail } from "./mail";
import type { Tx } from "./trail";

export interface OutboxMessage {
  dedupeKey: string;
  to: string;
  subject: string;
  text: string;
}

/** Queues mail inside the caller's transaction; a duplicate key is ignored (at most one message per key). */
export async function enqueueMail(tx: Tx, messages: OutboxMessage[]): Promise<void> {
  if (!messages.length) return;
  await tx
    .insert(outbox)
    .values(messages.map((m) => ({ dedupeKey: m.dedupeKey.slice(0, 191), toEmail: m.to, subject: headerText(m.subject, MAX_SUBJECT_CHARS), bodyText: m.text })))
    .onDuplicateKeyUpdate({ set: { dedupeKey: sql`dedupe_key` } });
}

const MAX_ATTEMPTS = 12;
const backoffSeconds = (attempt: number) => Math.min(600, 5 * 2 ** attempt);
/** A claim older than this is taken to belong to a crashed worker and is retried. */
const STALE_CLAIM_SECONDS = 120;

/**
 * Sends what is due. Each row is claimed (pending → sending) in its own short transaction with
 * SKIP LOCKED, so several workers or app nodes never send the same message.
 */
export async function deliverOutbox(limit = 25): Promise<{ sent: number; failed: number }> {
  const db = getDb();
  let sent = 0;
  let failed = 0;
  await db.execute(sql`UPDATE outbox SET status = 'pending' WHERE status = 'sending' AND next_attempt_at < NOW(3) - INTERVAL ${STALE_CLAIM_SECONDS} SECOND`);
  for (let i = 0; i < limit; i++) {
    const claimed = await db.transaction(async (tx) => {
      const [row] = await tx
        .select()
        .from(outbox)
        .where(and(eq(outbox.status, "pending"), lte(outbox.nextAttemptAt, new Date())))
        .orderBy(outbox.id)
        .limit(1)
        .for("update", { skipLocked: true });
      if (!row) return null;
      await tx.update(outbox).set({ status: "sending", attempts: row.attempts + 1, nextAttemptAt: new Date() }).where(eq(outbox.id, row.id));
      return row;
    });
    if (!claimed) break;
    try {
      await sendMail({ to: claimed.toEmail, subject: claimed.subject, text: claimed.bodyText });
      await db.update(outbox).set({ status: "sent", sentAt: new Date(), lastError: null }).where(eq(outbox.id, claimed.id));
      sent++;
    } catch (err) {
      const attempts = claimed.attempts + 1;
      await db.update(outbox).set({
        status: attempts >= MAX_ATTEMPTS ? "failed" : "pending",
        nextAttemptAt: new Date(Date.now() + backoffSeconds(attempts) * 1000),
        lastError: String((err as Error).message ?? err).slice(0, 500),
      }).where(eq(outbox.id, claimed.id));
      failed++;
      break; // the mail server is likely down: stop this round, try again later
    }
  }
  return { sent, failed };
}
