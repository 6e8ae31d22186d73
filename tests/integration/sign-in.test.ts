import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { eq, like, sql } from "drizzle-orm";
import { outbox, securityLog, sessions, signInCounters, users, verificationTokens } from "@/db/schema";
import { completeSignIn, requestSignInLink } from "@/lib/auth";
import { emailSchema } from "@/models/schemas/people";
import { freshDemo, getDb } from "./db";

const CHAIR = "margaret@stwenna.test";
const count = async (t: typeof sessions | typeof verificationTokens) => Number((await getDb().select({ n: sql<number>`count(*)` }).from(t))[0].n);
/** Sign-in mail only (the demo queues other mail of its own). */
const signInMail = () => getDb().select().from(outbox).where(like(outbox.dedupeKey, "sign-in:%"));
const mailsTo = async (to: string) => (await signInMail()).filter((m) => m.toEmail === to).length;
const tokenFrom = (text: string) => new URL(/https?:\/\/\S+/.exec(text)![0]).searchParams.get("token")!;
let ipSeq = 0;
const ip = () => `198.18.0.${++ipSeq}`; // RFC 2544 benchmarking range: no real client

/** Asks for a link as the sign-in route does: the one schema first, then the request. */
async function ask(raw: string, from = ip()) {
  const parsed = emailSchema.safeParse(raw);
  if (!parsed.success) return "refused by the schema";
  return requestSignInLink({ email: parsed.data, ip: from, next: "/commissions" });
}

beforeAll(async () => { await freshDemo(); });
beforeEach(async () => {
  const db = getDb();
  for (const t of [signInCounters, verificationTokens, sessions, securityLog]) await db.delete(t);
  await db.delete(outbox).where(like(outbox.dedupeKey, "sign-in:%"));
});

describe("one way in: look-alike addresses", () => {
  it("the database itself compares addresses byte for byte (utf8mb4_bin)", async () => {
    // Unicode TR #10 (collation): utf8mb4_unicode_ci treats é = e and A = a; a binary collation does not.
    for (const probe of ["margaret@stwénna.test", "MARGARET@STWENNA.TEST", "margaret@stwenna.tést"]) {
      expect(await getDb().select().from(users).where(eq(users.email, probe))).toHaveLength(0);
    }
  });

  it("queues no mail for accented, Cyrillic, trailing-dot or plus-address look-alikes (OWASP ASVS 4.0.3 V5.1.3; Unicode UTS #39)", async () => {
    const lookAlikes = ["margaret@stwénna.test", "margaret@stwennа.test" /* Cyrillic а */, "margaret@stwenna.test.", "margaret+x@stwenna.test"];
    for (const a of lookAlikes) expect(await ask(a)).not.toBe("queued");
    expect(await signInMail()).toHaveLength(0);
    expect(await count(verificationTokens)).toBe(0);
  });

  it("ASCII capitals are the same person after normalising (common practice: domain parts are case-insensitive, RFC 5321 §2.4)", async () => {
    expect(await ask("  MARGARET@STWENNA.TEST ")).toBe("queued");
    expect(await mailsTo(CHAIR)).toBe(1);
  });

  it("a token issued for one address never signs in another, even one that differs only by an accent", async () => {
    await ask(CHAIR);
    const [m] = await signInMail();
    const token = tokenFrom(m.bodyText);
    expect(await completeSignIn({ token, email: "margaret@stwénna.test", userAgent: "test" })).toBeNull();
    expect(await count(sessions)).toBe(0);
    expect(await completeSignIn({ token, email: "MARGARET@stwenna.test", userAgent: "test" })).not.toBeNull();
  });
});

describe("no enumeration, no flooding (OWASP WSTG-IDNT-04, OWASP ASVS 4.0.3 V2.2.1)", () => {
  it("logs a keyed hash for an unknown address, never the address", async () => {
    await ask("nobody-here@example.test");
    const rows = await getDb().select().from(securityLog);
    expect(JSON.stringify(rows)).not.toContain("nobody-here");
    expect(rows[0].detail).toHaveProperty("addressHash");
  });

  it("20 parallel requests for one address queue at most 5 links", async () => {
    const outcomes = await Promise.all(Array.from({ length: 20 }, () => ask(CHAIR)));
    expect(outcomes.filter((o) => o === "queued")).toHaveLength(5);
    expect(await mailsTo(CHAIR)).toBe(5);
  });

  it("the limit carries over a window boundary: no 15-minute span lets more than 5 through", async () => {
    const edge = new Date(Math.ceil(Date.now() / 900_000) * 900_000);
    const parsed = emailSchema.parse(CHAIR);
    for (let i = 0; i < 5; i++) expect(await requestSignInLink({ email: parsed, ip: ip(), next: "/" }, new Date(edge.getTime() - 1000))).toBe("queued");
    expect(await requestSignInLink({ email: parsed, ip: ip(), next: "/" }, new Date(edge.getTime() + 1000))).toBe("limited");
  });

  it("the IP limit holds across addresses: 20 per client IP", async () => {
    const from = "203.0.113.9"; // RFC 5737 documentation range
    const people = ["tamsin@hollowmere.test", "elias@hollowmere.test", CHAIR, "david@stwenna.test", "ruth@stwenna.test"];
    const outcomes = await Promise.all(Array.from({ length: 25 }, (_, i) => ask(people[i % 5], from)));
    expect(outcomes.filter((o) => o === "queued")).toHaveLength(20);
    expect(await signInMail()).toHaveLength(20);
    expect(await ask(people[0], ip())).toBe("limited"); // that address already has its 5
  });
});

describe("one use, really (OWASP ASVS 4.0.3 V2.7.3)", () => {
  it("two parallel uses of one link give exactly one session", async () => {
    await ask(CHAIR);
    const token = tokenFrom((await signInMail())[0].bodyText);
    const results = await Promise.all([1, 2, 3, 4].map(() => completeSignIn({ token, email: CHAIR, userAgent: "test" })));
    expect(results.filter(Boolean)).toHaveLength(1);
    expect(await count(sessions)).toBe(1);
    expect(await count(verificationTokens)).toBe(0);
  });

  it("an expired link signs nobody in (OWASP ASVS 4.0.3 V2.7.2: 10 minutes)", async () => {
    await ask(CHAIR);
    const token = tokenFrom((await signInMail())[0].bodyText);
    vi.useFakeTimers({ toFake: ["Date"], now: Date.now() + 10 * 60_000 + 1000 });
    try {
      expect(await completeSignIn({ token, email: CHAIR, userAgent: "test" })).toBeNull();
    } finally {
      vi.useRealTimers();
    }
    expect(await count(sessions)).toBe(0);
  });

  it("the session is stored as a hash, never the cookie's value (OWASP ASVS 4.0.3 V3.2.2)", async () => {
    await ask(CHAIR);
    const token = tokenFrom((await signInMail())[0].bodyText);
    const done = await completeSignIn({ token, email: CHAIR, userAgent: "test" });
    expect(done!.cookie.length).toBeGreaterThanOrEqual(43); // 32 random bytes, base64url
    const [s] = await getDb().select().from(sessions);
    expect(s.sessionToken).not.toContain(done!.cookie);
    expect((await getDb().select().from(verificationTokens)).map((t) => t.token)).not.toContain(token);
  });
});
