import { sql } from "drizzle-orm";
import { getDb, withRetry } from "@/db/client";

export const dynamic = "force-dynamic";

/** Is the database reachable? Used by scripts and load balancers. */
export async function GET() {
  const started = Date.now();
  try {
    await withRetry(() => getDb().execute(sql`SELECT 1`));
    return Response.json({ ok: true, database: "reachable", ms: Date.now() - started });
  } catch {
    return Response.json({ ok: false, database: "unreachable" }, { status: 503 });
  }
}
