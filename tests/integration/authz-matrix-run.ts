/** Walks the table: each row × each role × each object, with before/after pictures of every table. */
import {
  actionOutcome, callRoute, differences, endSession, importApp, routeOutcome, snapshot, SESSION_COOKIE, startSession, thrownOutcome,
  type Jar, type Outcome,
} from "./authz-matrix-harness";
import { expected, ROLE_ORDER, TABLE, type Row } from "./authz-matrix-table";
import { buildWorld, FACTORIES, ROLES, type Obj, type Role, type SideName, type Sides } from "./authz-matrix-world";

const REFUSALS = new Set(["401", "403", "404"]);
const PASSED = new Set(["ok", "redirect"]);

export interface MatrixResult {
  attempts: number;
  summary: string;
  unexpectedAllows: string[];
  mismatches: string[];
  traces: string[];
  leaks: string[];
}

function urlFor(row: Row, o: Obj): { url: string; params: Record<string, string | string[]> } {
  if (row.url) return { url: row.url, params: row.params ?? {} };
  const file = row.key.split(" ")[0];
  const params: Record<string, string> = {};
  const url = "/" + file.replace(/^app\//, "").replace(/\/route\.tsx?$/, "").replace(/\[(\w+)\]/g, (_m, name: string) => {
    const v = o[name as keyof Obj];
    if (!v) throw new Error(`${row.key}: the object gives no ${name}`);
    return (params[name] = String(v));
  });
  return { url, params };
}

async function attempt(row: Row, o: Obj, jar: Jar): Promise<{ outcome: Outcome; message?: string; body?: string }> {
  if (row.call) {
    const [file, name] = row.key.split("#");
    const fn = (await importApp(file))[name] as (...args: never[]) => Promise<unknown>;
    try {
      return actionOutcome(await row.call(fn, o));
    } catch (err) {
      return thrownOutcome(err);
    }
  }
  const [file, method] = row.key.split(" ");
  const { url, params } = urlFor(row, o);
  const res = await callRoute(file, { method, url, params, body: row.body?.(o), form: row.form ? await row.form(o) : undefined }, jar);
  await Promise.all(afterTasks.splice(0));
  const outcome = routeOutcome(res);
  const text = await res.text().catch(() => "");
  return outcome === "ok" ? { outcome, body: text } : { outcome, message: text.slice(0, 160) };
}

/** Work routes handed to next/server's after() (the test mocks it to run at once); awaited per attempt. */
export const afterTasks: Promise<unknown>[] = [];

export async function runMatrix(jar: Jar): Promise<MatrixResult> {
  const sides: Sides = await buildWorld();
  const out: MatrixResult = { attempts: 0, summary: "", unexpectedAllows: [], mismatches: [], traces: [], leaks: [] };
  const tally = new Map<string, number>();
  let rowsTried = 0;
  for (const row of TABLE) {
    rowsTried += 1;
    const objectSides: SideName[] = row.object === "none" ? ["own"] : ["own", "foreign"];
    for (const sideName of objectSides) {
      for (const role of [...ROLE_ORDER, "expired" as const]) {
        const o = await FACTORIES[row.object](sides[sideName]);
        const token = await signIn(role, jar);
        const before = await snapshot();
        const got = await attempt(row, o, jar);
        const after = await snapshot();
        if (token) await endSession(token);
        jar.cookies.clear();
        out.attempts += 1;
        tally.set(got.outcome, (tally.get(got.outcome) ?? 0) + 1);
        const want = expected(row, role === "expired" ? "anonymous" : role, sideName); // an expired session is nobody
        const where = `${row.key} [${row.object}, ${sideName}] as ${role}: expected ${want.join("|")}, got ${got.outcome}${got.message ? ` (${got.message})` : ""}`;
        if (!want.includes(got.outcome)) {
          if (PASSED.has(got.outcome) && want.every((w) => REFUSALS.has(w))) out.unexpectedAllows.push(where);
          else out.mismatches.push(where);
        }
        if (got.outcome === "ok" && row.inspect && got.body !== undefined) {
          const leak = row.inspect(got.body, { role, email: role === "expired" ? null : ROLES[role], own: sides.own.commissionId, foreign: sides.foreign.commissionId });
          if (leak) out.leaks.push(`${where}: ${leak}`);
        }
        if (!PASSED.has(got.outcome) || row.unchangedAlways) {
          // An expired session is deleted by Auth.js when it is shown: that row is the caller's own.
          const diff = differences(before, after).filter((d) => !(role === "expired" && d.startsWith("sessions rows")));
          if (diff.length) out.traces.push(`${where}: ${diff.join("; ")}`);
        }
      }
    }
  }
  const routes = new Set(TABLE.filter((r) => !r.call).map((r) => r.key)).size;
  const actions = new Set(TABLE.filter((r) => r.call).map((r) => r.key)).size;
  out.summary = [
    `authorization matrix: ${rowsTried} rows (${routes} route handler methods, ${actions} server actions) × ${ROLE_ORDER.length + 1} callers × own/foreign objects = ${out.attempts} attempts`,
    `outcomes: ${[...tally].sort().map(([k, n]) => `${k} ${n}`).join(", ")}`,
    `(each row also as a ninth caller, the chair with a session that expired a minute ago: treated as nobody signed in)`,
    `unexpected allows: ${out.unexpectedAllows.length}; other mismatches: ${out.mismatches.length}; refused attempts that left a trace: ${out.traces.length}; leaks in allowed answers: ${out.leaks.length}`,
  ].join("\n");
  return out;
}

async function signIn(role: Role | "expired", jar: Jar): Promise<string | null> {
  jar.cookies.clear();
  const email = role === "expired" ? ROLES.chair : ROLES[role];
  if (!email) return null;
  const token = await startSession(email, role === "expired");
  jar.cookies.set(SESSION_COOKIE, token);
  return token;
}
