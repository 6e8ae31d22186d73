/**
 * The machinery of the authorization matrix: finding every route handler and server action in the file
 * tree, signing people in with real session rows, calling a handler or an action the way Next.js would,
 * and reading every table before and after so a refused attempt can be shown to have changed nothing.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { eq, sql } from "drizzle-orm";
import { NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { createSession, sessionCookie, sessionIdFor, sessionLimits } from "@/lib/session-store";
import { env } from "@/lib/env";

export const ROOT = path.resolve(import.meta.dirname, "../..");
export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}
const rel = (f: string) => path.relative(ROOT, f).split(path.sep).join("/");
const sourceFiles = (dir: string) => walk(path.join(ROOT, dir)).filter((f) => /\.(ts|tsx)$/.test(f));

/** Every route handler under app/api and app/ (route.ts), with the HTTP methods its module exports. */
export async function discoverRoutes(): Promise<{ file: string; method: string }[]> {
  const found: { file: string; method: string }[] = [];
  for (const f of sourceFiles("app").filter((x) => /\/route\.tsx?$/.test(x))) {
    const mod = await import(/* @vite-ignore */ f);
    for (const m of HTTP_METHODS) if (typeof mod[m] === "function") found.push({ file: rel(f), method: m });
  }
  return found;
}

const startsWithUseServer = (f: string) =>
  /^["']use server["']/.test(readFileSync(f, "utf8").replace(/^(\s|\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)*/, ""));

/**
 * Files that declare a server action inside a function ("use server" in its body). The matrix cannot call
 * those from outside, so they are listed to fail the test: keep actions in "use server" files beside the route.
 */
export function inlineServerActions(): string[] {
  return [...sourceFiles("app"), ...sourceFiles("components")]
    .filter((f) => /["']use server["']/.test(readFileSync(f, "utf8")) && !startsWithUseServer(f)).map(rel);
}

/** Every server action: the exported async functions of each file under app/ that starts with "use server". */
export async function discoverActions(): Promise<{ file: string; name: string }[]> {
  const found: { file: string; name: string }[] = [];
  for (const f of sourceFiles("app")) {
    if (!startsWithUseServer(f)) continue;
    const mod = await import(/* @vite-ignore */ f);
    for (const [name, v] of Object.entries(mod)) if (typeof v === "function") found.push({ file: rel(f), name });
  }
  return found;
}

export const importApp = (file: string): Promise<Record<string, unknown>> => import(/* @vite-ignore */ path.join(ROOT, file));

// ---- sessions: a real row in `sessions`, its token in the request's cookie jar ----

/** The session cookie's name for the app URL the tests run under (http: no __Host- prefix). */
export const SESSION_COOKIE = sessionCookie().name;

/** The cookie jar that next/headers hands out in the test (the test file mocks next/headers with it). */
export interface Jar { cookies: Map<string, string> }
export function cookieHeader(jar: Jar): string {
  return [...jar.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
}

/**
 * Signs the person in as an e-mail link would leave them: a fresh database session through the session
 * store Auth.js's adapter uses; returns the cookie's value. `expired` makes one that ended a minute ago.
 */
export async function startSession(email: string, expired = false): Promise<string> {
  const [u] = await getDb().select().from(users).where(eq(users.email, email));
  if (!u) throw new Error(`no user ${email}`);
  const started = expired ? new Date(Date.now() - (sessionLimits().absoluteSeconds + 60) * 1000) : new Date();
  return createSession(u.id, "authorization matrix", started);
}
export async function endSession(token: string) {
  await getDb().delete(sessions).where(eq(sessions.sessionToken, sessionIdFor(token)));
}

// ---- calling ----

/** Same-origin headers a browser sends with a form or fetch from the app's own pages. */
export function sameOrigin(json: boolean): Record<string, string> {
  return { origin: env.appUrl, "sec-fetch-site": "same-origin", ...(json ? { "content-type": "application/json" } : {}) };
}

export interface CallSpec {
  method: string;
  url: string;
  params: Record<string, string | string[]>;
  body?: unknown;
  form?: FormData;
}

export async function callRoute(file: string, spec: CallSpec, jar: Jar): Promise<Response> {
  const mod = await importApp(file);
  const handler = mod[spec.method] as (req: Request, ctx: unknown) => Promise<Response>;
  const mutating = !["GET", "HEAD", "OPTIONS"].includes(spec.method);
  const headers: Record<string, string> = { cookie: cookieHeader(jar), ...(mutating ? sameOrigin(spec.form === undefined) : {}) };
  const init: RequestInit = { method: spec.method, headers };
  if (spec.form) init.body = spec.form;
  else if (mutating) init.body = JSON.stringify(spec.body ?? {});
  const req = new NextRequest(new URL(spec.url, env.appUrl), init as ConstructorParameters<typeof NextRequest>[1]);
  return handler(req, { params: Promise.resolve(spec.params) });
}

/** What an attempt came to: "ok" (2xx), "redirect" (3xx or redirect()), a refusal status, or another status. */
export type Outcome = string;

export function routeOutcome(res: Response): Outcome {
  if (res.status >= 200 && res.status < 300) return "ok";
  if (res.status >= 300 && res.status < 400) return "redirect";
  return String(res.status);
}

const SIGN_IN_FIRST = "Sign in first.";
const NOT_FOUND = "Not found.";

/**
 * A server action answers with data or a plain message instead of a status. Sign-in and not-found
 * refusals carry the fixed messages of those errors; a field-by-field answer is bad input (422); any
 * other message is a refusal of someone the commission knows (403; a state conflict reads the same).
 */
export function actionOutcome(result: unknown): { outcome: Outcome; message?: string } {
  if (result === undefined || result === null || typeof result !== "object") return { outcome: "ok" };
  const r = result as { ok?: unknown; error?: unknown; errors?: Record<string, string>; message?: unknown; fields?: Record<string, string> };
  const fields = r.errors ?? r.fields;
  const message = typeof r.error === "string" ? r.error : fields?._form ?? (r.ok === false && typeof r.message === "string" ? r.message : undefined);
  const failed = r.ok === false || typeof r.error === "string" || fields !== undefined;
  if (!failed) return { outcome: "ok" };
  if (message === SIGN_IN_FIRST) return { outcome: "401", message };
  if (message === NOT_FOUND) return { outcome: "404", message };
  if (fields && Object.keys(fields).some((k) => k !== "_form")) return { outcome: "422", message: JSON.stringify(fields) };
  return { outcome: "403", message: String(message) };
}

/** redirect() and notFound() throw; their digests say which. Anything else thrown is a 500. */
export function thrownOutcome(err: unknown): { outcome: Outcome; message?: string } {
  const digest = (err as { digest?: unknown })?.digest;
  if (typeof digest === "string" && digest.startsWith("NEXT_REDIRECT")) return { outcome: "redirect", message: digest.split(";")[2] };
  if (typeof digest === "string" && digest.startsWith("NEXT_HTTP_ERROR_FALLBACK;404")) return { outcome: "404" };
  return { outcome: "500", message: err instanceof Error ? err.message : String(err) };
}

// ---- every table, before and after ----

export type Snapshot = Record<string, string>;

/** Row count of every table in the database, and a checksum of its contents (sessions: count only). */
export async function snapshot(): Promise<Snapshot> {
  const db = getDb();
  const [tables] = (await db.execute(sql`SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' ORDER BY table_name`)) as unknown as [{ t: string }[]];
  const names = tables.map((r) => r.t);
  const counts = names.map((n) => `SELECT '${n}' AS t, COUNT(*) AS n FROM \`${n}\``).join(" UNION ALL ");
  const [countRows] = (await db.execute(sql.raw(counts))) as unknown as [{ t: string; n: number }[]];
  const summed = names.filter((n) => n !== "sessions").map((n) => `\`${n}\``).join(", ");
  const [sums] = (await db.execute(sql.raw(`CHECKSUM TABLE ${summed}`))) as unknown as [{ Table: string; Checksum: number }[]];
  const out: Snapshot = {};
  for (const r of countRows) out[`${r.t} rows`] = String(r.n);
  for (const r of sums) out[`${r.Table.split(".").pop()} contents`] = String(r.Checksum);
  return out;
}

export function differences(before: Snapshot, after: Snapshot): string[] {
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...keys].filter((k) => before[k] !== after[k]).map((k) => `${k}: ${before[k]} → ${after[k]}`);
}
