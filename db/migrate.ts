import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import path from "node:path";

/** Applies every committed migration in db/migrations to the database at `url`. */
export async function runMigrations(url: string): Promise<void> {
  const conn = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    await migrate(drizzle(conn), { migrationsFolder: path.join(import.meta.dirname, "migrations") });
  } finally {
    await conn.end();
  }
}
