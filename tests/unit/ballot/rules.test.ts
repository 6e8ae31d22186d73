import * as z from "zod";
import { describe, expect, it } from "vitest";
import {
  allowsElectronicBallot, ballotRulesSchema, decideBallot, defaultBallotRules, describeOutcome, describeRules, type BallotInput,
} from "@/models/ballot";

describe("ballotRulesSchema", () => {
  it("fills every missing rule with the default", () => {
    expect(ballotRulesSchema.parse({})).toEqual(defaultBallotRules);
    expect(defaultBallotRules).toEqual({ quorum: "majority", threshold: "majority", chairVotes: false, electronicAuthority: null });
  });

  it("accepts written rules and tidies the authority", () => {
    expect(
      ballotRulesSchema.parse({ quorum: 4, threshold: "two-thirds", chairVotes: true, electronicAuthority: "  Bylaw 7.2 (2025)  " }),
    ).toEqual({ quorum: 4, threshold: "two-thirds", chairVotes: true, electronicAuthority: "Bylaw 7.2 (2025)" });
    expect(ballotRulesSchema.parse({ electronicAuthority: "   " }).electronicAuthority).toBeNull();
  });

  it.each([
    ["quorum", { quorum: 0 }],
    ["quorum", { quorum: 2.5 }],
    ["quorum", { quorum: "half" }],
    ["threshold", { threshold: "plurality" }],
    ["chairVotes", { chairVotes: "yes" }],
    ["electronicAuthority", { electronicAuthority: "x".repeat(501) }],
    ["electronicAuthority", { electronicAuthority: 12 }],
  ])("names %s when it is wrong", (field, input) => {
    const r = ballotRulesSchema.safeParse(input);
    expect(r.success).toBe(false);
    const errors = z.flattenError(r.error!).fieldErrors as Record<string, string[] | undefined>;
    expect(Object.keys(errors)).toEqual([field]);
    expect(errors[field]?.[0]).toMatch(/must/);
  });

  it("electronic ballots need a recorded authority", () => {
    expect(allowsElectronicBallot(defaultBallotRules)).toBe(false);
    expect(allowsElectronicBallot({ electronicAuthority: "Resolution of the council, 3 March 2026" })).toBe(true);
    expect(allowsElectronicBallot({ electronicAuthority: "  " })).toBe(false);
  });
});

describe("describeRules", () => {
  it("says the default rules in plain words, with the quorum for the body", () => {
    const lines = describeRules(defaultBallotRules, 7);
    expect(lines).toHaveLength(4);
    expect(lines[0]).toContain("(4 of 7)");
    expect(lines[0]).toContain("abstaining counts as taking part");
    expect(lines[1]).toContain("abstentions are not counted");
    expect(lines[2]).toBe("The chair does not vote.");
    expect(lines[3]).toMatch(/taken at a meeting/);
  });

  it("covers a fixed quorum, two-thirds, unanimity, a voting chair and an authority", () => {
    const rules = { quorum: 1, threshold: "two-thirds" as const, chairVotes: true, electronicAuthority: "Standing order 12" };
    const lines = describeRules(rules);
    expect(lines[0]).toContain("at least 1 voting member take part");
    expect(lines[1]).toContain("twice as many");
    expect(lines[2]).toBe("The chair votes as a member.");
    expect(lines[3]).toContain("Standing order 12");
    expect(describeRules({ ...rules, threshold: "unanimous" })[1]).toContain("every voting member");
  });
});

describe("describeOutcome", () => {
  const say = (b: BallotInput) => describeOutcome(decideBallot(b), b);
  const base: BallotInput = { votingMembers: 17, quorum: "majority", threshold: "majority", inFavour: 9, against: 8, abstain: 0 };

  it("reports a carried motion with its tally", () => {
    expect(say(base)).toBe("Carried: 9 in favour, 8 against, none abstaining. 17 ballots cast; the quorum was 9.");
  });

  it("says why a motion failed", () => {
    expect(say({ ...base, votingMembers: 9, threshold: "two-thirds", inFavour: 5, against: 3, abstain: 1 })).toBe(
      "Failed: 5 in favour, 3 against, 1 abstaining. It needed at least twice as many in favour as against. 9 ballots cast; the quorum was 5.",
    );
    expect(say({ ...base, inFavour: 8, against: 8 })).toContain("It needed more in favour than against.");
  });

  it("explains no quorum, and a quorum that cannot be reached", () => {
    expect(say({ ...base, votingMembers: 7, inFavour: 2, against: 0, abstain: 1 })).toBe(
      "No quorum: 2 in favour, 0 against, 1 abstaining. 3 ballots cast, 4 needed, so nothing was decided.",
    );
    expect(say({ ...base, votingMembers: 3, quorum: 4, inFavour: 1, against: 0 })).toContain("cannot be reached");
  });

  it("works without the tally", () => {
    expect(describeOutcome({ outcome: "carried", quorumRequired: 1, ballotsCast: 1 })).toBe("Carried. 1 ballot cast; the quorum was 1.");
  });
});
