import { eq } from "drizzle-orm";
import mysql from "mysql2/promise";
import { migratorUrl } from "@/db/urls";
import { closeDb, databaseUrl, getDb } from "@/db/client";
import { resetDatabase } from "@/db/reset";
import { seedDemo } from "@/db/seed";
import { users } from "@/db/schema";
import { loadViewer, type Viewer } from "@/lib/dal/viewer";

/** Integration tests run against a database of their own (scripts/test.sh points DATABASE_URL at it). */
export function assertTestDatabase() {
  const url = databaseUrl();
  if (!/_test/.test(new URL(url).pathname)) throw new Error(`integration tests refuse to touch ${url}`);
}

/** Resets the test database to the demo people and commissions; revisions only when asked for. */
export async function freshDemo(opts: { revisions?: boolean } = {}) {
  assertTestDatabase();
  await closeDb();
  await resetDatabase(databaseUrl());
  return seedDemo({ revisions: opts.revisions ?? false });
}

/** The session id a test viewer carries; `signedIn()` (ballot-helpers) stores a session under it. */
export const testSessionId = (userId: string) => `test-session-${userId}`;

export async function viewer(email: string): Promise<Viewer> {
  const [u] = await getDb().select().from(users).where(eq(users.email, email));
  if (!u) throw new Error(`no user ${email}`);
  return (await loadViewer(u.id, testSessionId(u.id)))!;
}

export { getDb, closeDb };

/** Runs `fn` on a connection of the migrator's (DDL rights), for tests that play someone with database access. */
export async function asMigrator<T>(fn: (conn: mysql.Connection) => Promise<T>): Promise<T> {
  assertTestDatabase();
  const conn = await mysql.createConnection({ uri: migratorUrl(databaseUrl()), timezone: "Z" });
  try {
    return await fn(conn);
  } finally {
    await conn.end();
  }
}
