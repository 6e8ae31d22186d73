import "server-only";
import { getDb } from "@/db/client";
import { ballots, votes } from "@/db/schema";
import { meetingVoteRefusal } from "@/models/ballot/route";
import { FROM_MEETING, type FrozenResult } from "@/models/ballot/state";
import { frozenResult } from "@/models/ballot/tally";
import { can } from "@/models/permissions/policy";
import { parseMeetingVote } from "@/models/schemas/ballots";
import { ConflictError, ForbiddenError, ValidationError } from "../errors";
import { appendTrail } from "../trail";
import { ballotsOn, closeDueBallots, currentRoll, freshRevision, storeRoll, UNCONFIRMED_RULES } from "./ballot-core";
import { rulesOf } from "./commissions";
import { lockedFor } from "./locked";
import { loadRevisionById } from "./revision-access";
import type { Viewer } from "./viewer";

const CHAIR_ONLY = "Only the chair records a meeting's vote.";

/**
 * The chair records a vote taken at a meeting (the date, where the minutes are, and the counts or each
 * member's vote) as a closed ballot. One route to a result per revision: refused where an electronic
 * ballot on the revision has closed with a result. The roll is the voting members when it is recorded.
 */
export async function recordMeetingVote(viewer: Viewer, revisionId: number, input: unknown): Promise<{ ballotId: number; result: FrozenResult }> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "ballot.recordMeeting")) throw new ForbiddenError(CHAIR_ONLY);
  const now = new Date();
  const parsed = parseMeetingVote(input, now);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  const m = parsed.data;
  await closeDueBallots({ revisionId });
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, revision.commissionId, { action: "ballot.recordMeeting", refusal: CHAIR_ONLY });
    const r = await freshRevision(tx, revisionId);
    if (!locked.commission.rulesConfirmedAt) throw new ConflictError(UNCONFIRMED_RULES);
    const circulatedOn = new Date(r.circulatedAt!.getTime() - 14 * 3600 * 1000).toISOString().slice(0, 10);
    if (m.meetingDate < circulatedOn) {
      throw new ValidationError({ meetingDate: `Revision ${r.number} was circulated on ${r.circulatedAt!.toISOString().slice(0, 10)}; give the date of the meeting that voted on it.` });
    }
    const route = meetingVoteRefusal(r.number, await ballotsOn(tx, revisionId));
    if (route) throw new ConflictError(route);
    const rules = rulesOf(locked.commission);
    const roll = await currentRoll(tx, r.commissionId, rules.chairVotes);
    const byId = new Map(roll.map((v) => [v.userId, v]));
    if (m.perMember?.some((v) => !byId.has(v.userId))) {
      throw new ValidationError({ perMember: "Only the committee's voting members can be recorded as voting; someone named is not one." });
    }
    const cast = m.counts.inFavour + m.counts.against + m.counts.abstain;
    if (cast > roll.length) {
      throw new ValidationError({ _form: `The counts add up to ${cast}, more than the committee's ${roll.length} voting members.` });
    }
    const result = frozenResult(rules, roll.length, m.counts);
    const motion = m.motion ?? `That Revision ${r.number} be approved.`;
    const [res] = await tx.insert(ballots).values({
      revisionId, commissionId: r.commissionId, kind: "meeting", status: "closed", motion, openedBy: viewer.id, openedAt: now,
      closedAt: now, meetingDate: m.meetingDate, minutesRef: m.minutesRef, result: { ...result },
    }).$returningId();
    await storeRoll(tx, res.id, roll);
    if (m.perMember?.length) await tx.insert(votes).values(m.perMember.map((v) => ({ ballotId: res.id, userId: v.userId, choice: v.choice, castAt: now })));
    await appendTrail(tx, {
      commissionId: r.commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "meeting vote recorded",
      subjectType: "ballot", subjectId: res.id,
      payload: {
        number: r.number, meetingDate: m.meetingDate, minutesRef: m.minutesRef, recorded: FROM_MEETING, motion, ...result, roll,
        perMember: m.perMember ? m.perMember.map((v) => ({ userId: v.userId, name: byId.get(v.userId)!.name, choice: v.choice })) : null,
      },
    });
    return { ballotId: res.id, result };
  });
}
