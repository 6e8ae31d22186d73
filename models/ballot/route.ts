/**
 * One route to a result per revision: an electronic ballot, or a vote taken at a meeting and recorded by
 * the chair, never both. Pure: the data-access layer passes the revision's ballots.
 */
import { BALLOT_OUTCOME_LABELS, type FrozenResult } from "./state";

export interface BallotOnRevision {
  kind: "electronic" | "meeting";
  status: "open" | "closed" | "withdrawn";
  result: Pick<FrozenResult, "outcome"> | null;
}

const withResult = (b: BallotOnRevision) => b.status === "closed" && b.result !== null;

/** Why a meeting vote may not be recorded on this revision, or null if it may. */
export function meetingVoteRefusal(number: number, ballots: readonly BallotOnRevision[]): string | null {
  if (ballots.some((b) => b.kind === "electronic" && b.status === "open")) {
    return `A ballot on Revision ${number} is open; close it before recording a meeting's vote.`;
  }
  const met = [...ballots].reverse().find((b) => b.kind === "meeting" && withResult(b));
  if (met) {
    const label = BALLOT_OUTCOME_LABELS[met.result!.outcome].toLowerCase();
    return `A vote taken at a meeting on Revision ${number} is already recorded (${label}); a second one cannot be recorded on it. ` +
      "The way forward is a new revision from the studio.";
  }
  const held = [...ballots].reverse().find((b) => b.kind === "electronic" && withResult(b));
  if (held) {
    const label = BALLOT_OUTCOME_LABELS[held.result!.outcome].toLowerCase();
    return `An electronic ballot on Revision ${number} has closed with a result (${label}), so a meeting vote cannot be recorded on it. ` +
      "The way forward is a new ballot, or a new revision from the studio.";
  }
  return null;
}

/** Why an electronic ballot may not be opened on this revision because of the route taken, or null. */
export function electronicBallotRefusal(number: number, ballots: readonly BallotOnRevision[]): string | null {
  if (ballots.some((b) => b.kind === "meeting" && withResult(b))) {
    return `The vote on Revision ${number} was taken at a meeting and recorded by the chair, so no electronic ballot can be held on it. The way forward is a new revision from the studio.`;
  }
  return null;
}
