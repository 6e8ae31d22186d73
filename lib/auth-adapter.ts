import "server-only";
import { and, eq, gt } from "drizzle-orm";
import type { Adapter } from "@auth/core/adapters";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { endSession, resolveSession, storeSession, touchSession } from "./session-store";

/**
 * Auth.js's Drizzle adapter with Placet's rules on top:
 * - nobody is created at sign-in (people are invited first);
 * - a link's token is used up by one DELETE whose affected-row count decides, so two parallel uses of
 *   one link give one session (OWASP ASVS 4.0.3 V2.7.3; the stock adapter reads, then deletes);
 * - sessions are kept by the session store: only a hash of the cookie's value is stored, and the idle and
 *   absolute limits are checked on every read (OWASP ASVS 4.0.3 V3.3.1, V3.3.2).
 */
export function placetAdapter(): Adapter {
  const db = getDb();
  const base = DrizzleAdapter(db, {
    usersTable: users, accountsTable: accounts, sessionsTable: sessions, verificationTokensTable: verificationTokens,
  });
  return {
    ...base,
    async createUser() {
      throw new Error("Placet does not create people at sign-in: they are invited by the studio or the chair.");
    },
    async useVerificationToken({ identifier, token }) {
      const match = and(eq(verificationTokens.identifier, identifier), eq(verificationTokens.token, token));
      const [row] = await db.select().from(verificationTokens).where(match).limit(1);
      if (!row) return null;
      const [res] = await db.delete(verificationTokens).where(and(match, gt(verificationTokens.expires, new Date())));
      return res.affectedRows === 1 ? row : null;
    },
    async createSession({ sessionToken, userId }) {
      const expires = await storeSession(sessionToken, userId, "");
      return { sessionToken, userId, expires };
    },
    async getSessionAndUser(sessionToken) {
      const s = await resolveSession(sessionToken);
      if (!s) return null;
      const user = await base.getUser!(s.userId);
      return user ? { session: { sessionToken, userId: s.userId, expires: s.expires }, user } : null;
    },
    async updateSession({ sessionToken }) {
      const s = await touchSession(sessionToken);
      return s ? { sessionToken, userId: s.userId, expires: s.expires } : null;
    },
    async deleteSession(sessionToken) {
      await endSession(sessionToken);
    },
  };
}
