import type { BallotOutcome } from "./decide";
import type { BallotRules } from "./rules";

/** The three answers to a motion, in the order they are shown. */
export const VOTE_CHOICES = ["in-favour", "against", "abstain"] as const;
export type VoteChoice = (typeof VOTE_CHOICES)[number];

export const CHOICE_LABELS: Record<VoteChoice, string> = { "in-favour": "In favour", against: "Against", abstain: "Abstain" };
/** As a past action, for sentences: "Ruth voted in favour", "David abstained". */
export const CHOICE_PAST: Record<VoteChoice, string> = { "in-favour": "voted in favour", against: "voted against", abstain: "abstained" };

export const BALLOT_OUTCOME_LABELS: Record<BallotOutcome, string> = { carried: "Carried", failed: "Failed", "no-quorum": "No quorum" };

/** What is frozen on a ballot when it closes (electronic) or is recorded (meeting). */
export interface FrozenResult {
  rules: BallotRules;
  votingMembers: number;
  inFavour: number;
  against: number;
  abstain: number;
  outcome: BallotOutcome;
  quorumRequired: number;
  ballotsCast: number;
}

// --- What the ballot panel receives (GET /api/revisions/{id}/ballot) ---------------------------

export interface BallotDto {
  id: number;
  kind: "electronic" | "meeting";
  status: "open" | "closed" | "withdrawn";
  motion: string;
  openedAt: string;
  openedByName: string;
  closesAt: string | null;
  closedAt: string | null;
  meetingDate: string | null;
  /** For a meeting vote: where the minutes are. */
  minutesRef: string | null;
}

/** How every view marks a result the chair entered from a meeting's minutes. */
export const FROM_MEETING = "recorded by the chair from a meeting";

export interface TallyDto {
  inFavour: number;
  against: number;
  abstain: number;
  ballotsCast: number;
  votingMembers: number;
  quorumRequired: number;
}

export interface VoterDto {
  userId: string;
  name: string;
  role: "chair" | "member";
  /** Null: has not voted (or, at a meeting recorded by counts, not known). */
  choice: VoteChoice | null;
  at: string | null;
}

export interface BallotResultDto extends FrozenResult {
  outcomeLabel: string;
  /** One or two plain sentences (models/ballot describeOutcome). */
  sentence: string;
}

export interface BallotStateDto {
  revisionId: number;
  revisionNumber: number;
  revisionState: "draft" | "circulated" | "superseded" | "decided";
  /** The open ballot, else the latest one held on this revision, else null. */
  ballot: BallotDto | null;
  tally: TallyDto | null;
  whoVotedHow: VoterDto[];
  yourVote: VoteChoice | null;
  youMayVote: boolean;
  result: BallotResultDto | null;
  rules: BallotRules;
  rulesText: string[];
  electronicAllowed: boolean;
  /** The voting members now, for the chair's per-member meeting form. */
  votingMembers: { userId: string; name: string; role: "chair" | "member" }[];
  /** The roll of the ballot shown (fixed when it opened), or null when there is none. */
  roll: { userId: string; name: string; role: "chair" | "member" }[] | null;
  /** False until the chair confirms the rules the studio proposed; no ballot before then. */
  rulesConfirmed: boolean;
  /** Why the chair may not record a meeting vote / open a ballot now (null: may, or not the chair's to ask). */
  meetingRefusal: string | null;
  openRefusal: string | null;
  you: { isChair: boolean; canOpen: boolean; canClose: boolean; canRecordMeeting: boolean };
  /** Earlier ballots on the same revision, newest first. */
  earlier: { id: number; kind: "electronic" | "meeting"; status: "open" | "closed" | "withdrawn"; outcomeLabel: string | null; closedAt: string | null }[];
  serverTime: string;
}
