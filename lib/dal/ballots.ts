import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { ballots, commissions, revisions, users, votes } from "@/db/schema";
import { allowsElectronicBallot } from "@/models/ballot";
import { CHOICE_LABELS, type FrozenResult, type VoteChoice } from "@/models/ballot/state";
import { can, mayVote } from "@/models/permissions/policy";
import { parseChoice, parseMeetingVote, parseOpenBallot } from "@/models/schemas/ballots";
import { env } from "../env";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import { enqueueMail } from "../outbox";
import { appendTrail, lockCommission, type Tx } from "../trail";
import { closeBallotTx, closeDueBallots, freeze, revisionStateRefusal, votingMembersOf, type BallotRow } from "./ballot-core";
import { rulesOf } from "./commissions";
import { loadRevisionById } from "./revision-access";
import type { Viewer } from "./viewer";

export { closeDueBallots } from "./ballot-core";
export { getBallotState } from "./ballots-read";

const utcText = (d: Date) => `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;

async function freshRevision(tx: Tx, revisionId: number) {
  const [r] = await tx.select().from(revisions).where(eq(revisions.id, revisionId));
  const refusal = revisionStateRefusal(r.state, r.number);
  if (refusal) throw new ConflictError(refusal);
  return r;
}

async function openBallotOn(tx: Tx, revisionId: number): Promise<BallotRow | undefined> {
  const [b] = await tx.select().from(ballots).where(and(eq(ballots.revisionId, revisionId), eq(ballots.status, "open"))).limit(1);
  return b;
}

/** The chair opens an electronic ballot on the current circulated revision, if the rules allow one. */
export async function openBallot(viewer: Viewer, revisionId: number, input: { closesAt?: unknown; motion?: unknown } | unknown): Promise<{ id: number }> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "ballot.open")) throw new ForbiddenError("Only the chair may open a ballot.");
  const now = new Date();
  const parsed = parseOpenBallot(input, now);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await closeDueBallots({ revisionId });
  return db.transaction(async (tx) => {
    await lockCommission(tx, revision.commissionId);
    const r = await freshRevision(tx, revisionId);
    const [c] = await tx.select().from(commissions).where(eq(commissions.id, r.commissionId));
    const rules = rulesOf(c);
    if (!allowsElectronicBallot(rules)) {
      throw new ValidationError({ _form: "This committee's rules name no authority for voting online, so record the vote taken at your meeting instead." });
    }
    const open = await openBallotOn(tx, revisionId);
    if (open) throw new ConflictError(`A ballot on Revision ${r.number} is already open; it closes ${utcText(open.closesAt!)}.`);
    const voters = await votingMembersOf(tx, r.commissionId, rules.chairVotes);
    if (!voters.length) throw new ValidationError({ _form: "The committee has no voting members yet, so there is no one to vote." });
    const motion = parsed.data.motion ?? `That Revision ${r.number} be approved.`;
    const closesAt = parsed.data.closesAt;
    const [res] = await tx.insert(ballots).values({
      revisionId, commissionId: r.commissionId, kind: "electronic", status: "open", motion, openedBy: viewer.id, openedAt: now, closesAt,
    }).$returningId();
    await appendTrail(tx, {
      commissionId: r.commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "ballot opened",
      subjectType: "ballot", subjectId: res.id,
      payload: { number: r.number, closesAt: closesAt.toISOString(), motion, rules, votingMembers: voters.length },
    });
    const link = `${env.appUrl}/commissions/${r.commissionId}/revisions/${r.number}`;
    await enqueueMail(tx, await voterMail(tx, voters.map((v) => v.userId), (name) => ({
      subject: `Ballot open on Revision ${r.number} of "${c.title}"`,
      text: `Dear ${name},\n\n${viewer.name} has opened a ballot on Revision ${r.number} of "${c.title}".\n\nThe motion: ${motion}\n\nIt closes ${utcText(closesAt)}. You may vote in favour, against or abstain, and change your vote until then:\n${link}\n`,
    }), `ballot-opened:${res.id}`));
    return { id: res.id };
  });
}

async function voterMail(tx: Tx, userIds: string[], make: (name: string) => { subject: string; text: string }, key: string) {
  if (!userIds.length) return [];
  const people = await tx.select({ id: users.id, email: users.email, name: users.name }).from(users).where(inArray(users.id, userIds));
  return people.map((p) => ({ dedupeKey: `${key}:${p.id}`, to: p.email, ...make(p.name ?? p.email) }));
}

/** Loads a ballot and the viewer's standing on its revision; people with none get "not found". */
async function loadBallot(viewer: Viewer, ballotId: number) {
  if (!Number.isSafeInteger(ballotId) || ballotId <= 0) throw new NotFoundError();
  const db = getDb();
  const [b] = await db.select().from(ballots).where(eq(ballots.id, ballotId)).limit(1);
  if (!b) throw new NotFoundError();
  const { access, revision } = await loadRevisionById(db, viewer, b.revisionId);
  return { db, ballot: b, access, revision };
}

function closedRefusal(b: BallotRow): string {
  if (b.kind === "meeting") return "This vote was taken at a meeting; it is recorded and cannot be changed here.";
  if (b.status === "withdrawn") return "This ballot was withdrawn when a newer revision was circulated.";
  return "This ballot has closed; votes can no longer be cast or changed.";
}

/** A voting member casts or changes their vote while the ballot is open. */
export async function castVote(viewer: Viewer, ballotId: number, choice: unknown): Promise<{ choice: VoteChoice; changed: boolean }> {
  const { db, ballot, access, revision } = await loadBallot(viewer, ballotId);
  if (!mayVote(access.actor, access.commission.chairVotes)) {
    throw new ForbiddenError(access.actor.committeeRole === "chair"
      ? "Under this committee's rules the chair does not vote."
      : "Only the committee's voting members vote; advisers and the studio do not.");
  }
  const parsed = parseChoice(choice);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await closeDueBallots({ ballotId });
  return db.transaction(async (tx) => {
    await lockCommission(tx, ballot.commissionId);
    const [b] = await tx.select().from(ballots).where(eq(ballots.id, ballotId));
    if (b.status !== "open" || b.kind !== "electronic" || !b.closesAt || b.closesAt.getTime() <= Date.now()) throw new ConflictError(closedRefusal(b));
    const [c] = await tx.select().from(commissions).where(eq(commissions.id, b.commissionId));
    if (!mayVote(access.actor, c.chairVotes)) throw new ForbiddenError("Under this committee's rules the chair does not vote.");
    const [mine] = await tx.select().from(votes).where(and(eq(votes.ballotId, ballotId), eq(votes.userId, viewer.id)));
    if (mine?.choice === parsed.data) return { choice: parsed.data, changed: false };
    const now = new Date();
    if (mine) await tx.update(votes).set({ choice: parsed.data, castAt: now }).where(eq(votes.id, mine.id));
    else await tx.insert(votes).values({ ballotId, userId: viewer.id, choice: parsed.data, castAt: now });
    await appendTrail(tx, {
      commissionId: b.commissionId, actorId: viewer.id, actorRole: access.actingRole, action: mine ? "vote changed" : "vote cast",
      subjectType: "ballot", subjectId: ballotId,
      payload: { number: revision.number, choice: parsed.data, choiceLabel: CHOICE_LABELS[parsed.data], previous: mine?.choice ?? null },
    });
    return { choice: parsed.data, changed: true };
  });
}

/** The chair closes an open ballot before its time; the result is frozen then. */
export async function closeBallot(viewer: Viewer, ballotId: number): Promise<FrozenResult> {
  const { db, ballot, access, revision } = await loadBallot(viewer, ballotId);
  if (!can(access.actor, "ballot.close")) throw new ForbiddenError("Only the chair may close a ballot.");
  await closeDueBallots({ ballotId });
  return db.transaction(async (tx) => {
    await lockCommission(tx, ballot.commissionId);
    const [b] = await tx.select().from(ballots).where(eq(ballots.id, ballotId));
    if (b.status !== "open" || b.kind !== "electronic") throw new ConflictError(b.status === "closed" && b.kind === "electronic" ? "This ballot has already closed." : closedRefusal(b));
    return closeBallotTx(tx, b, revision.number, { id: viewer.id, role: access.actingRole }, "chair");
  });
}

/** The chair records a vote taken at a meeting (counts, or each member's vote) as a closed ballot. */
export async function recordMeetingVote(viewer: Viewer, revisionId: number, input: unknown): Promise<{ ballotId: number; result: FrozenResult }> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "ballot.recordMeeting")) throw new ForbiddenError("Only the chair records a meeting's vote.");
  const now = new Date();
  const parsed = parseMeetingVote(input, now);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  const m = parsed.data;
  await closeDueBallots({ revisionId });
  return db.transaction(async (tx) => {
    await lockCommission(tx, revision.commissionId);
    const r = await freshRevision(tx, revisionId);
    const circulatedOn = new Date(r.circulatedAt!.getTime() - 14 * 3600 * 1000).toISOString().slice(0, 10);
    if (m.meetingDate < circulatedOn) {
      throw new ValidationError({ meetingDate: `Revision ${r.number} was circulated on ${r.circulatedAt!.toISOString().slice(0, 10)}; give the date of the meeting that voted on it.` });
    }
    const open = await openBallotOn(tx, revisionId);
    if (open) throw new ConflictError(`A ballot on Revision ${r.number} is open; close it before recording a meeting's vote.`);
    const [c] = await tx.select().from(commissions).where(eq(commissions.id, r.commissionId));
    const rules = rulesOf(c);
    const voters = await votingMembersOf(tx, r.commissionId, rules.chairVotes);
    const byId = new Map(voters.map((v) => [v.userId, v]));
    if (m.perMember?.some((v) => !byId.has(v.userId))) {
      throw new ValidationError({ perMember: "Only the committee's voting members can be recorded as voting; someone named is not one." });
    }
    const cast = m.counts.inFavour + m.counts.against + m.counts.abstain;
    if (cast > voters.length) {
      throw new ValidationError({ _form: `The counts add up to ${cast}, more than the committee's ${voters.length} voting members.` });
    }
    const result = freeze(rules, voters.length, m.counts);
    const motion = m.motion ?? `That Revision ${r.number} be approved.`;
    const [res] = await tx.insert(ballots).values({
      revisionId, commissionId: r.commissionId, kind: "meeting", status: "closed", motion, openedBy: viewer.id, openedAt: now,
      closedAt: now, meetingDate: m.meetingDate, result: { ...result },
    }).$returningId();
    if (m.perMember?.length) await tx.insert(votes).values(m.perMember.map((v) => ({ ballotId: res.id, userId: v.userId, choice: v.choice, castAt: now })));
    await appendTrail(tx, {
      commissionId: r.commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "meeting vote recorded",
      subjectType: "ballot", subjectId: res.id,
      payload: {
        number: r.number, meetingDate: m.meetingDate, motion, ...result,
        perMember: m.perMember ? m.perMember.map((v) => ({ userId: v.userId, name: byId.get(v.userId)!.name, choice: v.choice })) : null,
      },
    });
    return { ballotId: res.id, result };
  });
}
