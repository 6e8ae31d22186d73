import { describeRules, type BallotRules } from "@/models/ballot";

export function RulesSummary({ rules }: { rules: BallotRules }) {
  return (
    <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[max-content_1fr]" data-testid="rules">
      <dt className="font-medium">Quorum</dt>
      <dd>{rules.quorum === "majority" ? "A majority of the voting members" : `${rules.quorum} voting members`}</dd>
      <dt className="font-medium">To carry</dt>
      <dd>{{ majority: "More in favour than against (abstentions not counted)", "two-thirds": "At least two-thirds of the votes cast in favour", unanimous: "Every voting member in favour" }[rules.threshold]}</dd>
      <dt className="font-medium">The chair</dt>
      <dd>{rules.chairVotes ? "Votes with the members" : "Does not vote"}</dd>
      <dt className="font-medium">Voting</dt>
      <dd>{rules.electronicAuthority ? <>Electronic ballots, under: <q>{rules.electronicAuthority}</q></> : "At meetings; the chair records the vote here"}</dd>
      <dt className="sr-only">In short</dt>
      <dd className="text-sm text-ink-soft sm:col-span-2">{describeRules(rules).join(" ")}</dd>
    </dl>
  );
}
