import "server-only";
import { and, eq, gte, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { securityLog } from "@/db/schema";

/**
 * Sign-in links per address: at most `max` in `windowMinutes`, counted from the security log, so the
 * limit holds across every app node (no state in the process).
 */
export async function signInLinksRecently(email: string, windowMinutes = 15): Promise<number> {
  const since = new Date(Date.now() - windowMinutes * 60_000);
  const [row] = await getDb()
    .select({ n: sql<number>`count(*)` })
    .from(securityLog)
    .where(and(eq(securityLog.email, email), eq(securityLog.action, "sign-in link sent"), gte(securityLog.at, since)));
  return Number(row?.n ?? 0);
}

export const SIGN_IN_LINKS_PER_WINDOW = 5;
