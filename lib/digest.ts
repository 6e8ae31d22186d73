import "server-only";
import { and, asc, eq, inArray, isNull, max } from "drizzle-orm";
import { getDb } from "@/db/client";
import { digestItems, users } from "@/db/schema";
import { enqueueMail } from "./outbox";

/** Digests go out once a day, from this hour (UTC) on: the end of a working day in Britain. */
export const DIGEST_HOUR_UTC = 17;

const dayName = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" });
const startOfUtcDay = (d: Date) => new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));

/**
 * Sends each person who chose a daily digest one mail with every notice waiting for them, at most once a
 * UTC day and not before DIGEST_HOUR_UTC, and marks those notices sent. Safe on several nodes at once:
 * each person's waiting lines are claimed with row locks (SKIP LOCKED), and the outbox key
 * digest:<person>:<day> refuses a second mail the same day.
 */
export async function sendDigests(now = new Date()): Promise<{ sent: number }> {
  if (now.getUTCHours() < DIGEST_HOUR_UTC) return { sent: 0 };
  const db = getDb();
  const today = startOfUtcDay(now);
  const waiting = await db.selectDistinct({ userId: digestItems.userId }).from(digestItems).where(isNull(digestItems.digestedAt));
  let sent = 0;
  for (const { userId } of waiting) {
    const mailed = await db.transaction(async (tx) => {
      const items = await tx.select().from(digestItems).where(and(eq(digestItems.userId, userId), isNull(digestItems.digestedAt)))
        .orderBy(asc(digestItems.createdAt), asc(digestItems.id)).for("update", { skipLocked: true });
      if (!items.length) return false;
      const [last] = await tx.select({ at: max(digestItems.digestedAt) }).from(digestItems).where(eq(digestItems.userId, userId));
      if (last?.at && last.at >= today) return false; // today's digest has gone; these wait for tomorrow's
      const [person] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, userId));
      if (!person) return false;
      const day = today.toISOString().slice(0, 10);
      await enqueueMail(tx, [{
        dedupeKey: `digest:${userId}:${day}`,
        to: person.email,
        subject: `Your Placet notices for ${dayName.format(now)} (${items.length})`,
        text: digestText(person.name ?? person.email, items),
      }]);
      await tx.update(digestItems).set({ digestedAt: now }).where(inArray(digestItems.id, items.map((i) => i.id)));
      return true;
    });
    if (mailed) sent++;
  }
  return { sent };
}

export function digestText(name: string, items: { line: string; link: string }[]): string {
  const lines = items.map((i) => `- ${i.line}\n  ${i.link}`).join("\n\n");
  return `Dear ${name},\n\nHere is what happened since your last digest:\n\n${lines}\n\n` +
    `You chose one daily digest instead of a mail for each notice. To change that, use "Notices" beside the comments on any revision.\n`;
}
