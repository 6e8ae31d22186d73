import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { eq, sql } from "drizzle-orm";
import { sessions, users } from "@/db/schema";
import { listDevices, signOutEverywhereElse } from "@/lib/dal/devices";
import { loadViewer, sessionStartedAt } from "@/lib/dal/viewer";
import { env } from "@/lib/env";
import { createSession, resolveSession, sessionIdFor } from "@/lib/session-store";
import { freshDemo, getDb } from "./db";

const T0 = new Date("2026-12-02T09:00:00.000Z");
const minutes = (n: number) => new Date(T0.getTime() + n * 60_000);
let chairId = "";
const sessionCount = async () => Number((await getDb().select({ n: sql<number>`count(*)` }).from(sessions).where(eq(sessions.userId, chairId)))[0].n);

beforeAll(async () => {
  await freshDemo();
  chairId = (await getDb().select().from(users).where(eq(users.email, "margaret@stwenna.test")))[0].id;
});
beforeEach(async () => {
  await getDb().delete(sessions);
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(T0);
});
afterEach(() => { vi.useRealTimers(); });

describe("session lifetime with a fake clock (OWASP ASVS 4.0.3 V3.3.2, level 2: 12 h absolute, 30 min idle)", () => {
  it("the defaults are 12 hours and 30 minutes", () => {
    expect(env.sessionAbsoluteSeconds).toBe(12 * 3600);
    expect(env.sessionIdleSeconds).toBe(30 * 60);
  });

  it("ends after 30 minutes without a request, and the ended session is gone (OWASP ASVS 4.0.3 V3.3.1)", async () => {
    const cookie = await createSession(chairId, "test");
    vi.setSystemTime(minutes(29));
    expect(await resolveSession(cookie)).not.toBeNull();
    vi.setSystemTime(minutes(29 + 30));
    expect(await resolveSession(cookie)).toBeNull();
    expect(await sessionCount()).toBe(0);
  });

  it("activity keeps it alive, but never past 12 hours after sign-in", async () => {
    const cookie = await createSession(chairId, "test");
    for (let m = 20; m < 12 * 60; m += 20) {
      vi.setSystemTime(minutes(m));
      expect(await resolveSession(cookie), `at ${m} minutes`).not.toBeNull();
    }
    vi.setSystemTime(minutes(12 * 60));
    expect(await resolveSession(cookie)).toBeNull();
  });

  it("an unknown or empty cookie is no session", async () => {
    await createSession(chairId, "test");
    expect(await resolveSession("not-a-real-session")).toBeNull();
    expect(await resolveSession("")).toBeNull();
    expect(await resolveSession(undefined)).toBeNull();
  });
});

describe("signed-in devices (OWASP ASVS 4.0.3 V3.3.3, V3.3.4)", () => {
  it("lists each device and ends every other one on 'sign out everywhere else'", async () => {
    const phone = await createSession(chairId, "Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/126.0 Mobile Safari/537.36");
    vi.setSystemTime(minutes(5));
    const laptop = await createSession(chairId, "Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0");
    const here = (await loadViewer(chairId, sessionIdFor(laptop)))!;
    const list = await listDevices(here);
    expect(list.map((d) => [d.browser, d.thisDevice])).toEqual([["Firefox on Linux", true], ["Chrome on Android", false]]);
    expect(await signOutEverywhereElse(here)).toBe(1);
    expect(await resolveSession(phone)).toBeNull();
    expect(await resolveSession(laptop)).not.toBeNull();
  });

  it("does nothing for a viewer with no known session of this request", async () => {
    await createSession(chairId, "test");
    expect(await signOutEverywhereElse((await loadViewer(chairId))!)).toBe(0);
    expect(await sessionCount()).toBe(1);
  });
});

describe("fresh sign-in uses only this request's session (OWASP ASVS 4.0.3 V3.7.1)", () => {
  it("a newer session on another device never makes this one fresh; an unknown one is never fresh", async () => {
    const old = await createSession(chairId, "test");
    vi.setSystemTime(minutes(60));
    const other = await createSession(chairId, "test");
    expect((await sessionStartedAt({ id: chairId, sessionId: sessionIdFor(old) }))!.toISOString()).toBe(T0.toISOString());
    expect((await sessionStartedAt({ id: chairId, sessionId: sessionIdFor(other) }))!.toISOString()).toBe(minutes(60).toISOString());
    expect(await sessionStartedAt({ id: chairId, sessionId: sessionIdFor("made-up") })).toBeNull();
    expect(await sessionStartedAt({ id: chairId })).toBeNull();
  });
});
