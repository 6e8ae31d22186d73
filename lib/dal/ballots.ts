import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { ballots, revisions, users, votes } from "@/db/schema";
import { allowsElectronicBallot } from "@/models/ballot";
import { electronicBallotRefusal } from "@/models/ballot/route";
import { CHOICE_LABELS, type FrozenResult, type VoteChoice } from "@/models/ballot/state";
import { onRoll } from "@/models/ballot/tally";
import { can } from "@/models/permissions/policy";
import { parseChoice, parseOpenBallot } from "@/models/schemas/ballots";
import { env } from "../env";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import { enqueueMail } from "../outbox";
import { appendTrail, type Tx } from "../trail";
import {
  ballotsOn, closeBallotTx, closeDueBallots, currentRoll, freshRevision, loadRoll, openBallotOn, storeRoll, UNCONFIRMED_RULES, type BallotRow,
} from "./ballot-core";
import { rulesOf } from "./commissions";
import { lockedFor } from "./locked";
import { loadRevisionById } from "./revision-access";
import type { Viewer } from "./viewer";

export { closeDueBallots } from "./ballot-core";
export { getBallotState } from "./ballots-read";
export { recordMeetingVote } from "./meeting-votes";

const utcText = (d: Date) => `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
const CHAIR_ONLY = { open: "Only the chair may open a ballot.", close: "Only the chair may close a ballot." };

/**
 * The chair opens an electronic ballot on the current circulated revision, if the rules allow one. The roll
 * (who may vote) is fixed now, stored with the ballot and written into the trail event by id and name.
 */
export async function openBallot(viewer: Viewer, revisionId: number, input: { closesAt?: unknown; motion?: unknown } | unknown): Promise<{ id: number }> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "ballot.open")) throw new ForbiddenError(CHAIR_ONLY.open);
  const now = new Date();
  const parsed = parseOpenBallot(input, now);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await closeDueBallots({ revisionId });
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, revision.commissionId, { action: "ballot.open", refusal: CHAIR_ONLY.open });
    const c = locked.commission;
    const r = await freshRevision(tx, revisionId);
    const rules = rulesOf(c);
    if (!c.rulesConfirmedAt) throw new ConflictError(UNCONFIRMED_RULES);
    if (!allowsElectronicBallot(rules)) {
      throw new ValidationError({ _form: "This committee's rules name no authority for voting online, so record the vote taken at your meeting instead." });
    }
    const open = await openBallotOn(tx, revisionId);
    if (open) throw new ConflictError(`A ballot on Revision ${r.number} is already open; it closes ${utcText(open.closesAt!)}.`);
    const route = electronicBallotRefusal(r.number, await ballotsOn(tx, revisionId));
    if (route) throw new ConflictError(route);
    const roll = await currentRoll(tx, r.commissionId, rules.chairVotes);
    if (!roll.length) throw new ValidationError({ _form: "The committee has no voting members yet, so there is no one to vote." });
    const motion = parsed.data.motion ?? `That Revision ${r.number} be approved.`;
    const closesAt = parsed.data.closesAt;
    const [res] = await tx.insert(ballots).values({
      revisionId, commissionId: r.commissionId, kind: "electronic", status: "open", motion, openedBy: viewer.id, openedAt: now, closesAt,
    }).$returningId();
    await storeRoll(tx, res.id, roll);
    await appendTrail(tx, {
      commissionId: r.commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "ballot opened",
      subjectType: "ballot", subjectId: res.id,
      payload: { number: r.number, closesAt: closesAt.toISOString(), motion, rules, votingMembers: roll.length, roll },
    });
    const link = `${env.appUrl}/commissions/${r.commissionId}/revisions/${r.number}`;
    await enqueueMail(tx, await voterMail(tx, roll.map((v) => v.userId), (name) => ({
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

function notOnRoll(committeeRole: string | null): string {
  if (committeeRole === "chair") return "You are not on this ballot's roll: under this committee's rules the chair does not vote.";
  if (committeeRole === "member") return "You are not on this ballot's roll: who may vote was fixed when it opened.";
  return "Only the committee's voting members vote; advisers and the studio do not.";
}

/** A person on the ballot's roll casts or changes their vote while the ballot is open. */
export async function castVote(viewer: Viewer, ballotId: number, choice: unknown): Promise<{ choice: VoteChoice; changed: boolean }> {
  const { db, ballot, access, revision } = await loadBallot(viewer, ballotId);
  if (!onRoll(await loadRoll(db, ballotId), viewer.id)) throw new ForbiddenError(notOnRoll(access.actor.committeeRole));
  const parsed = parseChoice(choice);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await closeDueBallots({ ballotId });
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, ballot.commissionId);
    const [b] = await tx.select().from(ballots).where(eq(ballots.id, ballotId));
    if (b.status !== "open" || b.kind !== "electronic" || !b.closesAt || b.closesAt.getTime() <= Date.now()) throw new ConflictError(closedRefusal(b));
    if (!onRoll(await loadRoll(tx, ballotId), viewer.id)) throw new ForbiddenError(notOnRoll(locked.actor.committeeRole));
    const [mine] = await tx.select().from(votes).where(and(eq(votes.ballotId, ballotId), eq(votes.userId, viewer.id)));
    if (mine?.choice === parsed.data) return { choice: parsed.data, changed: false };
    const now = new Date();
    if (mine) await tx.update(votes).set({ choice: parsed.data, castAt: now }).where(eq(votes.id, mine.id));
    else await tx.insert(votes).values({ ballotId, userId: viewer.id, choice: parsed.data, castAt: now });
    await appendTrail(tx, {
      commissionId: b.commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: mine ? "vote changed" : "vote cast",
      subjectType: "ballot", subjectId: ballotId,
      payload: { number: revision.number, choice: parsed.data, choiceLabel: CHOICE_LABELS[parsed.data], previous: mine?.choice ?? null },
    });
    return { choice: parsed.data, changed: true };
  });
}

/** The chair closes an open ballot before its time; the result is frozen then, on the ballot's roll. */
export async function closeBallot(viewer: Viewer, ballotId: number): Promise<FrozenResult> {
  const { db, ballot, access, revision } = await loadBallot(viewer, ballotId);
  if (!can(access.actor, "ballot.close")) throw new ForbiddenError(CHAIR_ONLY.close);
  await closeDueBallots({ ballotId });
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, ballot.commissionId, { action: "ballot.close", refusal: CHAIR_ONLY.close });
    const [b] = await tx.select().from(ballots).where(eq(ballots.id, ballotId));
    if (b.status !== "open" || b.kind !== "electronic") throw new ConflictError(b.status === "closed" && b.kind === "electronic" ? "This ballot has already closed." : closedRefusal(b));
    return closeBallotTx(tx, b, revision.number, { id: viewer.id, role: locked.actingRole }, "chair");
  });
}
