import mysql from "mysql2/promise";
import { runMigrations } from "./migrate";

/** Drops and recreates the database named in `url`, then applies every migration. */
export async function resetDatabase(url: string): Promise<void> {
  const u = new URL(url);
  const name = decodeURIComponent(u.pathname.slice(1));
  if (!/^[A-Za-z0-9_]+$/.test(name)) throw new Error(`refusing odd database name ${name}`);
  const server = new URL(url);
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
