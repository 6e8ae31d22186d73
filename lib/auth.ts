import "server-only";
import { randomBytes, timingSafeEqual } from "node:crypto";
import { Auth, raw, skipCSRFCheck } from "@auth/core";
import { AuthError } from "@auth/core/errors";
import NextAuth, { type NextAuthConfig } from "next-auth";
import Nodemailer from "next-auth/providers/nodemailer";
import { eq, lt } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users, verificationTokens } from "@/db/schema";
import { emailSchema } from "@/models/schemas/people";
import { TOUCH_EVERY_SECONDS } from "@/models/session/lifetime";
import { placetAdapter } from "./auth-adapter";
import { env } from "./env";
import { keyedHash, serverSecret } from "./keyed-hash";
import { enqueueMail } from "./outbox";
import { pruneCounters, SIGN_IN_LINKS_PER_ADDRESS, SIGN_IN_LINKS_PER_IP, takeSlot } from "./rate-limit";
import { logSecurity } from "./security-log";
import { noteUserAgent, sessionCookie } from "./session-store";

/**
 * E-mail sign-in through Auth.js, with one way in: links are asked for through Placet's own form
 * (requestSignInLink), and used through its confirm page (completeSignIn). Both run Auth.js's own
 * sign-in and callback in the server; its HTTP endpoints under /api/auth are not served (see the route).
 */
export type LinkOutcome = "queued" | "not-invited" | "limited";

const sameBytes = (a: string, b: string) => {
  const x = Buffer.from(a, "utf8");
  const y = Buffer.from(b, "utf8");
  return x.length === y.length && timingSafeEqual(x, y);
};

/** The invited person whose stored address is byte-for-byte `email` (utf8mb4_bin makes the lookup exact too). */
async function invited(email: string) {
  const [user] = await getDb().select({ id: users.id, email: users.email }).from(users).where(eq(users.email, email)).limit(1);
  return user && sameBytes(user.email, email) ? user : null;
}

/** The e-mail link lands on our confirm page; its button (a POST) completes sign-in. */
export function confirmLink(token: string, email: string, next: string): string {
  const u = new URL("/sign-in/confirm", env.appUrl);
  u.searchParams.set("token", token);
  u.searchParams.set("email", email);
  if (next && next !== "/commissions") u.searchParams.set("next", next);
  return u.toString();
}

const linkText = (link: string) =>
  `Open this link to sign in to Placet:\n\n${link}\n\nIt works once, for 10 minutes. If you did not ask for it, ignore this message.`;

function config(): NextAuthConfig {
  const cookie = sessionCookie();
  return {
    adapter: placetAdapter(),
    secret: serverSecret(),
    basePath: "/api/auth",
    // Forwarded host headers are trusted only behind a declared proxy (production requires one).
    trustHost: env.trustProxy || !env.production,
    session: {
      strategy: "database",
      maxAge: env.sessionIdleSeconds,
      updateAge: TOUCH_EVERY_SECONDS,
      generateSessionToken: () => randomBytes(32).toString("base64url"),
    },
    cookies: { sessionToken: { name: cookie.name, options: cookie.options } },
    pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-inbox", error: "/sign-in" },
    providers: [
      Nodemailer({
        server: { host: env.smtpHost, port: env.smtpPort },
        from: env.mailFrom,
        maxAge: env.signInLinkSeconds,
        normalizeIdentifier: (identifier) => emailSchema.parse(identifier),
        async sendVerificationRequest({ identifier, url }) {
          const u = new URL(url);
          const link = confirmLink(u.searchParams.get("token") ?? "", identifier, safePath(u.searchParams.get("callbackUrl")));
          await getDb().transaction((tx) => enqueueMail(tx, [{ dedupeKey: `sign-in:${keyedHash("link", link)}`, to: identifier, subject: "Your Placet sign-in link", text: linkText(link) }]));
        },
      }),
    ],
    callbacks: {
      /** Only invited people, by the exact stored address, get a link or a session. */
      async signIn({ user }) {
        return Boolean(user.email && (await invited(user.email)));
      },
      /** What the browser may see of a session: who, and until when; never its token. */
      async session({ session, user }) {
        return { user: { id: user.id, name: user.name, email: user.email }, expires: session.expires } as typeof session;
      },
    },
  };
}

/** Path part of a same-origin URL, for where to go after signing in. */
function safePath(url: string | null): string {
  if (!url) return "/commissions";
  const u = new URL(url, env.appUrl);
  return u.origin === new URL(env.appUrl).origin ? `${u.pathname}${u.search}` : "/commissions";
}

export const { auth, signOut } = NextAuth(config);

type AuthAnswer = { redirect?: string; cookies?: { name: string; value: string }[] };

/** Runs one of Auth.js's actions inside the server, as its own server-side signIn() does. */
function runAuth(path: string, init: RequestInit): Promise<AuthAnswer> {
  const url = new URL(`/api/auth/${path}`, env.appUrl);
  return Auth(new Request(url, init), { ...config(), raw, skipCSRFCheck }) as never;
}

/**
 * Queues a sign-in link for an invited address (normalised by `emailSchema` already). Invited, unknown and
 * limited addresses get the same answer; the mail goes to the outbox rather than waiting on SMTP, so the
 * timing does not tell them apart either (OWASP ASVS 4.0.3 V2.2.1; WSTG-IDNT-04). Unknown addresses are
 * logged only as a keyed hash (OWASP ASVS 4.0.3 V7.1.1). Limits: 5 per address and 20 per client IP per
 * 15 minutes, counted by INSERT before anything else (OWASP ASVS 4.0.3 V2.2.1).
 */
export async function requestSignInLink(req: { email: string; ip: string; next: string; reason?: string }, now = new Date()): Promise<LinkOutcome> {
  const email = req.email;
  const ipOk = await takeSlot("ip", req.ip, SIGN_IN_LINKS_PER_IP, now);
  const addressOk = await takeSlot("address", email, SIGN_IN_LINKS_PER_ADDRESS, now);
  await getDb().delete(verificationTokens).where(lt(verificationTokens.expires, now));
  await pruneCounters(now);
  const user = await invited(email);
  if (!user) {
    await logSecurity({ userId: null, email: null, action: "sign-in refused: not invited", detail: { addressHash: keyedHash("log", email) } });
    return "not-invited";
  }
  if (!ipOk || !addressOk) {
    await logSecurity({ userId: user.id, email, action: "sign-in link withheld: too many", detail: { by: ipOk ? "address" : "ip" } });
    return "limited";
  }
  const body = new URLSearchParams({ email: user.email, callbackUrl: new URL(req.next, env.appUrl).toString() });
  const res = await runAuth("signin/nodemailer", { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body });
  if (!/verify-request|check-inbox/.test(res.redirect ?? "")) throw new Error(`sign-in link not issued (${res.redirect ?? "no answer"})`);
  await logSecurity({ userId: user.id, email, action: "sign-in link sent", detail: req.reason ? { reason: req.reason } : {} });
  return "queued";
}

const refused = (err: unknown): AuthAnswer => {
  if (err instanceof AuthError) return {};
  throw err;
};

/**
 * Uses a link through Auth.js's callback: the adapter deletes its token in one statement and only an
 * affected row counts, so two parallel uses give one session (OWASP ASVS 4.0.3 V2.7.2, V2.7.3); the person
 * is the one whose stored address is byte-for-byte the token's identifier. Returns the new session's
 * cookie value, or null.
 */
export async function completeSignIn(input: { token: string; email: string; userAgent: string }): Promise<{ cookie: string; userId: string } | null> {
  const parsed = emailSchema.safeParse(input.email);
  if (!parsed.success || !input.token || input.token.length > 200) return null;
  const user = await invited(parsed.data);
  const query = new URLSearchParams({ token: input.token, email: parsed.data, callbackUrl: `${env.appUrl}/commissions` });
  // A used, expired or foreign link makes Auth.js throw its Verification error: that is a refusal.
  const res: AuthAnswer = user ? await runAuth(`callback/nodemailer?${query}`, { method: "GET" }).catch(refused) : {};
  const cookie = res.cookies?.find((c) => c.name === sessionCookie().name && c.value)?.value;
  if (!user || !cookie) {
    await logSecurity({ userId: null, email: null, action: "sign-in link refused", detail: { addressHash: keyedHash("log", parsed.data) } });
    return null;
  }
  await noteUserAgent(cookie, input.userAgent);
  await logSecurity({ userId: user.id, email: user.email, action: "signed in", detail: {} });
  return { cookie, userId: user.id };
}
