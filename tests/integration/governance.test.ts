import { afterAll, beforeAll, describe, expect, it } from "vitest";
import mysql from "mysql2/promise";
import { and, eq, like } from "drizzle-orm";
import { ballotRoll, commissionMembers, commissions, decisions, outbox, trailEvents, users } from "@/db/schema";
import { databaseUrl } from "@/db/client";
import { castVote, closeBallot, getBallotState, openBallot, recordMeetingVote } from "@/lib/dal/ballots";
import { createCommission } from "@/lib/dal/commissions";
import { recordDecision } from "@/lib/dal/decisions";
import { invitePerson } from "@/lib/dal/people";
import { confirmRules, updateRules } from "@/lib/dal/rules";
import { ConflictError, ForbiddenError } from "@/lib/errors";
import { closeDb, freshDemo, getDb, viewer } from "./db";
import { MINUTES, PEOPLE, circulateNext, events, inHours, signedIn, snapshot, type Who } from "./ballot-helpers";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => {
  ids = await freshDemo();
  await signedIn(PEOPLE.chair, 1);
});
afterAll(async () => { await closeDb(); });

const as = (who: Who) => viewer(PEOPLE[who]);
const today = new Date().toISOString().slice(0, 10);
const RUTH = "ruth@stwenna.test", COLIN = "colin@stwenna.test";
const member = (email: string, role: "member" | "adviser" | "chair", name = "x") => ({ email, name, role, treasurer: false });

async function members() {
  return getDb().select({ email: users.email, role: commissionMembers.role }).from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId)).where(eq(commissionMembers.commissionId, ids.commissionId));
}

/** The call is refused with `type`, its message matches, and no row or trail event is written. */
async function refused(call: () => Promise<unknown>, type: new (...a: never[]) => Error, says: RegExp) {
  const before = { ...(await snapshot(ids.commissionId)), members: JSON.stringify(await members()) };
  const err = await call().then(() => undefined, (e: unknown) => e);
  expect(err).toBeInstanceOf(type);
  expect((err as Error).message).toMatch(says);
  expect({ ...(await snapshot(ids.commissionId)), members: JSON.stringify(await members()) }).toEqual(before);
}

// A register of voters closed before a postal or electronic ballot opens is common practice for such
// ballots, and Placet's own rule here: the roll is fixed when the ballot opens.
describe("the roll is fixed when the ballot opens", () => {
  let rev: { id: number; number: number };
  let ballotId: number;

  it("records the voting members, by id and name, in the ballot and its trail event", async () => {
    rev = await circulateNext(ids.commissionId);
    ballotId = (await openBallot(await as("chair"), rev.id, { closesAt: inHours(24) })).id;
    const [opened] = await events(ids.commissionId, "ballot opened");
    const roll = (opened.payload as { roll: { userId: string; name: string; role: string }[] }).roll;
    expect(roll.map((r) => r.name)).toEqual(["David Osei", "Ruth Penhallow", "Colin Marsh"]);
    expect(roll.every((r) => r.userId.length > 0 && r.role === "member")).toBe(true);
    const stored = await getDb().select().from(ballotRoll).where(eq(ballotRoll.ballotId, ballotId));
    expect(stored.map((r) => r.userId).sort()).toEqual(roll.map((r) => r.userId).sort());
  });

  it("refuses the demotion attack: members who voted against cannot be made advisers, and the tally is unchanged", async () => {
    await castVote(await as("member"), ballotId, "in-favour");
    await castVote(await viewer(RUTH), ballotId, "against");
    await castVote(await viewer(COLIN), ballotId, "against");
    const tally = (await getBallotState(await as("chair"), rev.id)).tally;
    expect(tally).toMatchObject({ inFavour: 1, against: 2, votingMembers: 3 });
    for (const email of [RUTH, COLIN]) {
      await refused(async () => invitePerson(await as("designer"), ids.commissionId, member(email, "adviser")), ConflictError, new RegExp(`ballot on Revision ${rev.number} is open`));
    }
    expect((await getBallotState(await as("chair"), rev.id)).tally).toEqual(tally);
  });

  it("refuses new voting members and a chair's change of role while it is open; an adviser may still be invited", async () => {
    await refused(async () => invitePerson(await as("designer"), ids.commissionId, member("newcomer@stwenna.test", "member", "Nell Hart")), ConflictError, /changes to voting rights are refused/);
    await refused(async () => invitePerson(await as("owner"), ids.commissionId, member(PEOPLE.chair, "member")), ConflictError, /is open/);
    await refused(async () => invitePerson(await as("designer"), ids.commissionId, member(PEOPLE.adviser, "member")), ConflictError, /is open/);
    const ok = await invitePerson(await as("chair"), ids.commissionId, member("verger@stwenna.test", "adviser", "Sam Verger"));
    expect(ok.created).toBe(true);
  });

  it("counts only the roll at the close: a role changed behind the application's back changes nothing", async () => {
    // Even if a row were changed outside Placet, the result is taken from the roll fixed at opening.
    const [ruth] = await getDb().select().from(users).where(eq(users.email, RUTH));
    await getDb().update(commissionMembers).set({ role: "adviser" }).where(and(eq(commissionMembers.userId, ruth.id), eq(commissionMembers.commissionId, ids.commissionId)));
    const result = await closeBallot(await as("chair"), ballotId);
    expect(result).toMatchObject({ outcome: "failed", inFavour: 1, against: 2, votingMembers: 3 });
    await getDb().update(commissionMembers).set({ role: "member" }).where(and(eq(commissionMembers.userId, ruth.id), eq(commissionMembers.commissionId, ids.commissionId)));
  });

  it("allows the change once the ballot has closed", async () => {
    const r = await invitePerson(await as("designer"), ids.commissionId, member("newcomer@stwenna.test", "member", "Nell Hart"));
    expect(r.created).toBe(true);
  });

  it("refuses a meeting vote after the failed ballot, saying the way forward; a new ballot is allowed", async () => {
    await refused(async () => recordMeetingVote(await as("chair"), rev.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 3, against: 0, abstain: 0 } }),
      ConflictError, /new ballot, or a new revision/);
    const s = await getBallotState(await as("chair"), rev.id);
    expect(s.you.canRecordMeeting).toBe(false);
    expect(s.meetingRefusal).toMatch(/new ballot/);
    const again = await openBallot(await as("chair"), rev.id, { closesAt: inHours(24) });
    expect((await getDb().select().from(ballotRoll).where(eq(ballotRoll.ballotId, again.id))).map((r) => r.name)).toContain("Nell Hart");
    await closeBallot(await as("chair"), again.id);
  });
});

describe("the committee owns its rules", () => {
  it("the studio cannot change or confirm them; nothing is written", async () => {
    for (const who of ["designer", "owner"] as const) {
      await refused(async () => updateRules(await as(who), ids.commissionId, { quorum: 1 }), ForbiddenError, /only its chair/);
      await refused(async () => confirmRules(await as(who), ids.commissionId), ForbiddenError, /only its chair/);
    }
    await refused(async () => updateRules(await as("member"), ids.commissionId, { quorum: 1 }), ForbiddenError, /only its chair/);
  });

  it("the chair changes them with a trail event showing before and after, but never while a ballot is open", async () => {
    const rev = await circulateNext(ids.commissionId, "Rim lowered.");
    const b = await openBallot(await as("chair"), rev.id, { closesAt: inHours(24) });
    await refused(async () => updateRules(await as("chair"), ids.commissionId, { quorum: 2, electronicAuthority: "Standing order 9(c)" }), ConflictError, /rules cannot change until it closes/);
    await closeBallot(await as("chair"), b.id);
    await updateRules(await as("chair"), ids.commissionId, { quorum: 2, threshold: "two-thirds", electronicAuthority: "Standing order 9(c)" });
    const changed = (await events(ids.commissionId, "ballot rules changed")).at(-1)!;
    expect(changed.actorRole).toBe("chair");
    expect(changed.payload).toMatchObject({ before: { quorum: "majority", threshold: "majority" }, after: { quorum: 2, threshold: "two-thirds" } });
  });

  it("rules the studio proposes with a new commission stand until its chair confirms them; no ballot before", async () => {
    const designer = await as("designer");
    const { id } = await createCommission(designer, { title: "Paschal candle stand", clientBody: "St Wenna PCC", site: "St Wenna" },
      { quorum: 1, threshold: "majority", chairVotes: false, electronicAuthority: "Standing order 9(c)" });
    await invitePerson(designer, id, member(PEOPLE.chair, "chair"));
    await invitePerson(designer, id, member(RUTH, "member"));
    const rev = await circulateNext(id, "First design.");
    const chair = await as("chair");
    await expect(openBallot(chair, rev.id, { closesAt: inHours(2) })).rejects.toThrow(/has not confirmed them yet/);
    expect(await confirmRules(chair, id)).toMatchObject({ confirmed: true, rules: { quorum: 1 } });
    const [c] = await getDb().select().from(commissions).where(eq(commissions.id, id));
    expect(c.rulesConfirmedBy).toBe(chair.id);
    expect((await openBallot(chair, rev.id, { closesAt: inHours(2) })).id).toBeGreaterThan(0);
  });
});

describe("check again under the lock", () => {
  it("a chair demoted while their decision waits on the commission's lock is refused, and nothing is written", async () => {
    const rev = await circulateNext(ids.commissionId, "Cover added.");
    const b = await openBallot(await as("chair"), rev.id, { closesAt: inHours(24) });
    for (const email of ["david@stwenna.test", RUTH, COLIN]) await castVote(await viewer(email), b.id, "in-favour");
    await closeBallot(await as("chair"), b.id);
    await signedIn(PEOPLE.chair, 1);
    const chair = await as("chair");
    const before = await snapshot(ids.commissionId);

    const other = await mysql.createConnection({ uri: databaseUrl(), timezone: "Z" });
    try {
      await other.beginTransaction();
      await other.query("SELECT id FROM commissions WHERE id = ? FOR UPDATE", [ids.commissionId]);
      const pending = recordDecision(chair, rev.id, { outcome: "approved" }).then(() => null, (e: unknown) => e);
      await waitForLockWait(other);
      await other.query("UPDATE commission_members SET role = 'member' WHERE commission_id = ? AND user_id = ?", [ids.commissionId, chair.id]);
      await other.commit();
      const err = await pending;
      expect(err).toBeInstanceOf(ForbiddenError);
      expect((err as Error).message).toMatch(/Only the chair/);
    } finally {
      await other.end();
    }
    expect(await snapshot(ids.commissionId)).toEqual(before);
    expect(await getDb().select().from(decisions).where(eq(decisions.revisionId, rev.id))).toEqual([]);
    await getDb().update(commissionMembers).set({ role: "chair" }).where(and(eq(commissionMembers.commissionId, ids.commissionId), eq(commissionMembers.userId, chair.id)));
  });

  it("the same decision, not raced, goes through, and its mail names the roll", async () => {
    const latest = await circulateNext(ids.commissionId, "Cover added, again.");
    const b = await openBallot(await as("chair"), latest.id, { closesAt: inHours(24) });
    for (const email of ["david@stwenna.test", RUTH]) await castVote(await viewer(email), b.id, "in-favour");
    await closeBallot(await as("chair"), b.id);
    const d = await recordDecision(await as("chair"), latest.id, { outcome: "approved" });
    expect(d.tally?.roll.map((p) => p.name)).toEqual(["David Osei", "Ruth Penhallow", "Colin Marsh", "Nell Hart"]);
    const mail = await getDb().select().from(outbox).where(like(outbox.dedupeKey, `decision:${latest.id}:%`));
    expect(mail.length).toBeGreaterThan(0);
    expect(mail[0].bodyText).toContain("The roll: David Osei, Ruth Penhallow, Colin Marsh, Nell Hart (4 voting members, fixed when the ballot opened)");
  });
});

describe("drafts stay private", () => {
  it("draft events say only that the draft changed; the files' names and hashes enter the trail at circulation", async () => {
    const before = (await getDb().select().from(trailEvents).where(eq(trailEvents.commissionId, ids.otherCommissionId))).length;
    const rev = await circulateNext(ids.otherCommissionId, "Secret note: the cover is bronze.");
    const all = await getDb().select().from(trailEvents).where(eq(trailEvents.commissionId, ids.otherCommissionId));
    const fresh = all.slice(before);
    const updated = fresh.filter((e) => e.action === "revision updated");
    expect(updated.length).toBeGreaterThan(0);
    for (const e of updated) expect(e.payload).toEqual({ number: rev.number });
    const circulated = fresh.find((e) => e.action === "revision circulated")!;
    expect(circulated.payload).toMatchObject({ number: rev.number, contentHash: expect.stringMatching(/^[0-9a-f]{64}$/), files: [] });
  });
});

/** Waits until another transaction is blocked on a lock (or, without the right to see that, a moment). */
async function waitForLockWait(conn: mysql.Connection) {
  for (let i = 0; i < 50; i++) {
    try {
      const [rows] = await conn.query("SELECT COUNT(*) AS n FROM information_schema.INNODB_TRX WHERE trx_state = 'LOCK WAIT'");
      if (Number((rows as { n: number }[])[0].n) > 0) return;
    } catch {
      break;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  await new Promise((r) => setTimeout(r, 1000));
}
