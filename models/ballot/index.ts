export {
  THRESHOLDS,
  allowsElectronicBallot,
  ballotRulesSchema,
  defaultBallotRules,
  quorumFor,
  quorumSchema,
  thresholdSchema,
  type BallotRules,
  type Quorum,
  type Threshold,
} from "./rules";
export {
  BallotInputError,
  ballotInputSchema,
  decideBallot,
  type BallotInput,
  type BallotOutcome,
  type BallotResult,
} from "./decide";
export { describeOutcome, describeRules } from "./describe";
