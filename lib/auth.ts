import "server-only";
import { randomBytes, timingSafeEqual } from "node:crypto";
import { and, eq, gt, lt } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users, verificationTokens } from "@/db/schema";
import { emailSchema } from "@/models/schemas/people";
import { env } from "./env";
import { keyedHash, serverSecret, sha256 } from "./keyed-hash";
import { enqueueMail } from "./outbox";
import { pruneCounters, SIGN_IN_LINKS_PER_ADDRESS, SIGN_IN_LINKS_PER_IP, takeSlot } from "./rate-limit";
import { logSecurity } from "./security-log";
import { createSession } from "./session-store";

/**
 * E-mail sign-in, the only way in. Links are asked for through Placet's own form; the link lands on a
 * confirm page whose button completes sign-in here. Auth.js's own sign-in endpoints are not served.
 */
export type LinkOutcome = "queued" | "not-invited" | "limited";

const hashToken = (token: string) => sha256(`${token}${serverSecret()}`);
const sameBytes = (a: string, b: string) => {
  const x = Buffer.from(a, "utf8");
  const y = Buffer.from(b, "utf8");
  return x.length === y.length && timingSafeEqual(x, y);
};

export function confirmLink(token: string, email: string, next: string): string {
  const u = new URL("/sign-in/confirm", env.appUrl);
  u.searchParams.set("token", token);
  u.searchParams.set("email", email);
  if (next && next !== "/commissions") u.searchParams.set("next", next);
  return u.toString();
}

/**
 * Queues a sign-in link for an invited address (normalised by `emailSchema` already). Invited and
 * unknown addresses take the same steps up to the mail, which goes to the outbox rather than waiting on
 * SMTP, so neither the answer nor its timing tells them apart (OWASP WSTG-IDNT-04). Unknown addresses are
 * logged only as a keyed hash (OWASP ASVS 4.0.3 V7.1.1).
 * Limits: 5 per address and 20 per client IP per 15 minutes (OWASP ASVS 4.0.3 V2.2.1).
 */
export async function requestSignInLink(req: { email: string; ip: string; next: string; reason?: string }, now = new Date()): Promise<LinkOutcome> {
  const email = req.email;
  const ipOk = await takeSlot("ip", req.ip, SIGN_IN_LINKS_PER_IP, now);
  const addressOk = await takeSlot("address", email, SIGN_IN_LINKS_PER_ADDRESS, now);
  const db = getDb();
  await db.delete(verificationTokens).where(lt(verificationTokens.expires, now));
  await pruneCounters(now);
  const [user] = await db.select({ id: users.id, email: users.email }).from(users).where(eq(users.email, email)).limit(1);
  if (!user || !sameBytes(user.email, email)) {
    await logSecurity({ userId: null, email: null, action: "sign-in refused: not invited", detail: { addressHash: keyedHash("log", email) } });
    return "not-invited";
  }
  if (!ipOk || !addressOk) {
    await logSecurity({ userId: user.id, email, action: "sign-in link withheld: too many", detail: { by: ipOk ? "address" : "ip" } });
    return "limited";
  }
  const token = randomBytes(32).toString("base64url");
  const link = confirmLink(token, user.email, req.next);
  await db.transaction(async (tx) => {
    await tx.insert(verificationTokens).values({ identifier: user.email, token: hashToken(token), expires: new Date(now.getTime() + env.signInLinkSeconds * 1000) });
    await enqueueMail(tx, [{
      dedupeKey: `sign-in:${hashToken(token)}`, to: user.email, subject: "Your Placet sign-in link",
      text: `Open this link to sign in to Placet:\n\n${link}\n\nIt works once, for 10 minutes. If you did not ask for it, ignore this message.`,
    }]);
  });
  await logSecurity({ userId: user.id, email, action: "sign-in link sent", detail: req.reason ? { reason: req.reason } : {} });
  return "queued";
}

/**
 * Uses a link: its token is deleted in one statement and only an affected row counts, so two parallel
 * uses give one session (OWASP ASVS 4.0.3 V2.7.2, V2.7.3). The person is the one whose stored address
 * is byte-for-byte the token's identifier. Returns the new session's cookie value, or null.
 */
export async function completeSignIn(input: { token: string; email: string; userAgent: string }, now = new Date()): Promise<{ cookie: string; userId: string } | null> {
  const parsed = emailSchema.safeParse(input.email);
  if (!parsed.success || !input.token || input.token.length > 200) return null;
  const identifier = parsed.data;
  const db = getDb();
  const [res] = await db.delete(verificationTokens).where(and(
    eq(verificationTokens.identifier, identifier), eq(verificationTokens.token, hashToken(input.token)), gt(verificationTokens.expires, now),
  ));
  if (res.affectedRows !== 1) {
    await logSecurity({ userId: null, email: null, action: "sign-in link refused", detail: { addressHash: keyedHash("log", identifier) } });
    return null;
  }
  const [user] = await db.select({ id: users.id, email: users.email }).from(users).where(eq(users.email, identifier)).limit(1);
  if (!user || !sameBytes(user.email, identifier)) return null;
  const cookie = await createSession(user.id, input.userAgent, now);
  await db.update(users).set({ emailVerified: now }).where(eq(users.id, user.id));
  await logSecurity({ userId: user.id, email: user.email, action: "signed in", detail: {} });
  return { cookie, userId: user.id };
}
