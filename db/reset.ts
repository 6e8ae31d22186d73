import mysql from "mysql2/promise";
import { runMigrations } from "./migrate";
import { databaseName, migratorUrl } from "./urls";

/** Drops and recreates the database named in the app's `url` (as the migrator), then applies every migration. */
export async function resetDatabase(url: string): Promise<void> {
  const name = databaseName(url);
  const server = new URL(migratorUrl(url));
  server.pathname = "/";
  const conn = await mysql.createConnection({ uri: server.toString() });
  try {
    await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await conn.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await conn.end();
  }
  await runMigrations(url);
}
