import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { signInCounters } from "@/db/schema";
import { keyedHash } from "./keyed-hash";

export const WINDOW_SECONDS = 15 * 60;
export const SIGN_IN_LINKS_PER_ADDRESS = 5;
export const SIGN_IN_LINKS_PER_IP = 20;

const windowStart = (now: Date, back = 0) =>
  new Date((Math.floor(now.getTime() / (WINDOW_SECONDS * 1000)) - back) * WINDOW_SECONDS * 1000);

/**
 * Counts one request for `key` and says whether it is within `limit`. The count goes up by an
 * INSERT … ON DUPLICATE KEY UPDATE under the row's lock, so parallel requests each get their own rank
 * (no read-then-write race). Fixed 15-minute windows; the previous window's count is carried over so
 * that no 15-minute span, wherever it starts, lets more than `limit` through.
 */
export async function takeSlot(kind: "address" | "ip", value: string, limit: number, now = new Date()): Promise<boolean> {
  const keyHash = keyedHash(`rate-${kind}`, value);
  const cur = windowStart(now);
  const prev = windowStart(now, 1);
  const db = getDb();
  const rank = await db.transaction(async (tx) => {
    await tx.execute(sql`INSERT INTO sign_in_counters (key_hash, window_start, n) VALUES (${keyHash}, ${cur}, 1)
      ON DUPLICATE KEY UPDATE n = n + 1`);
    const [row] = await tx.select({ n: signInCounters.n }).from(signInCounters)
      .where(and(eq(signInCounters.keyHash, keyHash), eq(signInCounters.windowStart, cur)));
    return row?.n ?? 1;
  });
  const [before] = await db.select({ n: signInCounters.n }).from(signInCounters)
    .where(and(eq(signInCounters.keyHash, keyHash), eq(signInCounters.windowStart, prev)));
  return rank + Math.min(before?.n ?? 0, limit) <= limit;
}

/** Old windows are of no further use. */
export async function pruneCounters(now = new Date()): Promise<void> {
  await getDb().execute(sql`DELETE FROM sign_in_counters WHERE window_start < ${windowStart(now, 1)}`);
}
