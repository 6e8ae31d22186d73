import fc from "fast-check";
import { fraction, larger, largerEq } from "mathjs";
import * as z from "zod";
import { describe, expect, it } from "vitest";
import { BallotInputError, ballotInputSchema, decideBallot, quorumFor, type BallotInput, type BallotOutcome } from "@/models/ballot";

// Parliamentary arithmetic after Robert's Rules of Order Newly Revised (12th ed., 2020); paragraph
// numbers from memory: a majority vote is more than half of the votes cast, excluding blanks and
// abstentions (44:1); a two-thirds vote is at least two thirds of the votes cast, likewise (44:3);
// where the bylaws are silent the quorum is a majority of the membership (40:3).
const vote = (over: Partial<BallotInput>): BallotInput => ({
  votingMembers: 17, quorum: "majority", threshold: "majority", inFavour: 0, against: 0, abstain: 0, ...over,
});

describe("decideBallot: Robert's Rules of Order arithmetic", () => {
  it("9–8 carries by a majority of the votes cast (RONR 44:1)", () => {
    expect(decideBallot(vote({ inFavour: 9, against: 8 }))).toEqual({ outcome: "carried", quorumRequired: 9, ballotsCast: 17 });
  });

  it("3–3 fails: a tie is not more than half (RONR 44:1)", () => {
    expect(decideBallot(vote({ votingMembers: 7, inFavour: 3, against: 3 })).outcome).toBe("failed");
  });

  it("3 in favour, 0 against, 7 abstaining carries once quorum is met: abstentions are not votes (RONR 44:1)", () => {
    expect(decideBallot(vote({ votingMembers: 12, inFavour: 3, abstain: 7 }))).toEqual({
      outcome: "carried", quorumRequired: 7, ballotsCast: 10,
    });
    // The same ballots in a body of 20 fall short of its quorum of 11.
    expect(decideBallot(vote({ votingMembers: 20, inFavour: 3, abstain: 7 })).outcome).toBe("no-quorum");
  });

  it("7 voting members have a default quorum of 4, a majority of the members (RONR 40:3)", () => {
    expect(quorumFor("majority", 7)).toBe(4);
    expect(decideBallot(vote({ votingMembers: 7, inFavour: 3 }))).toEqual({ outcome: "no-quorum", quorumRequired: 4, ballotsCast: 3 });
    expect(decideBallot(vote({ votingMembers: 7, inFavour: 3, abstain: 1 })).outcome).toBe("carried");
  });

  it("majority quorum for even and tiny bodies", () => {
    expect([0, 1, 2, 3, 4, 8, 9].map((n) => quorumFor("majority", n))).toEqual([1, 1, 2, 2, 3, 5, 5]);
  });

  it("6–3 carries under two-thirds and 5–3 does not (RONR 44:3)", () => {
    expect(decideBallot(vote({ threshold: "two-thirds", inFavour: 6, against: 3 })).outcome).toBe("carried");
    expect(decideBallot(vote({ threshold: "two-thirds", inFavour: 5, against: 3, abstain: 1 })).outcome).toBe("failed");
  });

  it("two-thirds needs at least one in favour", () => {
    expect(decideBallot(vote({ votingMembers: 5, threshold: "two-thirds", abstain: 5 })).outcome).toBe("failed");
    expect(decideBallot(vote({ votingMembers: 5, threshold: "two-thirds", inFavour: 1, abstain: 4 })).outcome).toBe("carried");
  });

  it("nothing carries when every ballot is an abstention", () => {
    expect(decideBallot(vote({ votingMembers: 5, abstain: 5 })).outcome).toBe("failed");
  });

  it("a numeric quorum is a count of ballots, abstentions included", () => {
    expect(decideBallot(vote({ votingMembers: 9, quorum: 5, inFavour: 3, abstain: 1 })).outcome).toBe("no-quorum");
    expect(decideBallot(vote({ votingMembers: 9, quorum: 5, inFavour: 3, abstain: 2 }))).toEqual({
      outcome: "carried", quorumRequired: 5, ballotsCast: 5,
    });
    expect(decideBallot(vote({ votingMembers: 3, quorum: 4, inFavour: 3 })).outcome).toBe("no-quorum");
  });
});

describe("decideBallot: unanimity", () => {
  const u = (over: Partial<BallotInput>) => decideBallot(vote({ threshold: "unanimous", votingMembers: 5, ...over }));
  it("carries when every voting member is in favour", () => expect(u({ inFavour: 5 }).outcome).toBe("carried"));
  it("fails on one abstention", () => expect(u({ inFavour: 4, abstain: 1 }).outcome).toBe("failed"));
  it("fails on one absence, though quorum is met", () => expect(u({ inFavour: 4 }).outcome).toBe("failed"));
  it("fails on one against", () => expect(u({ inFavour: 4, against: 1 }).outcome).toBe("failed"));
  it("is no quorum for a body with no voting members", () => expect(u({ votingMembers: 0 }).outcome).toBe("no-quorum"));
});

describe("decideBallot: bad input", () => {
  it.each<[string, Partial<BallotInput> | Record<string, unknown>, string]>([
    ["a negative count", { against: -1 }, "against"],
    ["a fractional count", { inFavour: 1.5 }, "inFavour"],
    ["a count that is text", { abstain: "2" }, "abstain"],
    ["a missing count", { votingMembers: undefined }, "votingMembers"],
    ["a zero quorum", { quorum: 0 }, "quorum"],
    ["an unknown quorum", { quorum: "half" }, "quorum"],
    ["an unknown threshold", { threshold: "plurality" }, "threshold"],
    ["more ballots than voting members", { votingMembers: 3, inFavour: 2, against: 2 }, "ballotsCast"],
  ])("throws BallotInputError naming the field for %s", (_what, over, field) => {
    const input = { ...vote({}), ...over } as BallotInput;
    const attempt = () => decideBallot(input);
    expect(attempt).toThrow(BallotInputError);
    try {
      attempt();
    } catch (err) {
      expect((err as BallotInputError).field).toBe(field);
      expect((err as Error).message).toMatch(field === "ballotsCast" ? /ballots cast .* more than the 3 voting members/ : new RegExp(`^${field} `));
    }
  });

  it("the schema gives field errors an API can return", () => {
    const r = ballotInputSchema.safeParse({ ...vote({}), against: -2, threshold: "most" });
    expect(r.success).toBe(false);
    const flat = z.flattenError(r.error!);
    expect(flat.fieldErrors.against).toEqual(["cannot be negative"]);
    expect(flat.fieldErrors.threshold?.[0]).toMatch(/two-thirds/);
  });
});

// ---- properties ---------------------------------------------------------------------------------
const RANK: Record<BallotOutcome, number> = { "no-quorum": 0, failed: 1, carried: 2 };

const inputArb: fc.Arbitrary<BallotInput> = fc
  .record({
    votingMembers: fc.integer({ min: 0, max: 40 }),
    quorum: fc.oneof(fc.constant("majority" as const), fc.integer({ min: 1, max: 45 })),
    threshold: fc.constantFrom("majority" as const, "two-thirds" as const, "unanimous" as const),
    split: fc.tuple(fc.nat(), fc.nat(), fc.nat(), fc.nat()),
  })
  .map(({ votingMembers, quorum, threshold, split: [a, b, c, d] }) => {
    // Share out up to votingMembers ballots between in favour, against, abstain and absent.
    const total = a + b + c + d || 1;
    const part = (x: number) => Math.floor((x / total) * votingMembers);
    return { votingMembers, quorum, threshold, inFavour: part(a), against: part(b), abstain: part(c) };
  });

describe("decideBallot: properties", () => {
  it("once quorum is met, adding an abstention never changes the outcome (so never carried → failed)", () => {
    fc.assert(
      fc.property(inputArb, (b) => {
        fc.pre(b.inFavour + b.against + b.abstain < b.votingMembers);
        const before = decideBallot(b);
        fc.pre(before.outcome !== "no-quorum");
        expect(decideBallot({ ...b, abstain: b.abstain + 1 }).outcome).toBe(before.outcome);
      }),
      { numRuns: 2000 },
    );
  });

  it("swapping for and against never helps a motion", () => {
    fc.assert(
      fc.property(inputArb, (b) => {
        const stronger = { ...b, inFavour: Math.max(b.inFavour, b.against), against: Math.min(b.inFavour, b.against) };
        const weaker = { ...stronger, inFavour: stronger.against, against: stronger.inFavour };
        expect(RANK[decideBallot(weaker).outcome]).toBeLessThanOrEqual(RANK[decideBallot(stronger).outcome]);
        expect(decideBallot(weaker).ballotsCast).toBe(decideBallot(stronger).ballotsCast);
      }),
      { numRuns: 2000 },
    );
  });

  it("turning one vote in favour into one against never turns failed into carried", () => {
    fc.assert(
      fc.property(inputArb, (b) => {
        fc.pre(b.inFavour > 0);
        const moved = decideBallot({ ...b, inFavour: b.inFavour - 1, against: b.against + 1 });
        expect(RANK[moved.outcome]).toBeLessThanOrEqual(RANK[decideBallot(b).outcome]);
      }),
      { numRuns: 2000 },
    );
  });

  it("agrees with exact fractions computed independently (mathjs)", () => {
    fc.assert(
      fc.property(inputArb, (b) => {
        const r = decideBallot(b);
        const cast = b.inFavour + b.against + b.abstain;
        const q = b.quorum === "majority" ? Math.floor(b.votingMembers / 2) + 1 : b.quorum;
        if (b.quorum === "majority") expect(2 * q > b.votingMembers && 2 * (q - 1) <= b.votingMembers).toBe(true);
        expect(r).toMatchObject({ quorumRequired: q, ballotsCast: cast });
        if (cast < q) {
          expect(r.outcome).toBe("no-quorum");
          return;
        }
        const decisive = b.inFavour + b.against;
        const share = decisive === 0 ? fraction(0) : fraction(b.inFavour, decisive);
        const carried =
          b.threshold === "majority" ? larger(share, fraction(1, 2))
          : b.threshold === "two-thirds" ? decisive > 0 && largerEq(share, fraction(2, 3))
          : b.votingMembers > 0 && b.inFavour === b.votingMembers;
        expect(r.outcome).toBe(carried ? "carried" : "failed");
      }),
      { numRuns: 3000 },
    );
  });
});
