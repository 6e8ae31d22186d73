import type mysql from "mysql2/promise";

/** What the app's user may do: rows in every table, but the trail may only be read and added to. */
export const APP_PRIVILEGES = "SELECT, INSERT, UPDATE, DELETE";
export const TRAIL_PRIVILEGES = "SELECT, INSERT";
/** Tables the app never touches. */
const MIGRATOR_ONLY = new Set(["__drizzle_migrations"]);

/** Hosts the app's user is created for (scripts/db.sh makes both). */
export function appHosts(): string[] {
  return (process.env.DB_APP_HOSTS ?? "127.0.0.1,localhost").split(",").map((h) => h.trim()).filter(Boolean);
}

/**
 * Grants the app's user its table-level privileges on every table of `db`, run as the migrator after
 * each migration so that new tables are covered. Table-level grants (not `db`.*) because a
 * database-level UPDATE or DELETE would also reach trail_events.
 */
export async function grantAppPrivileges(conn: mysql.Connection, db: string, user: string): Promise<number> {
  const [rows] = await conn.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? AND table_type = 'BASE TABLE'",
    [db],
  );
  const tables = (rows as { name: string }[]).map((r) => r.name).filter((t) => !MIGRATOR_ONLY.has(t));
  for (const host of appHosts()) {
    const who = `${conn.escape(user)}@${conn.escape(host)}`;
    for (const t of tables) {
      const privileges = t === "trail_events" ? TRAIL_PRIVILEGES : APP_PRIVILEGES;
      await conn.query(`GRANT ${privileges} ON \`${db}\`.\`${t}\` TO ${who}`);
    }
  }
  return tables.length;
}
