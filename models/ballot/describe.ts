import type { BallotInput, BallotResult } from "./decide";
import { allowsElectronicBallot, quorumFor, type BallotRules } from "./rules";

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** The rules in plain sentences, for the commission page and the ballot form. */
export function describeRules(rules: BallotRules, votingMembers?: number): string[] {
  const of = votingMembers === undefined ? "" : ` (${quorumFor(rules.quorum, votingMembers)} of ${votingMembers})`;
  const quorum =
    rules.quorum === "majority"
      ? `A vote counts only if more than half of the voting members take part${of}; abstaining counts as taking part.`
      : `A vote counts only if at least ${plural(rules.quorum, "voting member")} take part; abstaining counts as taking part.`;
  const threshold = {
    majority: "A motion carries when more vote in favour than against; abstentions are not counted.",
    "two-thirds": "A motion carries when at least twice as many vote in favour as against (two-thirds of the votes cast); abstentions are not counted.",
    unanimous: "A motion carries only when every voting member votes in favour.",
  }[rules.threshold];
  const chair = rules.chairVotes ? "The chair votes as a member." : "The chair does not vote.";
  const voting = allowsElectronicBallot(rules)
    ? `Members may vote here, as allowed by: ${rules.electronicAuthority!.trim()}.`
    : "No authority for voting online is recorded, so votes are taken at a meeting and the chair records them here.";
  return [quorum, threshold, chair, voting];
}

/** One or two plain sentences on a result, e.g. "Carried: 9 in favour, 8 against, none abstaining." */
export function describeOutcome(result: BallotResult, input?: BallotInput): string {
  const tally = input
    ? `: ${input.inFavour} in favour, ${input.against} against, ${input.abstain === 0 ? "none" : input.abstain} abstaining`
    : "";
  const cast = `${plural(result.ballotsCast, "ballot")} cast`;
  if (result.outcome === "no-quorum") {
    const unreachable =
      input && result.quorumRequired > input.votingMembers
        ? ` The quorum is more than the ${plural(input.votingMembers, "voting member")}, so it cannot be reached.`
        : "";
    return `No quorum${tally}. ${cast}, ${result.quorumRequired} needed, so nothing was decided.${unreachable}`;
  }
  const why =
    result.outcome === "failed" && input
      ? {
          majority: " It needed more in favour than against.",
          "two-thirds": " It needed at least twice as many in favour as against.",
          unanimous: " It needed every voting member in favour.",
        }[input.threshold]
      : "";
  return `${result.outcome === "carried" ? "Carried" : "Failed"}${tally}.${why} ${cast}; the quorum was ${result.quorumRequired}.`;
}
