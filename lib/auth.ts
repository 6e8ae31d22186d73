import "server-only";
import NextAuth from "next-auth";
import Nodemailer from "next-auth/providers/nodemailer";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { env } from "./env";
import { sendMail, escapeHtml } from "./mail";
import { logSecurity } from "./security-log";

/** The e-mail link lands on our confirm page; its button (a POST) completes sign-in. */
export function confirmUrlFor(callbackUrl: string): string {
  const u = new URL(callbackUrl);
  const confirm = new URL("/sign-in/confirm", env.appUrl);
  for (const k of ["token", "email", "callbackUrl"]) {
    const v = u.searchParams.get(k);
    if (v) confirm.searchParams.set(k, v);
  }
  return confirm.toString();
}

export const { handlers, auth, signIn, signOut } = NextAuth(() => ({
  adapter: DrizzleAdapter(getDb(), {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }),
  session: { strategy: "database", maxAge: 30 * 24 * 3600 },
  trustHost: env.trustProxy || !env.production,
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-inbox", error: "/sign-in" },
  providers: [
    Nodemailer({
      server: { host: env.smtpHost, port: env.smtpPort, secure: false, ignoreTLS: true },
      from: env.mailFrom,
      maxAge: env.signInLinkSeconds,
      async sendVerificationRequest({ identifier, url }) {
        const link = confirmUrlFor(url);
        await sendMail({
          to: identifier,
          subject: "Your Placet sign-in link",
          text:
            `Open this link to sign in to Placet:\n\n${link}\n\n` +
            `It works once, for 10 minutes. If you did not ask for it, ignore this message.`,
          html:
            `<p>Open this link to sign in to Placet:</p><p><a href="${escapeHtml(link)}">Sign in to Placet</a></p>` +
            `<p>It works once, for 10 minutes. If you did not ask for it, ignore this message.</p>`,
        });
      },
    }),
  ],
  callbacks: {
    /** Only invited people (rows already in users) may sign in. */
    async signIn({ user }) {
      if (!user.email) return false;
      const [row] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, user.email.toLowerCase())).limit(1);
      return Boolean(row);
    },
    async session({ session, user }) {
      if (session.user && user) session.user.id = user.id;
      return session;
    },
  },
  events: {
    async signIn({ user }) {
      await logSecurity({ userId: user.id ?? null, email: user.email ?? null, action: "signed in", detail: {} });
    },
    async signOut(message) {
      const userId = "session" in message && message.session ? (message.session as { userId?: string }).userId : undefined;
      await logSecurity({ userId: userId ?? null, email: null, action: "signed out", detail: {} });
    },
  },
}));
