import * as z from "zod";
import { quorumFor, quorumSchema, thresholdSchema, type Quorum, type Threshold } from "./rules";

export type BallotInput = {
  votingMembers: number;
  quorum: Quorum;
  threshold: Threshold;
  inFavour: number;
  against: number;
  abstain: number;
};

export type BallotOutcome = "carried" | "failed" | "no-quorum";

export type BallotResult = { outcome: BallotOutcome; quorumRequired: number; ballotsCast: number };

const count = z.number({ error: "must be a number" }).int({ error: "must be a whole number" }).min(0, { error: "cannot be negative" });

export const ballotInputSchema = z
  .object({
    votingMembers: count,
    quorum: quorumSchema,
    threshold: thresholdSchema,
    inFavour: count,
    against: count,
    abstain: count,
  })
  .superRefine((b, ctx) => {
    const cast = b.inFavour + b.against + b.abstain;
    if (cast > b.votingMembers) {
      ctx.addIssue({
        code: "custom",
        path: [],
        message: `ballots cast (inFavour + against + abstain) is ${cast}, more than the ${b.votingMembers} voting members`,
      });
    }
  }) satisfies z.ZodType<BallotInput, unknown>;

/** Thrown by decideBallot for input that ballotInputSchema would refuse; names the field. */
export class BallotInputError extends Error {
  constructor(
    readonly field: keyof BallotInput | "ballotsCast" | "input",
    message: string,
  ) {
    super(message);
    this.name = "BallotInputError";
  }
}

/**
 * The result of a vote under the commission's rules.
 * - Quorum counts every ballot cast, abstentions included.
 * - "majority": more in favour than against; abstentions are not counted.
 * - "two-thirds": in favour at least twice against (⇔ at least 2/3 of the for-and-against
 *   votes), with at least one in favour.
 * - "unanimous": every voting member in favour.
 * Expects input that passed ballotInputSchema; anything else throws BallotInputError.
 */
export function decideBallot(input: BallotInput): BallotResult {
  const parsed = ballotInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue.path[0] as keyof BallotInput | undefined;
    if (field) throw new BallotInputError(field, `${field} ${issue.message}`);
    throw new BallotInputError(issue.code === "custom" ? "ballotsCast" : "input", issue.message);
  }
  const { votingMembers, quorum, threshold, inFavour, against, abstain } = parsed.data;
  const quorumRequired = quorumFor(quorum, votingMembers);
  const ballotsCast = inFavour + against + abstain;
  if (ballotsCast < quorumRequired) return { outcome: "no-quorum", quorumRequired, ballotsCast };
  const carried =
    threshold === "majority"
      ? inFavour > against
      : threshold === "two-thirds"
        ? inFavour >= 2 * against && inFavour >= 1
        : votingMembers >= 1 && inFavour === votingMembers;
  return { outcome: carried ? "carried" : "failed", quorumRequired, ballotsCast };
}
