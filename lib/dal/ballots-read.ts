import "server-only";
import { desc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { ballots, users, votes } from "@/db/schema";
import { allowsElectronicBallot, describeOutcome, describeRules } from "@/models/ballot";
import {
  BALLOT_OUTCOME_LABELS, type BallotDto, type BallotResultDto, type BallotStateDto, type FrozenResult, type TallyDto, type VoterDto,
} from "@/models/ballot/state";
import { electronicBallotRefusal, meetingVoteRefusal } from "@/models/ballot/route";
import { liveTally, onRoll } from "@/models/ballot/tally";
import { can } from "@/models/permissions/policy";
import { ballotsOn, closeDueBallots, currentRoll, loadRoll, UNCONFIRMED_RULES, type BallotRow } from "./ballot-core";
import { rulesOf } from "./commissions";
import { loadRevisionById } from "./revision-access";
import type { Viewer } from "./viewer";

export function resultDto(r: FrozenResult): BallotResultDto {
  return {
    ...r, outcomeLabel: BALLOT_OUTCOME_LABELS[r.outcome],
    sentence: describeOutcome(r, { votingMembers: r.votingMembers, quorum: r.rules.quorum, threshold: r.rules.threshold, inFavour: r.inFavour, against: r.against, abstain: r.abstain }),
  };
}

function ballotDto(b: BallotRow, openedByName: string): BallotDto {
  return {
    id: b.id, kind: b.kind, status: b.status, motion: b.motion, openedAt: b.openedAt.toISOString(), openedByName,
    closesAt: b.closesAt?.toISOString() ?? null, closedAt: b.closedAt?.toISOString() ?? null, meetingDate: b.meetingDate,
    minutesRef: b.minutesRef,
  };
}

/**
 * Everything the ballot panel shows for a revision: the rules in words, the open (or latest) ballot, the
 * live tally and who voted how (everyone on the commission sees these), and what the viewer may do.
 * A ballot past its closing time is closed first.
 */
export async function getBallotState(viewer: Viewer, revisionId: number): Promise<BallotStateDto> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  await closeDueBallots({ revisionId });
  const rules = rulesOf(access.commission);
  const voters = await currentRoll(db, revision.commissionId, rules.chairVotes);
  const all = await db.select().from(ballots).where(eq(ballots.revisionId, revisionId)).orderBy(desc(ballots.id));
  const current = all.find((b) => b.status === "open") ?? all[0] ?? null;
  const isChair = access.actor.committeeRole === "chair";
  const circulated = revision.state === "circulated";
  const anyOpen = current?.status === "open";
  const electronicAllowed = allowsElectronicBallot(rules);
  const route = await ballotsOn(db, revisionId);
  const rulesConfirmed = access.commission.rulesConfirmedAt !== null;
  const meetingRefusal = !rulesConfirmed ? UNCONFIRMED_RULES : meetingVoteRefusal(revision.number, route);
  const openRefusal = !rulesConfirmed ? UNCONFIRMED_RULES : electronicBallotRefusal(revision.number, route);

  let ballot: BallotDto | null = null;
  let tally: TallyDto | null = null;
  let whoVotedHow: VoterDto[] = [];
  let yourVote: BallotStateDto["yourVote"] = null;
  let result: BallotResultDto | null = null;
  let roll: BallotStateDto["roll"] = null;
  if (current) {
    roll = await loadRoll(db, current.id);
    const cast = await db.select({ userId: votes.userId, choice: votes.choice, castAt: votes.castAt, name: users.name, email: users.email })
      .from(votes).innerJoin(users, eq(users.id, votes.userId)).where(eq(votes.ballotId, current.id));
    const [opener] = await db.select({ name: users.name, email: users.email }).from(users).where(inArray(users.id, [current.openedBy]));
    ballot = ballotDto(current, opener?.name ?? opener?.email ?? "The chair");
    yourVote = cast.find((v) => v.userId === viewer.id)?.choice ?? null;
    const frozen = current.result as FrozenResult | null;
    if (frozen) {
      result = resultDto(frozen);
      tally = { inFavour: frozen.inFavour, against: frozen.against, abstain: frozen.abstain, ballotsCast: frozen.ballotsCast, votingMembers: frozen.votingMembers, quorumRequired: frozen.quorumRequired };
    } else {
      tally = liveTally(rules, roll, cast);
    }
    const countsOnly = current.kind === "meeting" && cast.length === 0;
    if (!countsOnly) {
      const byId = new Map(cast.map((v) => [v.userId, v]));
      whoVotedHow = roll.map((p) => ({ ...p, choice: byId.get(p.userId)?.choice ?? null, at: byId.get(p.userId)?.castAt.toISOString() ?? null }));
    }
  }
  const open = current?.status === "open" && current.closesAt !== null && current.closesAt.getTime() > Date.now();
  return {
    revisionId, revisionNumber: revision.number, revisionState: revision.state,
    ballot, tally, whoVotedHow, yourVote,
    youMayVote: Boolean(open && roll && onRoll(roll, viewer.id)),
    result, rules, rulesText: describeRules(rules, voters.length), electronicAllowed,
    votingMembers: voters, roll, rulesConfirmed, meetingRefusal, openRefusal,
    you: {
      isChair,
      canOpen: can(access.actor, "ballot.open") && circulated && !anyOpen && electronicAllowed && !openRefusal,
      canClose: can(access.actor, "ballot.close") && anyOpen,
      canRecordMeeting: can(access.actor, "ballot.recordMeeting") && circulated && !anyOpen && !meetingRefusal,
    },
    earlier: all.filter((b) => b !== current).map((b) => ({
      id: b.id, kind: b.kind, status: b.status, closedAt: b.closedAt?.toISOString() ?? null,
      outcomeLabel: b.result ? BALLOT_OUTCOME_LABELS[(b.result as unknown as FrozenResult).outcome] : null,
    })),
    serverTime: new Date().toISOString(),
  };
}
