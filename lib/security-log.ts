import "server-only";
import { getDb } from "@/db/client";
import { securityLog } from "@/db/schema";

/** A person's own security events (sign-in links, sign-ins, sign-outs), kept apart from commission trails. */
export async function logSecurity(e: { userId: string | null; email: string | null; action: string; detail: Record<string, unknown> }) {
  try {
    await getDb().insert(securityLog).values({ ...e, at: new Date() });
  } catch (err) {
    console.error("security log write failed", err);
  }
}
