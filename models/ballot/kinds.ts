/** A ballot is taken electronically between meetings, or recorded from a show of hands at a meeting. */
export const BALLOT_KINDS = ["electronic", "meeting"] as const;
export type BallotKind = (typeof BALLOT_KINDS)[number];

export const BALLOT_STATUSES = ["open", "closed", "withdrawn"] as const;
export type BallotStatus = (typeof BALLOT_STATUSES)[number];
