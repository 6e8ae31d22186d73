import "server-only";
import mysql from "mysql2/promise";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import * as schema from "./schema";
import { appDatabaseUrl } from "./urls";

export type Db = MySql2Database<typeof schema>;

type Holder = { pool?: mysql.Pool; db?: Db };
const g = globalThis as unknown as { __placetDb?: Holder };
const holder: Holder = (g.__placetDb ??= {});

/** The app's own database user: rows only (see db/grants.ts); DDL goes through the migrator. */
export function databaseUrl(): string {
  return appDatabaseUrl();
}

export function createPool(url = databaseUrl()): mysql.Pool {
  return mysql.createPool({
    uri: url,
    connectionLimit: Number(process.env.DB_POOL_SIZE ?? 10),
    timezone: "Z",
    enableKeepAlive: true,
    // MariaDB: keep multi-statements off; migrations are split by drizzle.
  });
}

/** The shared database handle (one pool per process). */
export function getDb(): Db {
  if (!holder.db) {
    holder.pool = createPool();
    holder.db = drizzle(holder.pool, { schema, mode: "default" });
  }
  return holder.db;
}

export async function closeDb(): Promise<void> {
  await holder.pool?.end();
  holder.pool = undefined;
  holder.db = undefined;
}

/** Transient connection errors worth one retry (a pool can hand out a dead connection after a restart). */
export function isTransient(err: unknown): boolean {
  const code = (err as { code?: string })?.code ?? (err as { cause?: { code?: string } })?.cause?.code;
  return ["PROTOCOL_CONNECTION_LOST", "ECONNRESET", "EPIPE", "ER_CON_COUNT_ERROR", "ECONNREFUSED"].includes(code ?? "");
}

export async function withRetry<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    if (!isTransient(err)) throw err;
    return fn();
  }
}
