import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, like, sql } from "drizzle-orm";
import { commissions, deposits, outbox, releases, revisions, trailEvents, users } from "@/db/schema";
import { castVote, closeBallot, openBallot } from "@/lib/dal/ballots";
import { recordDecision } from "@/lib/dal/decisions";
import { getReleaseStatus, releaseToFabrication } from "@/lib/dal/release";
import { answerCondition } from "@/lib/dal/condition-answers";
import { setPermissionsNeeded } from "@/lib/dal/permissions";
import { loadChain } from "@/lib/dal/trail";
import { ConflictError, ForbiddenError, NotFoundError } from "@/lib/errors";
import { verifyChain } from "@/models/trail/node-hash";
import { RELEASE_CONDITIONS } from "@/models/release/rule";
import { closeDb, freshDemo, getDb, viewer } from "./db";
import { PEOPLE, circulateNext, inHours, signedIn, type Who } from "./ballot-helpers";

let ids: Awaited<ReturnType<typeof freshDemo>>;
const as = (who: Who | string) => viewer(who in PEOPLE ? PEOPLE[who as Who] : who);
const words = Object.fromEntries(RELEASE_CONDITIONS.map((c) => [c.key, c.missing]));
let approved: { id: number; number: number };

beforeAll(async () => {
  ids = await freshDemo();
  await signedIn(PEOPLE.chair, 1);
});
afterAll(async () => { await closeDb(); });

async function count(table: typeof releases | typeof trailEvents | typeof outbox, where = sql`1=1`) {
  return Number((await getDb().select({ n: sql<number>`count(*)` }).from(table).where(where))[0].n);
}

/** An approved-as-noted decision with two conditions, after a carried electronic ballot. */
async function approveAsNoted() {
  const rev = await circulateNext(ids.commissionId, "Three engravings; the foot widened for the stone floor.");
  const chair = await as("chair");
  const { id } = await openBallot(chair, rev.id, { closesAt: inHours(24) });
  for (const m of ["david@stwenna.test", "ruth@stwenna.test", "colin@stwenna.test"]) await castVote(await viewer(m), id, "in-favour");
  await closeBallot(chair, id);
  await recordDecision(chair, rev.id, { outcome: "approved-as-noted", conditions: "Lower the rim by 20 mm\nRound the foot's edge" });
  return rev;
}

describe("release status (GET /api/commissions/{id}/release)", () => {
  it("names what is missing for a commission still in design", async () => {
    const s = await getReleaseStatus(await as("member"), ids.commissionId);
    expect(s).toEqual({ ready: false, missing: [words.approvedRevision, words.permissionsRecorded, words.depositSettled], releasedAt: null });
  });

  it("after an approval as noted, the conditions await the studio's answers", async () => {
    approved = await approveAsNoted();
    const s = await getReleaseStatus(await as("adviser"), ids.commissionId);
    expect(s.missing).toEqual([words.permissionsRecorded, words.depositSettled, words.conditionsAnswered]);
  });

  it("outsiders are told not found, whether or not the commission exists", async () => {
    await expect(getReleaseStatus(await as("outsider"), ids.commissionId)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getReleaseStatus(await as("owner"), 999_999)).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("release to fabrication", () => {
  it("is refused while something is missing, saying what, and changes nothing", async () => {
    const before = await count(trailEvents);
    const err = await releaseToFabrication(await as("owner"), ids.commissionId).catch((e) => e);
    expect(err).toBeInstanceOf(ConflictError);
    expect(err.message).toContain(words.depositSettled);
    expect(await count(releases)).toBe(0);
    expect(await count(trailEvents)).toBe(before);
  });

  it("only the studio owner may release (designer, chair, members, treasurer, adviser refused; outsider not found)", async () => {
    for (const who of ["designer", "chair", "member", "adviser", "colin@stwenna.test"]) {
      await expect(releaseToFabrication(await as(who), ids.commissionId)).rejects.toBeInstanceOf(ForbiddenError);
    }
    await expect(releaseToFabrication(await as("outsider"), ids.commissionId)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("once everything holds, the owner releases exactly once, freezing the approved revision", async () => {
    const db = getDb();
    const [owner] = await db.select().from(users).where(eq(users.email, PEOPLE.owner));
    const now = new Date();
    await setPermissionsNeeded(await as("chair"), ids.commissionId, { noneRequired: true, reason: "Glass font on a movable base: the diocesan adviser confirmed no faculty is needed." });
    // The deposit is set by hand here until the studio's money screens exist.
    await db.insert(deposits).values({ commissionId: ids.commissionId, currency: "GBP", contractSum: 1_200_000, depositBasis: "amount", depositAmount: 300_000, balanceAmount: 900_000, setBy: owner.id, setAt: now, waivedReason: "Paid by the diocese's grant directly", waivedBy: owner.id, waivedAt: now });
    expect((await getReleaseStatus(await as("owner"), ids.commissionId)).missing).toEqual([words.conditionsAnswered]);
    await answerCondition(await as("designer"), ids.commissionId, 1, { answer: "Met in the drawings (0)" });
    expect((await getReleaseStatus(await as("owner"), ids.commissionId)).missing).toEqual([words.conditionsAnswered]);
    await answerCondition(await as("owner"), ids.commissionId, 2, { answer: "Met in the drawings (1)" });
    expect(await getReleaseStatus(await as("member"), ids.commissionId)).toEqual({ ready: true, missing: [], releasedAt: null });

    const owners = await Promise.allSettled([0, 1, 2].map(async () => releaseToFabrication(await as("owner"), ids.commissionId)));
    expect(owners.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    expect(owners.filter((o) => o.status === "rejected").every((o) => (o as PromiseRejectedResult).reason instanceof ConflictError)).toBe(true);

    const [rel] = await db.select().from(releases).where(eq(releases.commissionId, ids.commissionId));
    const [rev] = await db.select().from(revisions).where(eq(revisions.id, approved.id));
    expect(rel.revisionId).toBe(approved.id);
    expect(rel.contentHash).toBe(rev.contentHash);
    expect(rel.frozen).toMatchObject({ number: approved.number, contentHash: rev.contentHash, params: rev.params, conditions: [{ text: "Lower the rim by 20 mm", answer: "Met in the drawings (0)" }, { text: "Round the foot's edge", answer: "Met in the drawings (1)" }] });
    const status = await getReleaseStatus(await as("chair"), ids.commissionId);
    expect(status).toEqual({ ready: true, missing: [], releasedAt: rel.releasedAt.toISOString() });
    const [c] = await db.select().from(commissions).where(eq(commissions.id, ids.commissionId));
    expect(c.stage).toBe("in-fabrication");
  });

  it("writes the trail (chain verifies) and mails everyone on the commission once", async () => {
    const chain = await loadChain(ids.commissionId);
    const released = chain.filter((e) => e.action === "released to fabrication");
    expect(released).toHaveLength(1);
    expect(released[0].payload).toMatchObject({ number: approved.number });
    expect(chain.at(-1)).toMatchObject({ action: "stage changed", payload: { to: "in-fabrication" } });
    expect(verifyChain(chain, { expectedCommissionId: ids.commissionId }).ok).toBe(true); // RFC 8785 + SHA-256 chain
    const mails = await getDb().select().from(outbox).where(like(outbox.dedupeKey, `release:${ids.commissionId}:%`));
    expect(mails).toHaveLength(7); // 2 studio staff + 5 committee
    expect(mails[0].bodyText).toContain((await getDb().select().from(revisions).where(eq(revisions.id, approved.id)))[0].contentHash!);
  });

  it("a second release is refused, and what it was released on can no longer change", async () => {
    await expect(releaseToFabrication(await as("owner"), ids.commissionId)).rejects.toBeInstanceOf(ConflictError);
    await expect(answerCondition(await as("owner"), ids.commissionId, 1, { answer: "Changed later" })).rejects.toBeInstanceOf(ConflictError);
    await expect(setPermissionsNeeded(await as("chair"), ids.commissionId, { name: "Faculty" })).rejects.toBeInstanceOf(ConflictError);
  });
});
