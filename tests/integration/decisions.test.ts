import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, like } from "drizzle-orm";
import { commissions, decisions, outbox, revisions } from "@/db/schema";
import { castVote, closeBallot, openBallot, recordMeetingVote } from "@/lib/dal/ballots";
import { getDecision, recordDecision } from "@/lib/dal/decisions";
import { ConflictError, ForbiddenError, FreshSignInRequired, NotFoundError, ValidationError } from "@/lib/errors";
import { closeDb, freshDemo, getDb, viewer } from "./db";
import { MINUTES, PEOPLE, ROLES, circulateNext, events, inHours, signedIn, snapshot, type Who } from "./ballot-helpers";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => {
  ids = await freshDemo();
  await signedIn(PEOPLE.chair, 1);
});
afterAll(async () => { await closeDb(); });

const as = (who: Who) => viewer(PEOPLE[who]);
const today = new Date().toISOString().slice(0, 10);
const members = ["david@stwenna.test", "ruth@stwenna.test", "colin@stwenna.test"];

/** A circulated revision with an electronic ballot closed by the chair, members voting as given. */
async function withBallot(choices: ("in-favour" | "against" | "abstain")[]) {
  const rev = await circulateNext(ids.commissionId, `Revision with ${choices.join(", ")}`);
  const { id } = await openBallot(await as("chair"), rev.id, { closesAt: inHours(24) });
  for (const [i, c] of choices.entries()) await castVote(await viewer(members[i]), id, c);
  await closeBallot(await as("chair"), id);
  return rev;
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function expectRefused(call: () => Promise<unknown>, type: new (...a: never[]) => Error, says?: RegExp): Promise<any> {
  const before = await snapshot(ids.commissionId);
  const err = (await call().then(() => undefined, (e: unknown) => e)) as Error & { fields?: Record<string, string> };
  expect(err).toBeInstanceOf(type);
  if (says) expect(err.message).toMatch(says);
  expect(await snapshot(ids.commissionId)).toEqual(before);
  return err;
}

describe("what a decision needs", () => {
  it("revise and resubmit needs no ballot; the stage stays at design development", async () => {
    const rev = await circulateNext(ids.commissionId, "First proposal.");
    const d = await recordDecision(await as("chair"), rev.id, { outcome: "revise-and-resubmit", statement: "Please try a shallower bowl." });
    expect(d).toMatchObject({ outcome: "revise-and-resubmit", outcomeLabel: "Revise and resubmit", conditions: [], tally: null });
    const [c] = await getDb().select().from(commissions).where(eq(commissions.id, ids.commissionId));
    expect(c.stage).toBe("design-development");
    expect(await events(ids.commissionId, "stage changed")).toHaveLength(2); // the demo's two, no more
    const [r] = await getDb().select().from(revisions).where(eq(revisions.id, rev.id));
    expect(r.state).toBe("decided");
  });

  it("approval is refused without a ballot, while one is open, and when it failed or lacked a quorum", async () => {
    const chair = await as("chair");
    const none = await circulateNext(ids.commissionId, "No ballot yet.");
    const e1 = await expectRefused(() => recordDecision(chair, none.id, { outcome: "approved" }), ValidationError, /none has been held/);
    expect(e1.fields.outcome).toMatch(/carried ballot/);
    await openBallot(chair, none.id, { closesAt: inHours(2) });
    await expectRefused(() => recordDecision(chair, none.id, { outcome: "approved" }), ValidationError, /still open/);
    await expectRefused(() => recordDecision(chair, none.id, { outcome: "not-approved" }), ValidationError, /still open/);
    const failed = await withBallot(["in-favour", "against", "against"]);
    await expectRefused(() => recordDecision(chair, failed.id, { outcome: "approved-as-noted", conditions: "Lower the rim" }), ValidationError, /failed/);
    const thin = await withBallot(["in-favour"]);
    await expectRefused(() => recordDecision(chair, thin.id, { outcome: "approved" }), ValidationError, /quorum/);
    const state = await getDecision(chair, thin.id);
    expect(state.refusals.approved).toMatch(/quorum/);
    expect(state.refusals["not-approved"]).toBeNull();
    expect(state.basis).toMatchObject({ outcome: "no-quorum", inFavour: 1 });
  });

  it("names the field for bad input", async () => {
    const rev = await withBallot(["in-favour", "in-favour"]);
    const chair = await as("chair");
    const cases: [unknown, string, RegExp][] = [
      [{ outcome: "approved-as-noted", conditions: "  \n \n" }, "conditions", /at least one condition/],
      [{ outcome: "approved-as-noted" }, "conditions", /at least one condition/],
      [{ outcome: "approved", conditions: "Something" }, "conditions", /only to approved as noted/],
      [{ outcome: "approved-as-noted", conditions: 42 }, "conditions", /as text/],
      [{ outcome: "yes" }, "outcome", /Choose approved/],
      [{ outcome: "approved", statement: "x".repeat(4001) }, "statement", /under 4000/],
      [null, "outcome", /Choose approved/],
    ];
    for (const [input, field, says] of cases) {
      const err = await expectRefused(() => recordDecision(chair, rev.id, input), ValidationError);
      expect(err.fields[field], JSON.stringify(input)?.slice(0, 80)).toMatch(says);
    }
  });
});

describe("recording the decision", () => {
  let rev: { id: number; number: number };

  it("only the chair may record it; everyone else is refused and nothing changes", async () => {
    rev = await withBallot(["in-favour", "in-favour", "abstain"]);
    for (const who of ROLES.filter((r) => r !== "chair")) {
      await expectRefused(async () => recordDecision(await as(who), rev.id, { outcome: "approved" }), who === "outsider" ? NotFoundError : ForbiddenError);
    }
    await expect(getDecision(await as("outsider"), rev.id)).rejects.toBeInstanceOf(NotFoundError);
    for (const who of ["owner", "designer", "member", "adviser"] as Who[]) expect((await getDecision(await as(who), rev.id)).you.mayRecord).toBe(false);
  });

  it("asks the chair to confirm their identity when they signed in more than 10 minutes ago", async () => {
    const chair = await as("chair");
    await signedIn(PEOPLE.chair, 20);
    const err = await expectRefused(() => recordDecision(chair, rev.id, { outcome: "approved-as-noted", conditions: "a\nb" }), FreshSignInRequired);
    expect(err.status).toBe(428);
    expect(err.code).toBe("fresh-sign-in-required");
    expect((await getDecision(chair, rev.id)).you).toMatchObject({ mayRecord: true, freshSignInNeeded: true });
    await signedIn(PEOPLE.chair, 2);
    expect((await getDecision(chair, rev.id)).you.freshSignInNeeded).toBe(false);
  });

  it("records approved as noted: the revision is decided, the stage moves, the trail and everyone's mail say so", async () => {
    const chair = await as("chair");
    const d = await recordDecision(chair, rev.id, {
      outcome: "approved-as-noted", conditions: "Engrave the inscription at 8 mm lettering height\r\n\nAnchor the foot to the floor slab as the engineer specifies",
      statement: "Carried at the committee's ballot.",
    });
    expect(d.conditions).toEqual(["Engrave the inscription at 8 mm lettering height", "Anchor the foot to the floor slab as the engineer specifies"]);
    expect(d.tally).toMatchObject({ kind: "electronic", inFavour: 2, against: 0, abstain: 1, outcome: "carried" });
    const [r] = await getDb().select().from(revisions).where(eq(revisions.id, rev.id));
    expect(r.state).toBe("decided");
    expect(d.contentHash).toBe(r.contentHash);
    const [c] = await getDb().select().from(commissions).where(eq(commissions.id, ids.commissionId));
    expect(c.stage).toBe("approved");
    const [ev] = (await events(ids.commissionId, "decision recorded")).filter((e) => e.subjectId === String(rev.id));
    expect(ev.payload).toMatchObject({ number: rev.number, outcome: "approved-as-noted", outcomeLabel: "Approved as noted", contentHash: r.contentHash, ballotId: d.tally!.ballotId });
    expect((await events(ids.commissionId, "stage changed")).at(-1)?.payload).toMatchObject({ from: "design-development", to: "approved" });
    const mail = await getDb().select().from(outbox).where(like(outbox.dedupeKey, `decision:${rev.id}:%`));
    expect(mail.map((m) => m.toEmail).sort()).toEqual([...Object.values(PEOPLE).filter((e) => e !== PEOPLE.outsider), "ruth@stwenna.test", "colin@stwenna.test"].sort());
    expect(mail[0].bodyText).toContain(r.contentHash!);
    expect(mail[0].bodyText).toContain("2 in favour, 0 against, 1 abstaining");
    expect(mail[0].bodyText).toContain("1. Engrave the inscription");
    const seen = await getDecision(await as("adviser"), rev.id);
    expect(seen.decision).toMatchObject({ outcomeLabel: "Approved as noted", recordedByName: "Margaret Ellery" });
  });

  it("a second attempt is refused as already decided", async () => {
    await expectRefused(async () => recordDecision(await as("chair"), rev.id, { outcome: "not-approved" }), ConflictError, /already been decided/);
  });

  it("a superseded revision cannot be decided", async () => {
    const old = await withBallot(["in-favour", "in-favour"]);
    await circulateNext(ids.commissionId, "Superseding it.");
    await expectRefused(async () => recordDecision(await as("chair"), old.id, { outcome: "approved" }), ConflictError, /superseded/);
  });

  it("a carried meeting vote also supports approval", async () => {
    const chair = await as("chair");
    const m = await circulateNext(ids.commissionId, "Put to the meeting.");
    await recordMeetingVote(chair, m.id, { meetingDate: today, minutesRef: MINUTES, counts: { inFavour: 2, against: 1, abstain: 0 } });
    const d = await recordDecision(chair, m.id, { outcome: "approved" });
    expect(d.tally).toMatchObject({ kind: "meeting", meetingDate: today, inFavour: 2, against: 1 });
  });
});

describe("pressed fifty times at once", () => {
  it("records exactly one decision and one trail event", async () => {
    const rev = await withBallot(["in-favour", "in-favour", "in-favour"]);
    const chair = await as("chair");
    const results = await Promise.allSettled(Array.from({ length: 50 }, () => recordDecision(chair, rev.id, { outcome: "approved" })));
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const losers = results.filter((r): r is PromiseRejectedResult => r.status === "rejected");
    expect(losers).toHaveLength(49);
    for (const l of losers) {
      expect(l.reason).toBeInstanceOf(ConflictError);
      expect(l.reason.message).toMatch(/already been decided/);
    }
    expect(await getDb().select().from(decisions).where(eq(decisions.revisionId, rev.id))).toHaveLength(1);
    expect((await events(ids.commissionId, "decision recorded")).filter((e) => e.subjectId === String(rev.id))).toHaveLength(1);
  });
});

describe("the record afterwards", () => {
  it("every ballot, vote and decision event leaves the chain verifiable", async () => {
    const { exportRecord } = await import("@/lib/dal/trail");
    const { verifyRecord } = await import("@/models/trail/node-hash");
    const record = await exportRecord(await as("adviser"), ids.commissionId);
    expect(verifyRecord(record).ok).toBe(true);
    const actions = new Set(record.events.map((e) => e.action));
    for (const a of ["ballot opened", "vote cast", "ballot closed", "meeting vote recorded", "decision recorded"]) expect(actions).toContain(a);
  });
});
