/**
 * The authorization matrix: every route handler and every server action, found in the file tree, tried
 * as eight people on an object of the demo's commission and on one of another studio's commission, each
 * signed in by a real session row whose cookie reaches Auth.js through next/headers. Every refused
 * attempt must leave every table's rows and contents, the trail included, as they were.
 * Sources: OWASP ASVS 4.0.3 V4.1.1, V4.1.3 (least privilege), V4.2.1 (IDOR); the role table of the product.
 */
import { afterAll, describe, expect, it, vi } from "vitest";
import type { Jar } from "./authz-matrix-harness";

const hoisted = vi.hoisted(() => {
  process.env.AUTH_SECRET ??= "authz-matrix-test-secret-0123456789abcdef";
  const jar = { cookies: new Map<string, string>() };
  return { jar };
});

vi.mock("next/headers", async () => {
  const { cookieHeader } = await import("./authz-matrix-harness");
  const jar: Jar = hoisted.jar;
  const store = {
    get: (name: string) => (jar.cookies.has(name) ? { name, value: jar.cookies.get(name)! } : undefined),
    getAll: () => [...jar.cookies].map(([name, value]) => ({ name, value })),
    has: (name: string) => jar.cookies.has(name),
    set: (name: string | { name: string; value: string }, value?: string) => {
      if (typeof name === "object") jar.cookies.set(name.name, name.value);
      else jar.cookies.set(name, value ?? "");
    },
    delete: (name: string) => jar.cookies.delete(name),
  };
  const { env } = await import("@/lib/env");
  const host = new URL(env.appUrl);
  return {
    cookies: async () => store,
    headers: async () => new Headers({ cookie: cookieHeader(jar), host: host.host, "x-forwarded-proto": host.protocol.replace(":", ""), origin: env.appUrl }),
  };
});
// Page caches do not exist outside a Next.js server; invalidating them is no part of authorization.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));
// Work a route hands to after() runs at once here, and the attempt waits for it (afterTasks in the runner).
vi.mock("next/server", async (orig) => ({
  ...(await orig<typeof import("next/server")>()),
  after: (task: () => unknown) => { afterTasks.push(Promise.resolve().then(task)); },
}));

import { closeDb } from "./db";
import { afterTasks, runMatrix } from "./authz-matrix-run";
import { differences, discoverActions, discoverRoutes, inlineServerActions, snapshot } from "./authz-matrix-harness";
import { getDb } from "./db";
import { like, sql } from "drizzle-orm";
import { outbox } from "@/db/schema";
import { TABLE } from "./authz-matrix-table";

afterAll(async () => {
  await closeDb();
});

describe("the authorization matrix", () => {
  it("has a row in the one table for every route handler and server action in the file tree", async () => {
    const routes = (await discoverRoutes()).map((x) => `${x.file} ${x.method}`);
    const actions = (await discoverActions()).map((x) => `${x.file}#${x.name}`);
    const found = new Set([...routes, ...actions]);
    const rows = new Set(TABLE.map((r) => r.key));
    const missing = [...found].filter((k) => !rows.has(k));
    const stale = [...rows].filter((k) => !found.has(k));
    if (missing.length) console.error(`No row in tests/integration/authz-matrix-table.ts for:\n  ${missing.join("\n  ")}\nAdd one (who may, on which object) before this route or action ships.`);
    if (stale.length) console.error(`Rows for routes or actions that no longer exist:\n  ${stale.join("\n  ")}`);
    expect(routes.length).toBeGreaterThan(20); // the walk found the route files at all
    expect(actions.length).toBeGreaterThan(6);
    const inline = inlineServerActions();
    if (inline.length) console.error(`Server actions declared inside a function, out of the matrix's reach:\n  ${inline.join("\n  ")}\nMove them to a "use server" file.`);
    expect({ missing, stale, inline }).toEqual({ missing: [], stale: [], inline: [] });
  });

  it("sees a single changed value in any table (the before/after picture can tell)", async () => {
    const { freshDemo } = await import("./db");
    await freshDemo();
    const before = await snapshot();
    await getDb().execute(sql`UPDATE commissions SET site = CONCAT(site, '.') ORDER BY id LIMIT 1`);
    const after = await snapshot();
    expect(differences(before, after)).toEqual([expect.stringMatching(/^commissions contents: /)]);
    expect(differences(after, await snapshot())).toEqual([]);
  });

  it("answers every attempt as the table says, allows nobody unexpected, and leaves refused attempts without a trace", async () => {
    // Auth.js logs the sign-in it turns away for want of its CSRF token; anything else logged is shown.
    const logged: unknown[][] = [];
    const spy = vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => { logged.push(args); });
    const result = await runMatrix(hoisted.jar).finally(() => spy.mockRestore());
    const unexpectedLogs = logged.filter((args) => !args.some((x) => /MissingCSRF|validateCSRF/.test(String(x))));
    for (const args of unexpectedLogs) console.error(...args);
    console.log(result.summary);
    expect(result.unexpectedAllows, "attempts allowed that the table refuses").toEqual([]);
    expect(result.mismatches, "attempts answered otherwise than the table says").toEqual([]);
    expect(result.traces, "refused attempts that changed something").toEqual([]);
    expect(result.leaks, "allowed answers that show what the caller may not see").toEqual([]);
    expect(result.attempts).toBeGreaterThan(500);
    // The chair's sign-in links were queued, to the chair only (the allowed attempts of those rows); the
    // sign-in form's unknown addresses got none.
    const links = await getDb().select({ to: outbox.toEmail }).from(outbox).where(like(outbox.dedupeKey, "sign-in:%"));
    expect(links.length).toBeGreaterThan(0);
    expect(new Set(links.map((l) => l.to))).toEqual(new Set(["margaret@stwenna.test"]));
  }, 30 * 60_000);
});
