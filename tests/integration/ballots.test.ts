import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { ballots, votes } from "@/db/schema";
import { castVote, closeBallot, closeDueBallots, getBallotState, openBallot, recordMeetingVote } from "@/lib/dal/ballots";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { JOBS } from "@/lib/worker";
import { closeDb, freshDemo, getDb, viewer } from "./db";
import { MINUTES, PEOPLE, ROLES, circulateNext, events, inHours, snapshot, type Who } from "./ballot-helpers";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => { ids = await freshDemo(); });
afterAll(async () => { await closeDb(); });

const as = (who: Who) => viewer(PEOPLE[who]);
const refusedAs = (who: Who) => (who === "outsider" ? NotFoundError : ForbiddenError);

/** Runs `call` as every role: the allowed ones must succeed, the others be refused with nothing changed. */
async function tryEveryRole(allowed: Who[], call: (who: Who) => Promise<unknown>) {
  for (const who of ROLES.filter((r) => !allowed.includes(r))) {
    const before = await snapshot(ids.commissionId);
    await expect(call(who), who).rejects.toBeInstanceOf(refusedAs(who));
    expect(await snapshot(ids.commissionId), who).toEqual(before);
  }
  for (const who of allowed) await call(who);
}

describe("an electronic ballot", () => {
  let rev: { id: number; number: number };
  let ballotId: number;

  it("only the chair opens one, on the circulated revision", async () => {
    rev = await circulateNext(ids.commissionId);
    await tryEveryRole(["chair"], async (who) => {
      ballotId = (await openBallot(await as(who), rev.id, { closesAt: inHours(48) })).id;
    });
    const [opened] = await events(ids.commissionId, "ballot opened");
    expect(opened.payload).toMatchObject({ number: rev.number, votingMembers: 3, rules: { quorum: "majority", threshold: "majority", chairVotes: false } });
    expect(opened.actorRole).toBe("chair");
  });

  it("refuses a second open ballot, and bad closing times by field", async () => {
    const chair = await as("chair");
    await expect(openBallot(chair, rev.id, { closesAt: inHours(24) })).rejects.toBeInstanceOf(ConflictError);
    for (const [closesAt, says] of [[undefined, "closing date"], ["tomorrow", "closing date"], ["2026-12-05T18:00", "closing date"], [inHours(-1), "future"], [inHours(24 * 61), "60 days"]] as const) {
      const err = await openBallot(chair, rev.id, { closesAt }).catch((e) => e);
      expect(err).toBeInstanceOf(ValidationError);
      expect(err.fields.closesAt).toContain(says);
    }
    const err = await openBallot(chair, rev.id, { closesAt: inHours(2), motion: "x".repeat(501) }).catch((e) => e);
    expect(err.fields.motion).toMatch(/under 500/);
  });

  it("members vote; the chair (who does not vote here), the adviser and the studio are refused", async () => {
    await tryEveryRole(["member"], async (who) => castVote(await as(who), ballotId, "in-favour"));
    await castVote(await viewer("ruth@stwenna.test"), ballotId, { choice: "against" });
    const err = await castVote(await viewer("colin@stwenna.test"), ballotId, "maybe").catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(err.fields.choice).toContain("in favour, against or abstain");
  });

  it("a member may change their vote until it closes; each change is a trail event", async () => {
    const david = await as("member");
    expect(await castVote(david, ballotId, "against")).toEqual({ choice: "against", changed: true });
    expect(await castVote(david, ballotId, "abstain")).toEqual({ choice: "abstain", changed: true });
    const before = await snapshot(ids.commissionId);
    expect(await castVote(david, ballotId, "abstain")).toEqual({ choice: "abstain", changed: false });
    expect(await snapshot(ids.commissionId)).toEqual(before);
    const changes = await events(ids.commissionId, "vote changed");
    expect(changes.map((e) => [e.payload.choice, e.payload.previous])).toEqual([["against", "in-favour"], ["abstain", "against"]]);
    const rows = await getDb().select().from(votes).where(eq(votes.ballotId, ballotId));
    expect(rows).toHaveLength(2);
  });

  it("shows everyone on the commission the live tally and who voted how; outsiders get not found", async () => {
    for (const who of ["owner", "designer", "chair", "member", "adviser"] as Who[]) {
      const s = await getBallotState(await as(who), rev.id);
      expect(s.ballot?.status).toBe("open");
      expect(s.tally).toMatchObject({ inFavour: 0, against: 1, abstain: 1, ballotsCast: 2, votingMembers: 3, quorumRequired: 2 });
      expect(s.whoVotedHow.map((v) => [v.name, v.choice])).toEqual([["David Osei", "abstain"], ["Ruth Penhallow", "against"], ["Colin Marsh", null]]);
      expect(s.youMayVote).toBe(who === "member");
      expect(s.yourVote).toBe(who === "member" ? "abstain" : null);
      expect(s.you.canClose).toBe(who === "chair");
      expect(s.rulesText.join(" ")).toContain("Standing order 9(c)");
    }
    await expect(getBallotState(await as("outsider"), rev.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getBallotState(await viewer("hazel@thrennick.test"), 999_999)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("only the chair closes it; the result is frozen and votes are refused afterwards", async () => {
    await castVote(await viewer("colin@stwenna.test"), ballotId, "in-favour");
    await tryEveryRole(["chair"], async (who) => closeBallot(await as(who), ballotId));
    const [b] = await getDb().select().from(ballots).where(eq(ballots.id, ballotId));
    expect(b.status).toBe("closed");
    // 1 in favour, 1 against: a majority needs more in favour than against.
    expect(b.result).toMatchObject({ inFavour: 1, against: 1, abstain: 1, votingMembers: 3, outcome: "failed", quorumRequired: 2, ballotsCast: 3 });
    const [closed] = await events(ids.commissionId, "ballot closed");
    expect(closed.payload).toMatchObject({ number: rev.number, outcome: "failed", inFavour: 1, against: 1, abstain: 1, closedBy: "chair" });
    await expect(castVote(await as("member"), ballotId, "in-favour")).rejects.toBeInstanceOf(ConflictError);
    await expect(closeBallot(await as("chair"), ballotId)).rejects.toThrow(/already closed/);
    const s = await getBallotState(await as("adviser"), rev.id);
    expect(s.result?.outcomeLabel).toBe("Failed");
    expect(s.result?.sentence).toMatch(/^Failed: 1 in favour, 1 against, 1 abstaining/);
  });

  it("a ballot past its closing time is closed on read, by the system, and no vote gets in late", async () => {
    const b2 = (await openBallot(await as("chair"), rev.id, { closesAt: inHours(1) })).id;
    await castVote(await as("member"), b2, "in-favour");
    await castVote(await viewer("ruth@stwenna.test"), b2, "in-favour");
    await getDb().update(ballots).set({ closesAt: new Date(Date.now() - 1000) }).where(eq(ballots.id, b2));
    await expect(castVote(await viewer("colin@stwenna.test"), b2, "against")).rejects.toThrow(/has closed/);
    const s = await getBallotState(await as("member"), rev.id);
    expect(s.ballot).toMatchObject({ id: b2, status: "closed" });
    expect(s.result).toMatchObject({ outcome: "carried", inFavour: 2, against: 0 });
    expect(s.earlier.map((e) => e.outcomeLabel)).toEqual(["Failed"]);
    const closed = (await events(ids.commissionId, "ballot closed")).filter((e) => e.subjectId === String(b2));
    expect(closed).toHaveLength(1);
    expect(closed[0]).toMatchObject({ actorId: null, actorRole: "system" });
    expect(closed[0].payload.closedBy).toBe("closing time");
    expect(await closeDueBallots()).toBe(0);
  });

  it("the worker's ballot job closes due ballots nobody is looking at", async () => {
    const b3 = (await openBallot(await as("chair"), rev.id, { closesAt: inHours(1) })).id;
    await getDb().update(ballots).set({ closesAt: new Date(Date.now() - 1000) }).where(eq(ballots.id, b3));
    const job = JOBS.find((j) => j.name === "ballots")!;
    expect(await job.run()).toBe(1);
    const [b] = await getDb().select().from(ballots).where(eq(ballots.id, b3));
    expect(b.status).toBe("closed");
    expect(b.result).toMatchObject({ outcome: "no-quorum", ballotsCast: 0 });
  });

  it("circulating a newer revision withdraws an open ballot, and votes on it are refused", async () => {
    const b4 = (await openBallot(await as("chair"), rev.id, { closesAt: inHours(5) })).id;
    const next = await circulateNext(ids.commissionId, "Bowl deepened by 10 mm.");
    const [b] = await getDb().select().from(ballots).where(eq(ballots.id, b4));
    expect(b.status).toBe("withdrawn");
    const withdrawn = await events(ids.commissionId, "ballot withdrawn");
    expect(withdrawn.at(-1)?.payload).toMatchObject({ number: rev.number, reason: `Revision ${next.number} was circulated` });
    await expect(castVote(await as("member"), b4, "in-favour")).rejects.toThrow(/withdrawn/);
    await expect(openBallot(await as("chair"), rev.id, { closesAt: inHours(5) })).rejects.toThrow(/superseded/);
    rev = next;
  });
});

describe("a vote taken at a meeting", () => {
  let rev: { id: number; number: number };
  const today = new Date().toISOString().slice(0, 10);

  it("only the chair records it, with the counts", async () => {
    rev = await circulateNext(ids.commissionId, "Third engraving moved.");
    await tryEveryRole(["chair"], async (who) => recordMeetingVote(await as(who), rev.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 2, against: 0, abstain: 1 } }));
    const [m] = await events(ids.commissionId, "meeting vote recorded");
    expect(m.payload).toMatchObject({ number: rev.number, meetingDate: today, inFavour: 2, against: 0, abstain: 1, outcome: "carried", votingMembers: 3, perMember: null });
    const s = await getBallotState(await as("designer"), rev.id);
    expect(s.ballot).toMatchObject({ kind: "meeting", status: "closed", meetingDate: today });
    expect(s.whoVotedHow).toEqual([]);
    expect(s.youMayVote).toBe(false);
    // One route to a result: a second meeting vote on the same revision (say, a 'recount') is refused.
    const before = await snapshot(ids.commissionId);
    await expect(recordMeetingVote(await as("chair"), rev.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 0, against: 3, abstain: 0 } }))
      .rejects.toThrow(/already recorded \(carried\)/);
    expect(await snapshot(ids.commissionId)).toEqual(before);
  });

  it("refuses bad input by field and changes nothing", async () => {
    rev = await circulateNext(ids.commissionId, "Engravings a little deeper.");
    const chair = await as("chair");
    const cases: [unknown, string, RegExp][] = [
      [{ meetingDate: "2099-01-01", minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 } }, "meetingDate", /future/],
      [{ meetingDate: "2026-02-30", minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 } }, "meetingDate", /date/],
      [{ meetingDate: "2000-01-01", minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 } }, "meetingDate", /circulated on/],
      [{ meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 3, against: 1, abstain: 0 } }, "_form", /more than the committee's 3 voting members/],
      [{ meetingDate: today, minutesRef: MINUTES, counts: { inFavour: -1, against: 0, abstain: 0 } }, "inFavour", /negative/],
      [{ meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 1.5, against: 0, abstain: 0 } }, "inFavour", /whole number/],
      [{ meetingDate: today, minutesRef: MINUTES }, "_form", /counts, or each member/],
      [{ meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 }, perMember: [] }, "_form", /not both/],
    ];
    for (const [input, field, says] of cases) {
      const before = await snapshot(ids.commissionId);
      const err = await recordMeetingVote(chair, rev.id, input).catch((e) => e);
      expect(err, JSON.stringify(input)).toBeInstanceOf(ValidationError);
      expect(err.fields[field], JSON.stringify(input)).toMatch(says);
      expect(await snapshot(ids.commissionId)).toEqual(before);
    }
  });

  it("records each member's vote, refusing people who have no vote", async () => {
    const chair = await as("chair");
    const ids3 = await memberIds();
    const priya = (await as("adviser")).id;
    const err = await recordMeetingVote(chair, rev.id, { meetingDate: today, minutesRef: MINUTES, perMember: [{ userId: priya, choice: "in-favour" }] }).catch((e) => e);
    expect(err.fields.perMember).toMatch(/voting members/);
    const dup = await recordMeetingVote(chair, rev.id, { meetingDate: today, minutesRef: MINUTES, perMember: [{ userId: ids3[0], choice: "in-favour" }, { userId: ids3[0], choice: "against" }] }).catch((e) => e);
    expect(dup.fields.perMember).toMatch(/twice/);
    const res = await recordMeetingVote(chair, rev.id, { meetingDate: today, minutesRef: MINUTES, perMember: [{ userId: ids3[0], choice: "in-favour" }, { userId: ids3[1], choice: "against" }] });
    expect(res.result).toMatchObject({ inFavour: 1, against: 1, abstain: 0, outcome: "failed" });
    const s = await getBallotState(await as("member"), rev.id);
    expect(s.whoVotedHow.map((v) => v.choice)).toEqual(["in-favour", "against", null]);
  });

  it("is refused while an electronic ballot is open on the revision", async () => {
    // One route to a result per revision (Placet's own rule): where a meeting's vote is recorded, no electronic ballot.
    await expect(openBallot(await as("chair"), rev.id, { closesAt: inHours(3) })).rejects.toThrow(/taken at a meeting/);
    rev = await circulateNext(ids.commissionId, "Foot widened again.");
    await openBallot(await as("chair"), rev.id, { closesAt: inHours(3) });
    await expect(recordMeetingVote(await as("chair"), rev.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 3, against: 0, abstain: 0 } })).rejects.toBeInstanceOf(ConflictError);
  });

  it("is the only way where the rules name no authority for voting online", async () => {
    const owen = await viewer(PEOPLE.outsider);
    const other = await circulateNext(ids.otherCommissionId, "First proposal for the chapel font.");
    const err = await openBallot(owen, other.id, { closesAt: inHours(24) }).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(err.message).toMatch(/record the vote taken at your meeting/);
    const s = await getBallotState(owen, other.id);
    expect(s.electronicAllowed).toBe(false);
    expect(s.you).toMatchObject({ canOpen: false, canRecordMeeting: true });
    const res = await recordMeetingVote(owen, other.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 } });
    expect(res.result.outcome).toBe("carried");
    await expect(recordMeetingVote(await as("chair"), other.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 1, against: 0, abstain: 0 } })).rejects.toBeInstanceOf(NotFoundError);
  });
});

async function memberIds() {
  return Promise.all(["david@stwenna.test", "ruth@stwenna.test", "colin@stwenna.test"].map(async (e) => (await viewer(e)).id));
}
