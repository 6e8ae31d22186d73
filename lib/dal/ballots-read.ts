import "server-only";
import { desc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { ballots, users, votes } from "@/db/schema";
import { allowsElectronicBallot, describeOutcome, describeRules, quorumFor } from "@/models/ballot";
import {
  BALLOT_OUTCOME_LABELS, type BallotDto, type BallotResultDto, type BallotStateDto, type FrozenResult, type TallyDto, type VoterDto,
} from "@/models/ballot/state";
import { can, mayVote } from "@/models/permissions/policy";
import { closeDueBallots, countChoices, votingMembersOf, type BallotRow } from "./ballot-core";
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
  const voters = await votingMembersOf(db, revision.commissionId, rules.chairVotes);
  const all = await db.select().from(ballots).where(eq(ballots.revisionId, revisionId)).orderBy(desc(ballots.id));
  const current = all.find((b) => b.status === "open") ?? all[0] ?? null;
  const isChair = access.actor.committeeRole === "chair";
  const circulated = revision.state === "circulated";
  const anyOpen = current?.status === "open";
  const electronicAllowed = allowsElectronicBallot(rules);

  let ballot: BallotDto | null = null;
  let tally: TallyDto | null = null;
  let whoVotedHow: VoterDto[] = [];
  let yourVote: BallotStateDto["yourVote"] = null;
  let result: BallotResultDto | null = null;
  if (current) {
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
      const entitled = new Set(voters.map((v) => v.userId));
      const counts = countChoices(cast.filter((v) => entitled.has(v.userId)).map((v) => v.choice));
      tally = { ...counts, ballotsCast: counts.inFavour + counts.against + counts.abstain, votingMembers: voters.length, quorumRequired: quorumFor(rules.quorum, voters.length) };
    }
    const countsOnly = current.kind === "meeting" && cast.length === 0;
    if (!countsOnly) {
      const byId = new Map(cast.map((v) => [v.userId, v]));
      whoVotedHow = voters.map((p) => ({ ...p, choice: byId.get(p.userId)?.choice ?? null, at: byId.get(p.userId)?.castAt.toISOString() ?? null }));
      for (const v of cast) {
        if (!voters.some((p) => p.userId === v.userId)) whoVotedHow.push({ userId: v.userId, name: v.name ?? v.email, role: "member", choice: v.choice, at: v.castAt.toISOString() });
      }
    }
  }
  const open = current?.status === "open" && current.closesAt !== null && current.closesAt.getTime() > Date.now();
  return {
    revisionId, revisionNumber: revision.number, revisionState: revision.state,
    ballot, tally, whoVotedHow, yourVote,
    youMayVote: Boolean(open && mayVote(access.actor, rules.chairVotes)),
    result, rules, rulesText: describeRules(rules, voters.length), electronicAllowed,
    votingMembers: voters,
    you: {
      isChair,
      canOpen: can(access.actor, "ballot.open") && circulated && !anyOpen && electronicAllowed,
      canClose: can(access.actor, "ballot.close") && anyOpen,
      canRecordMeeting: can(access.actor, "ballot.recordMeeting") && circulated && !anyOpen,
    },
    earlier: all.filter((b) => b !== current).map((b) => ({
      id: b.id, kind: b.kind, status: b.status, closedAt: b.closedAt?.toISOString() ?? null,
      outcomeLabel: b.result ? BALLOT_OUTCOME_LABELS[(b.result as unknown as FrozenResult).outcome] : null,
    })),
    serverTime: new Date().toISOString(),
  };
}
