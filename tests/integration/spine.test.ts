import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { closeDb, databaseUrl, getDb } from "@/db/client";
import { resetDatabase } from "@/db/reset";
import { commissionMembers, trailEvents } from "@/db/schema";
import { getCommission, listCommissions } from "@/lib/dal/commissions";
import { confirmRules, updateRules } from "@/lib/dal/rules";
import { invitePerson } from "@/lib/dal/people";
import { ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { assertTestDatabase, freshDemo, viewer } from "./db";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => { ids = await freshDemo(); });
afterAll(async () => { await closeDb(); });

describe("migrations", () => {
  it("apply to an empty database and create every table", async () => {
    assertTestDatabase();
    const url = new URL(databaseUrl());
    url.pathname = "/" + url.pathname.slice(1) + "_b";
    const other = process.env.DATABASE_URL_B ?? url.toString();
    await resetDatabase(other);
    const mysql = await import("mysql2/promise");
    const conn = await mysql.createConnection({ uri: other });
    const [rows] = await conn.query("SHOW TABLES");
    await conn.end();
    const names = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]);
    for (const t of ["users", "accounts", "sessions", "verification_tokens", "studios", "studio_members", "commissions", "commission_members", "trail_events", "security_log", "outbox"]) {
      expect(names).toContain(t);
    }
  });
});

describe("who sees what", () => {
  it("a member of one commission cannot read another's", async () => {
    const hazel = await viewer("hazel@thrennick.test");
    await expect(getCommission(hazel, ids.commissionId)).rejects.toBeInstanceOf(NotFoundError);
    const list = await listCommissions(hazel);
    expect(list.map((c) => c.id)).toEqual([ids.otherCommissionId]);
  });

  it("a commission that does not exist looks the same as one you may not see", async () => {
    const hazel = await viewer("hazel@thrennick.test");
    const a = await getCommission(hazel, 987654).catch((e) => e);
    const b = await getCommission(hazel, ids.commissionId).catch((e) => e);
    expect(a).toBeInstanceOf(NotFoundError);
    expect(b).toBeInstanceOf(NotFoundError);
    expect(a.message).toBe(b.message);
  });

  it("studio staff see every commission of their studio; committee people see theirs", async () => {
    const elias = await viewer("elias@hollowmere.test");
    expect((await listCommissions(elias)).length).toBe(2);
    const david = await viewer("david@stwenna.test");
    expect((await listCommissions(david)).map((c) => c.id)).toEqual([ids.commissionId]);
    const c = await getCommission(david, ids.commissionId);
    expect(c.you.committeeRole).toBe("member");
    expect(c.you.can["revision.viewDraft"]).toBe(false);
  });
});

describe("invitations", () => {
  it("sending the same invitation twice creates exactly one membership", async () => {
    const elias = await viewer("elias@hollowmere.test");
    const input = { email: "Wren.Tester@Example.test", name: "Wren Tester", role: "member" };
    const [a, b] = await Promise.all([invitePerson(elias, ids.commissionId, input), invitePerson(elias, ids.commissionId, input)]);
    const c = await invitePerson(elias, ids.commissionId, input);
    expect([a.created, b.created].filter(Boolean)).toHaveLength(1);
    expect(c.created).toBe(false);
    const rows = await getDb().select().from(commissionMembers).where(and(eq(commissionMembers.commissionId, ids.commissionId), eq(commissionMembers.userId, a.userId)));
    expect(rows).toHaveLength(1);
    const ev = await getDb().select().from(trailEvents).where(and(eq(trailEvents.commissionId, ids.commissionId), eq(trailEvents.action, "person invited"), eq(trailEvents.subjectId, a.userId)));
    expect(ev).toHaveLength(1);
  });

  it("the chair may invite advisers but not members; members may invite nobody", async () => {
    const chair = await viewer("margaret@stwenna.test");
    const res = await invitePerson(chair, ids.commissionId, { email: "adv@example.test", name: "An Adviser", role: "adviser" });
    expect(res.created).toBe(true);
    await expect(invitePerson(chair, ids.commissionId, { email: "m@example.test", name: "M", role: "member" })).rejects.toBeInstanceOf(ForbiddenError);
    const david = await viewer("david@stwenna.test");
    await expect(invitePerson(david, ids.commissionId, { email: "x@example.test", name: "X", role: "adviser" })).rejects.toBeInstanceOf(ForbiddenError);
    const owen = await viewer("owen@thrennick.test");
    await expect(invitePerson(owen, ids.commissionId, { email: "y@example.test", name: "Y", role: "adviser" })).rejects.toBeInstanceOf(NotFoundError);
  });

  it("bad input names the field", async () => {
    const elias = await viewer("elias@hollowmere.test");
    const err = await invitePerson(elias, ids.commissionId, { email: "nope", name: "", role: "bishop" }).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(Object.keys(err.fields).sort()).toEqual(["email", "name", "role"]);
  });
});

describe("ballot rules", () => {
  it("the chair edits them with a trail entry; a member may not", async () => {
    const chair = await viewer("margaret@stwenna.test");
    const before = await getDb().select({ n: sql<number>`count(*)` }).from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId));
    await updateRules(chair, ids.commissionId, { quorum: 3, threshold: "two-thirds", chairVotes: true, electronicAuthority: "Standing order 9(c)" });
    const after = await getDb().select({ n: sql<number>`count(*)` }).from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId));
    expect(Number(after[0].n)).toBe(Number(before[0].n) + 1);
    const c = await getCommission(chair, ids.commissionId);
    expect(c.rules).toEqual({ quorum: 3, threshold: "two-thirds", chairVotes: true, electronicAuthority: "Standing order 9(c)" });
    const david = await viewer("david@stwenna.test");
    await expect(updateRules(david, ids.commissionId, { quorum: "majority" })).rejects.toBeInstanceOf(ForbiddenError);
    const bad = await updateRules(chair, ids.commissionId, { quorum: 99 }).catch((e) => e);
    expect(bad).toBeInstanceOf(ValidationError);
    expect(bad.fields.quorum).toMatch(/voting members/);
  });
});
