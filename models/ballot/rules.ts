import * as z from "zod";

export const THRESHOLDS = ["majority", "two-thirds", "unanimous"] as const;
export type Threshold = (typeof THRESHOLDS)[number];
export type Quorum = "majority" | number;

const quorumError = 'must be "majority" or a whole number of 1 or more';
export const quorumSchema = z.union(
  [z.literal("majority"), z.number().int({ error: quorumError }).min(1, { error: quorumError }).max(10_000, { error: "is too large" })],
  { error: quorumError },
);
export const thresholdSchema = z.enum(THRESHOLDS, { error: 'must be "majority", "two-thirds" or "unanimous"' });

/** A commission's written rules for deciding a motion. */
export type BallotRules = {
  quorum: Quorum;
  threshold: Threshold;
  chairVotes: boolean;
  /** The bylaw clause or resolution that allows electronic voting; null = votes are taken at meetings. */
  electronicAuthority: string | null;
};

/**
 * The usual parliamentary defaults: a quorum of a majority of the voting members and a
 * majority of the votes cast; the chair does not vote; no authority for electronic ballots
 * until the committee records one.
 */
export const defaultBallotRules: BallotRules = {
  quorum: "majority",
  threshold: "majority",
  chairVotes: false,
  electronicAuthority: null,
};

/** Missing fields take the defaults; a blank authority becomes null. */
export const ballotRulesSchema = z.object({
  quorum: quorumSchema.default(defaultBallotRules.quorum),
  threshold: thresholdSchema.default(defaultBallotRules.threshold),
  chairVotes: z.boolean({ error: "must be true or false" }).default(defaultBallotRules.chairVotes),
  electronicAuthority: z
    .string({ error: "must be text (the bylaw clause or resolution), or null" })
    .max(500, { error: "must be 500 characters or fewer" })
    .nullable()
    .default(null)
    .transform((s) => (s && s.trim() ? s.trim() : null)),
}) satisfies z.ZodType<BallotRules, unknown>;

/** Electronic ballots need a recorded authority; otherwise the chair records a meeting vote. */
export function allowsElectronicBallot(rules: Pick<BallotRules, "electronicAuthority">): boolean {
  return typeof rules.electronicAuthority === "string" && rules.electronicAuthority.trim() !== "";
}

/** The quorum as a number of ballots for a body of `votingMembers`: "majority" = more than half. */
export function quorumFor(quorum: Quorum, votingMembers: number): number {
  return quorum === "majority" ? Math.floor(votingMembers / 2) + 1 : quorum;
}
