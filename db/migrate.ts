import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import path from "node:path";
import { grantAppPrivileges } from "./grants";
import { appUser, databaseName, migratorUrl } from "./urls";

/**
 * Applies every committed migration to the database `appUrl` names, as the migrator, then grants the
 * app's user (the one in `appUrl`) its table privileges, new tables included.
 */
export async function runMigrations(appUrl: string): Promise<{ tables: number }> {
  const conn = await mysql.createConnection({ uri: migratorUrl(appUrl), timezone: "Z" });
  try {
    await migrate(drizzle(conn), { migrationsFolder: path.join(import.meta.dirname, "migrations") });
    return { tables: await grantAppPrivileges(conn, databaseName(appUrl), appUser(appUrl)) };
  } finally {
    await conn.end();
  }
}
