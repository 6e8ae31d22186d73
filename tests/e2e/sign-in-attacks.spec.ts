import { expect, test, type APIRequestContext } from "@playwright/test";
import { MAIL_API, linkIn, makePerson, sql, testClientIp, waitForMail } from "./helpers";

/** Sign-in attacked over plain HTTP against the running app, the way an outsider would try it. */

const CHAIR = "margaret@stwenna.test";
const originOf = (baseURL?: string) => new URL(baseURL!).origin;

async function askForLink(request: APIRequestContext, baseURL: string | undefined, email: string, ip = testClientIp()) {
  return request.post("/sign-in/request", { form: { email, next: "" }, headers: { origin: originOf(baseURL), "x-forwarded-for": ip }, maxRedirects: 0 });
}

async function mailsTo(address: string): Promise<number> {
  const all = (await (await fetch(`${MAIL_API}/api/email`)).json()) as { to: { address: string }[] }[];
  return all.filter((m) => m.to.some((t) => t.address === address)).length;
}

/** Waits until the outbox has handed every mail queued for these addresses to the catcher. */
async function outboxDrained(addresses: string[]) {
  await expect.poll(async () => Number((await sql<{ n: number }[]>("SELECT COUNT(*) AS n FROM outbox WHERE to_email IN (?) AND status <> 'sent'", [addresses]))[0].n), { timeout: 30_000 }).toBe(0);
}

async function useLink(request: APIRequestContext, baseURL: string | undefined, link: string, email?: string) {
  const u = new URL(link);
  return request.post("/sign-in/confirm/complete", {
    form: { token: u.searchParams.get("token")!, email: email ?? u.searchParams.get("email")!, next: "" },
    headers: { origin: originOf(baseURL) }, maxRedirects: 0,
  });
}

// Several sign-ins and mail round trips per test, on a shared machine: a longer allowance.
test.describe.configure({ timeout: 180_000 });

test("Auth.js's own sign-in endpoints are not served (OWASP ASVS 4.0.3 V1.2.4: one way in)", async ({ request }) => {
  expect((await request.get("/api/auth/csrf")).status()).toBe(404);
  expect((await request.post("/api/auth/signin/nodemailer", { form: { email: CHAIR, csrfToken: "x" } })).status()).toBe(404);
  expect((await request.get(`/api/auth/callback/nodemailer?token=x&email=${CHAIR}`)).status()).toBe(404);
  expect((await request.post("/api/auth/signin/nodemailer", { form: { email: "margaret@stwénna.test" } })).status()).toBe(404);
});

test("look-alikes of the chair's address get no mail and no session; ASCII capitals are her (OWASP ASVS 4.0.3 V5.1.3, Unicode UTS #39)", async ({ request, baseURL }, info) => {
  test.skip(info.project.name !== "desktop", "one run only: both projects would share the chair's mailbox");
  const lookAlikes = ["margaret@stwénna.test", "margaret@stwennа.test" /* Cyrillic а */, "margaret@stwenna.test.", "margaret+x@stwenna.test"];
  const sessionsBefore = (await sql<{ n: number }[]>("SELECT COUNT(*) AS n FROM sessions s JOIN users u ON u.id = s.userId WHERE u.email = ?", [CHAIR]))[0].n;
  for (const a of lookAlikes) {
    const res = await askForLink(request, baseURL, a);
    expect(res.status(), a).toBe(303);
  }
  const since = Date.now();
  const res = await askForLink(request, baseURL, "MARGARET@STWENNA.TEST");
  expect(res.headers().location).toBe("/sign-in/check-inbox");
  const mail = await waitForMail(CHAIR, since, (m) => m.subject.includes("sign-in link"));
  await outboxDrained([CHAIR, ...lookAlikes]);
  for (const a of lookAlikes) expect(await mailsTo(a), a).toBe(0);
  const tokens = await sql<{ identifier: string }[]>("SELECT identifier FROM verification_tokens WHERE identifier LIKE 'margaret%'");
  expect(tokens.filter((t) => t.identifier !== CHAIR)).toEqual([]);

  // Her own link, presented for the accented look-alike, signs nobody in.
  const link = linkIn(mail, "/sign-in/confirm");
  const forged = await useLink(request, baseURL, link, "margaret@stwénna.test");
  expect(forged.headers().location).toBe("/sign-in?error=Verification");
  expect((await sql<{ n: number }[]>("SELECT COUNT(*) AS n FROM sessions s JOIN users u ON u.id = s.userId WHERE u.email = ?", [CHAIR]))[0].n).toBe(sessionsBefore);

  // The same link as mailed signs Margaret in.
  const ok = await useLink(request, baseURL, link);
  expect(ok.status()).toBe(303);
  expect(ok.headers().location).toBe("/commissions");
  const session = await (await request.get("/api/auth/session")).json();
  expect(session.user.email).toBe(CHAIR);
});

test("unknown and invited addresses get the same status, Location and page (OWASP WSTG-IDNT-04)", async ({ request, baseURL }) => {
  const invited = await makePerson("member");
  const unknown = `nobody-${Date.now()}@example.test`;
  const times: Record<string, number[]> = { invited: [], unknown: [] };
  const answers: Record<string, string[]> = { invited: [], unknown: [] };
  for (let i = 0; i < 4; i++) {
    for (const [kind, email] of [["invited", invited], ["unknown", unknown]] as const) {
      const t0 = performance.now();
      const res = await askForLink(request, baseURL, email);
      times[kind].push(performance.now() - t0);
      answers[kind].push(`${res.status()} ${res.headers().location} ${await res.text()}`);
    }
  }
  expect(new Set([...answers.invited, ...answers.unknown]).size).toBe(1);
  const page = async () => (await request.get("/sign-in/check-inbox")).text();
  // Each page has a nonce of its own (in attributes and in the streamed payload); all else is the same.
  const strip = (html: string) => {
    const nonce = /nonce="([^"]+)"/.exec(html)?.[1];
    return nonce ? html.split(nonce).join("") : html;
  };
  expect(strip(await page())).toBe(strip(await page()));
  const median = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  console.log(`median answer time: invited ${median(times.invited).toFixed(1)} ms, unknown ${median(times.unknown).toFixed(1)} ms`);
  expect(Math.abs(median(times.invited) - median(times.unknown))).toBeLessThan(250);
});

test("20 parallel requests for one address send at most 5 mails (OWASP ASVS 4.0.3 V2.2.1)", async ({ request, baseURL }) => {
  const email = await makePerson("member");
  const answers = await Promise.all(Array.from({ length: 20 }, () => askForLink(request, baseURL, email)));
  expect(new Set(answers.map((a) => `${a.status()} ${a.headers().location}`))).toEqual(new Set(["303 /sign-in/check-inbox"]));
  await waitForMail(email, Date.now() - 60_000);
  await outboxDrained([email]);
  const sent = await mailsTo(email);
  console.log(`20 parallel requests for one address: ${sent} mails`);
  expect(sent).toBeGreaterThanOrEqual(1);
  expect(sent).toBeLessThanOrEqual(5);
});

test("the per-IP limit holds across addresses: 20 links per client IP (OWASP ASVS 4.0.3 V2.2.1)", async ({ request, baseURL }) => {
  const ip = `203.0.113.${1 + Math.floor(Math.random() * 254)}`; // RFC 5737 documentation range
  const people = await Promise.all(Array.from({ length: 22 }, () => makePerson("member")));
  for (const p of people) await askForLink(request, baseURL, p, ip);
  // The lookups run after the answer has gone: wait for the twentieth mail, give any stragglers time to
  // queue a 21st, then count once the outbox is empty (draining alone can pass before anything is queued).
  const total = async () => { let n = 0; for (const p of people) n += await mailsTo(p); return n; };
  await expect.poll(total, { timeout: 90_000 }).toBeGreaterThanOrEqual(20);
  await new Promise((r) => setTimeout(r, 5_000));
  await outboxDrained(people);
  const sent = await total();
  console.log(`22 addresses from one IP: ${sent} mails`);
  expect(sent).toBe(20);
});

test("two parallel uses of one link give exactly one session (OWASP ASVS 4.0.3 V2.7.3)", async ({ playwright, request, baseURL }) => {
  const email = await makePerson("member");
  const since = Date.now();
  await askForLink(request, baseURL, email);
  const link = linkIn(await waitForMail(email, since, (m) => m.subject.includes("sign-in link")), "/sign-in/confirm");
  const a = await playwright.request.newContext({ baseURL });
  const b = await playwright.request.newContext({ baseURL });
  const [ra, rb] = await Promise.all([useLink(a, baseURL, link), useLink(b, baseURL, link)]);
  expect([ra.headers().location, rb.headers().location].sort()).toEqual(["/commissions", "/sign-in?error=Verification"]);
  expect((await sql<{ n: number }[]>("SELECT COUNT(*) AS n FROM sessions s JOIN users u ON u.id = s.userId WHERE u.email = ?", [email]))[0].n).toBe(1);
  await a.dispose();
  await b.dispose();
});

test("sign-in forms refuse posts from other sites (OWASP ASVS 4.0.3 V4.2.2)", async ({ request }) => {
  const email = await makePerson("member");
  // An empty Origin stands for none (the test's own requests carry the app's Origin by default).
  for (const headers of [{ origin: "" } as Record<string, string>, { origin: "https://evil.example" }, { origin: "null" }]) {
    expect((await request.post("/sign-in/request", { form: { email }, headers, maxRedirects: 0 })).status()).toBe(403);
    expect((await request.post("/sign-in/confirm/complete", { form: { token: "x", email }, headers, maxRedirects: 0 })).status()).toBe(403);
  }
  expect(await sql<unknown[]>("SELECT * FROM verification_tokens WHERE identifier = ?", [email])).toHaveLength(0);
});
