import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import sharp from "sharp";
import { makePerson, newCommissionViaForm, signInAs, sql } from "./helpers";

const MUTATING = ["POST", "PUT", "PATCH", "DELETE"] as const;
const UPLOAD_LIMIT = 25 * 1024 * 1024 + 256 * 1024;

interface Route { file: string; url: string; method: string; upload: boolean; viaHandle: boolean }

/** Every app/api/**\/route.ts and the mutating methods it exports, read from the file tree. */
function mutatingRoutes(): Route[] {
  const root = path.join(process.cwd(), "app", "api");
  const files = (readdirSync(root, { recursive: true }) as string[]).filter((f) => path.basename(f) === "route.ts");
  const out: Route[] = [];
  for (const rel of files) {
    const src = readFileSync(path.join(root, rel), "utf8");
    const url = `/api/${path.dirname(rel).split(path.sep).join("/")}`;
    for (const method of MUTATING) {
      const exported = new RegExp(`export\\s+(const\\s+${method}\\b|(async\\s+)?function\\s+${method}\\b|const\\s*\\{[^}]*\\b${method}\\b[^}]*\\})`).test(src);
      if (!exported) continue;
      const viaHandle = new RegExp(`export\\s+const\\s+${method}\\s*=\\s*handle\\(`).test(src);
      out.push({ file: `app/api/${rel}`, url, method, upload: /\{\s*body:\s*"multipart"\s*\}/.test(src), viaHandle });
    }
  }
  return out;
}

/** Everything stored about one commission (and its people), to show a refused request changed nothing. */
async function snapshot(commissionId: number, userEmails: string[]): Promise<string> {
  const parts: unknown[] = [];
  for (const t of ["revisions", "attachments", "comments", "ballots", "decisions", "trail_events", "commission_members"]) {
    parts.push(await sql(`SELECT * FROM ${t} WHERE commission_id = ? ORDER BY id`, [commissionId]));
  }
  parts.push(await sql("SELECT v.* FROM votes v JOIN ballots b ON b.id = v.ballot_id WHERE b.commission_id = ? ORDER BY v.id", [commissionId]));
  parts.push(await sql("SELECT id, email, name, notices FROM users WHERE email IN (?) ORDER BY id", [userEmails]));
  // The worker may deliver queued mail meanwhile, so only the number of messages is compared.
  parts.push(await sql("SELECT COUNT(*) AS n FROM outbox WHERE to_email IN (?)", [userEmails]));
  parts.push(await sql("SELECT COUNT(*) AS n FROM digest_items WHERE commission_id = ?", [commissionId]));
  return JSON.stringify(parts);
}

async function png(): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: "#d8e8e2" } }).png().toBuffer();
}

/** A circulated revision of the test's own with a file, an open ballot and a comment, and every id the routes take. */
async function fixtures(designer: Page, chair: Page) {
  const { title, commissionId } = await newCommissionViaForm(designer, "Font for the guard test", "St Ia's — Fabric Committee", "St Ia's, the west end");
  await designer.goto(`/commissions/${commissionId}/revisions/new`);
  await designer.getByLabel("What changed and why (you can finish this later)").fill("First proposal: a cast bowl on a ground foot.");
  await designer.getByRole("button", { name: "Start the draft" }).click();
  await expect(designer).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1/edit$`));
  const [rev] = await sql<{ id: number }[]>("SELECT id FROM revisions WHERE commission_id = ? AND number = 1", [commissionId]);
  const up = await designer.request.post(`/api/revisions/${rev.id}/attachments`, { multipart: { file: { name: "plan.png", mimeType: "image/png", buffer: await png() } } });
  expect(up.status()).toBe(201);
  const attachmentId = (await up.json()).id as number;
  await designer.getByRole("button", { name: "Circulate Revision 1…" }).click();
  await designer.getByRole("button", { name: "Yes, freeze and circulate Revision 1" }).click();
  await expect(designer).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1$`));
  return { title, commissionId, revisionId: rev.id, attachmentId, chair };
}

const ATTACK_BODY = JSON.stringify({ choice: "in-favour", body: "Sent from elsewhere", caption: "x", notices: "digest", outcome: "approved", conditions: "", closesAt: new Date(Date.now() + 86400_000).toISOString() });

test("every mutating API route refuses a missing or foreign Origin, a cross-site fetch, a non-JSON body and an oversized body, and nothing changes", async ({ page, browser, baseURL }, info) => {
  test.skip(info.project.name !== "desktop", "one run is enough: the routes are the same on a phone");
  test.setTimeout(480_000);
  const routes = mutatingRoutes();
  // The route list comes from the files; make sure it found them (a broken scan must not pass quietly).
  expect(routes.length).toBeGreaterThanOrEqual(15);

  // Every mutating route goes through handle(), which does the checking; Auth.js's own endpoints are the
  // one exception (their sign-in POST is answered by the sign-in work, not here).
  const bypass = [...new Set(routes.filter((r) => !r.viaHandle).map((r) => r.file))];
  expect(bypass).toEqual(["app/api/auth/[...nextauth]/route.ts"]);

  const designerEmail = await makePerson("designer");
  await signInAs(page, designerEmail);
  const chairCtx = await browser.newContext({ baseURL, extraHTTPHeaders: { origin: new URL(baseURL!).origin } });
  const chair = await chairCtx.newPage();
  const f = await fixtures(page, chair);
  const chairEmail = await makePerson("chair", { commissionTitle: f.title });
  const memberEmail = await makePerson("member", { commissionTitle: f.title });
  await signInAs(chair, chairEmail);
  // The rules are the committee's: the chair sets the authority for electronic ballots (and so confirms them).
  await chair.goto(`/commissions/${f.commissionId}/rules`);
  await chair.getByLabel("Authority for electronic ballots").fill("Standing order 2: electronic ballots between meetings");
  await chair.getByRole("button", { name: "Save the rules" }).click();
  await expect(chair).toHaveURL(new RegExp(`/commissions/${f.commissionId}$`));
  const listed = await chair.request.post(`/api/commissions/${f.commissionId}/permissions`, { data: { name: "Faculty", authority: "The diocese" } });
  expect(listed.status(), await listed.text()).toBeLessThan(300);
  const permissionId = ((await listed.json()) as { permissions: { id: number }[] }).permissions[0].id;
  const opened = await chair.request.post(`/api/revisions/${f.revisionId}/ballot`, { data: { closesAt: new Date(Date.now() + 3 * 86400_000).toISOString() } });
  expect(opened.status(), await opened.text()).toBe(201);
  const posted = await chair.request.post(`/api/revisions/${f.revisionId}/comments`, { data: { body: "Is the foot ground or polished?" } });
  expect(posted.status()).toBe(201);
  const commentId = ((await posted.json()) as { id: number }).id;
  const [ballot] = await sql<{ id: number }[]>("SELECT id FROM ballots WHERE revision_id = ?", [f.revisionId]);
  const ids: Record<string, number> = { attachmentId: f.attachmentId, ballotId: ballot.id, commentId, revisionId: f.revisionId, commissionId: f.commissionId, permissionId, number: 1 };
  const fill = (url: string) => url.replace(/\[(\w+)\]/g, (_, k: string) => {
    if (!(k in ids)) throw new Error(`no test id for the route segment [${k}] in ${url}: add one`);
    return String(ids[k]);
  });

  const origin = new URL(baseURL!).origin;
  // The chair's cookies with no Origin header at all, as a tool or an old browser sends (plain fetch: Playwright's
  // request contexts add the configured Origin).
  const cookie = (await chairCtx.cookies(baseURL!)).map((c) => `${c.name}=${c.value}`).join("; ");
  const bare = async (url: string, method: string, headers: Record<string, string>, body: string) =>
    (await fetch(new URL(url, baseURL), { method, headers: { ...headers, cookie }, body })).status;
  const before = await snapshot(f.commissionId, [designerEmail, chairEmail, memberEmail]);
  const answers: string[] = [];
  for (const r of routes.filter((x) => x.viaHandle)) {
    const url = fill(r.url);
    const send = (ctx: APIRequestContext, headers: Record<string, string>, data: string | Buffer) => ctx.fetch(url, { method: r.method, headers, data, failOnStatusCode: false });
    const json = { "content-type": "application/json" };
    const cases: [string, () => Promise<number | null>, number][] = [
      // OWASP ASVS 4.0.3 V13.2.3 / V4.2.2: cookies alone do not let another site change anything.
      ["no Origin", async () => bare(url, r.method, json, ATTACK_BODY), 403],
      ["foreign Origin", async () => (await send(chair.request, { ...json, origin: "https://evil.example" }, ATTACK_BODY)).status(), 403],
      ["Sec-Fetch-Site: cross-site", async () => (await send(chair.request, { ...json, origin, "sec-fetch-site": "cross-site" }, ATTACK_BODY)).status(), 403],
      // OWASP ASVS 4.0.3 V13.2.5: the body type is checked (a cross-site form can send text/plain without a preflight).
      ["text/plain", async () => (await send(chair.request, { origin, "content-type": "text/plain" }, ATTACK_BODY)).status(), 415],
      // OWASP ASVS 4.0.3 V12.1.1: bodies are capped before parsing (uploads at their own limit, as before).
      r.upload
        ? ["body over the upload limit", async () => {
            const res = await chair.request.fetch(url, { method: r.method, headers: { origin }, multipart: { file: { name: "big.png", mimeType: "image/png", buffer: Buffer.alloc(UPLOAD_LIMIT + 1) } }, failOnStatusCode: false }).catch(() => null);
            return res ? res.status() : null; // null: the server closed the connection on it, also a refusal
          }, 413]
        : ["1 MB body", async () => (await send(chair.request, { ...json, origin }, JSON.stringify({ body: "a".repeat(1024 * 1024) }))).status(), 413],
    ];
    for (const [name, run, want] of cases) {
      const got = await run();
      answers.push(`${r.method} ${r.url} × ${name}: ${got ?? "connection closed"}`);
      if (got !== null) expect(got, `${r.method} ${r.url} × ${name}`).toBe(want);
    }
  }
  const after = await snapshot(f.commissionId, [designerEmail, chairEmail, memberEmail]);
  await info.attach("answers.txt", { body: answers.join("\n"), contentType: "text/plain" });
  expect(after).toBe(before);

  // The same requests from our own pages' origin do reach the handlers (so the refusals above are the guard's).
  const ok = await chair.request.post(`/api/comments/${commentId}/replies`, { data: { body: "Ground, as on the sample." } });
  expect(ok.status()).toBe(201);
  const pref = await chair.request.patch("/api/me/notices", { data: { notices: "digest" } });
  expect(pref.status()).toBe(200);
  expect(await snapshot(f.commissionId, [designerEmail, chairEmail, memberEmail])).not.toBe(before);
  await chairCtx.close();
});
