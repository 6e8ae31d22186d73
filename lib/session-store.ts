import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb, withRetry } from "@/db/client";
import { sessions } from "@/db/schema";
import { needsTouch, sessionExpiresAt, sessionStatus, type SessionLimits } from "@/models/session/lifetime";
import { env } from "./env";
import { sha256 } from "./keyed-hash";

/**
 * Server-side sessions. The browser holds a random 256-bit value (OWASP ASVS 4.0.3 V3.2.2); the
 * database holds only its SHA-256, so a copy of the table signs nobody in.
 */
export interface ActiveSession { id: string; userId: string; createdAt: Date; expires: Date }

export const sessionLimits = (): SessionLimits => ({ absoluteSeconds: env.sessionAbsoluteSeconds, idleSeconds: env.sessionIdleSeconds });

/** The stored key for a cookie's value. */
export const sessionIdFor = (cookieValue: string) => sha256(`session:${cookieValue}`);

/** Stores a session whose cookie holds `value`; returns when it ends if nothing more happens. */
export async function storeSession(value: string, userId: string, userAgent: string, now = new Date()): Promise<Date> {
  const times = { createdAt: now, lastSeenAt: now };
  const expires = sessionExpiresAt(times, sessionLimits());
  await getDb().insert(sessions).values({ sessionToken: sessionIdFor(value), userId, ...times, expires, userAgent: userAgent.slice(0, 255) });
  return expires;
}

/** Starts a session for `userId` directly (tests and tools); returns the value for the cookie. */
export async function createSession(userId: string, userAgent: string, now = new Date()): Promise<string> {
  const value = randomBytes(32).toString("base64url");
  await storeSession(value, userId, userAgent, now);
  return value;
}

/** Records the browser a new session was made from (Auth.js creates the row without it). */
export async function noteUserAgent(value: string, userAgent: string): Promise<void> {
  await getDb().update(sessions).set({ userAgent: userAgent.slice(0, 255) }).where(eq(sessions.sessionToken, sessionIdFor(value)));
}

/** Moves a live session's idle deadline on from now (never past its absolute one). */
export async function touchSession(value: string, now = new Date()): Promise<ActiveSession | null> {
  const s = await resolveSession(value, now);
  if (!s) return null;
  const expires = sessionExpiresAt({ createdAt: s.createdAt, lastSeenAt: now }, sessionLimits());
  await getDb().update(sessions).set({ lastSeenAt: now, expires }).where(eq(sessions.sessionToken, s.id));
  return { ...s, expires };
}

/**
 * The session a cookie's value stands for, if it is still alive at `now`: idle and absolute limits
 * are checked here on every request (OWASP ASVS 4.0.3 V3.3.2), and an ended session is deleted.
 */
export async function resolveSession(cookieValue: string | undefined, now = new Date()): Promise<ActiveSession | null> {
  if (!cookieValue || cookieValue.length > 200) return null;
  const id = sessionIdFor(cookieValue);
  return withRetry(async () => {
    const db = getDb();
    const [row] = await db.select().from(sessions).where(eq(sessions.sessionToken, id)).limit(1);
    if (!row) return null;
    const limits = sessionLimits();
    if (sessionStatus(row, now, limits) !== "active") {
      await db.delete(sessions).where(eq(sessions.sessionToken, id));
      return null;
    }
    if (needsTouch(row.lastSeenAt, now)) {
      const times = { createdAt: row.createdAt, lastSeenAt: now };
      const expires = sessionExpiresAt(times, limits);
      await db.update(sessions).set({ lastSeenAt: now, expires }).where(eq(sessions.sessionToken, id));
      return { id, userId: row.userId, createdAt: row.createdAt, expires };
    }
    return { id, userId: row.userId, createdAt: row.createdAt, expires: row.expires };
  });
}

/** Ends the session behind a cookie's value (sign out, or a new sign-in on the same browser). */
export async function endSession(cookieValue: string | undefined): Promise<void> {
  if (!cookieValue) return;
  await getDb().delete(sessions).where(eq(sessions.sessionToken, sessionIdFor(cookieValue)));
}

/** Cookie name and flags (OWASP ASVS 4.0.3 V3.4.1 Secure, V3.4.2 HttpOnly, V3.4.3 SameSite, V3.4.4 __Host-). */
export function sessionCookie() {
  const secure = env.appUrl.startsWith("https://");
  return {
    name: secure ? "__Host-placet-session" : "placet-session",
    options: { path: "/", httpOnly: true, sameSite: "lax" as const, secure },
  };
}

export function setCookieHeader(value: string, maxAgeSeconds: number): string {
  const { name, options } = sessionCookie();
  return [`${name}=${value}`, "Path=/", "HttpOnly", "SameSite=Lax", `Max-Age=${maxAgeSeconds}`, ...(options.secure ? ["Secure"] : [])].join("; ");
}
