/**
 * Ballot arithmetic, pure: who is on the roll, what counts, the live tally and the frozen result.
 * The data-access layer loads the rows and stores what these functions return; it decides nothing.
 */
import { decideBallot } from "./decide";
import { quorumFor, type BallotRules } from "./rules";
import type { FrozenResult, VoteChoice } from "./state";

export type RollRole = "chair" | "member";
/** One person on a ballot's roll, with their name as it stood when the roll was fixed. */
export interface RollEntry {
  userId: string;
  name: string;
  role: RollRole;
}
export interface Counts {
  inFavour: number;
  against: number;
  abstain: number;
}
export interface LiveTally extends Counts {
  ballotsCast: number;
  votingMembers: number;
  quorumRequired: number;
}

/** A role that carries a vote under these rules: members always, the chair when the rules say so. */
export function votesUnderRules(role: string | null | undefined, chairVotes: boolean): role is RollRole {
  return role === "member" || (role === "chair" && chairVotes);
}

/** The roll from the committee as it stands: its voting members, in the order given. */
export function rollOf(committee: { userId: string; name: string; role: string }[], chairVotes: boolean): RollEntry[] {
  return committee.filter((p) => votesUnderRules(p.role, chairVotes)).map((p) => ({ userId: p.userId, name: p.name, role: p.role as RollRole }));
}

export function onRoll(roll: readonly RollEntry[], userId: string): boolean {
  return roll.some((r) => r.userId === userId);
}

/** The votes of people on the roll, counted; a vote by anyone else does not count. */
export function countVotes(roll: readonly RollEntry[], cast: readonly { userId: string; choice: VoteChoice }[]): Counts {
  const entitled = new Set(roll.map((r) => r.userId));
  const c: Counts = { inFavour: 0, against: 0, abstain: 0 };
  for (const v of cast) {
    if (!entitled.has(v.userId)) continue;
    c[v.choice === "in-favour" ? "inFavour" : v.choice] += 1;
  }
  return c;
}

/** The tally while a ballot is open: counts so far against the roll and its quorum. */
export function liveTally(rules: BallotRules, roll: readonly RollEntry[], cast: readonly { userId: string; choice: VoteChoice }[]): LiveTally {
  const counts = countVotes(roll, cast);
  return {
    ...counts, ballotsCast: counts.inFavour + counts.against + counts.abstain,
    votingMembers: roll.length, quorumRequired: quorumFor(rules.quorum, roll.length),
  };
}

/** The result frozen at the close (or when a meeting's counts are recorded), on the roll. */
export function frozenResult(rules: BallotRules, rollSize: number, counts: Counts): FrozenResult {
  const r = decideBallot({ votingMembers: rollSize, quorum: rules.quorum, threshold: rules.threshold, ...counts });
  return { rules, votingMembers: rollSize, ...counts, ...r };
}

/** The electronic ballot's result at its close: only votes of people on its roll count. */
export function closingResult(rules: BallotRules, roll: readonly RollEntry[], cast: readonly { userId: string; choice: VoteChoice }[]): FrozenResult {
  return frozenResult(rules, roll.length, countVotes(roll, cast));
}

/**
 * Does a change of a person's committee role change who may vote? Any move to or from member or chair
 * does (the chair's vote depends on rules that may change too); a treasurer flag or an adviser does not.
 * `null` is "not on the committee" (a new person before, a removed person after).
 */
export function changesVotingRights(before: string | null, after: string | null): boolean {
  if (before === after) return false;
  const voting = (r: string | null) => r === "member" || r === "chair";
  return voting(before) || voting(after);
}
