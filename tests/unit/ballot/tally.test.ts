import { describe, expect, it } from "vitest";
import { defaultBallotRules, type BallotRules } from "@/models/ballot";
import { electronicBallotRefusal, meetingVoteRefusal, type BallotOnRevision } from "@/models/ballot/route";
import { changesVotingRights, closingResult, countVotes, frozenResult, liveTally, onRoll, rollOf, votesUnderRules } from "@/models/ballot/tally";

const rules: BallotRules = { ...defaultBallotRules, electronicAuthority: "Standing order 9(c)" };
const committee = [
  { userId: "m", name: "Margaret Ellery", role: "chair" },
  { userId: "d", name: "David Osei", role: "member" },
  { userId: "r", name: "Ruth Penhallow", role: "member" },
  { userId: "c", name: "Colin Marsh", role: "member" },
  { userId: "p", name: "Dr Priya Nandakumar", role: "adviser" },
];

describe("the roll", () => {
  // A register of voters closed before a postal or electronic ballot opens is common practice for such
  // ballots, and Placet's own rule here: the roll is the voting members when the ballot opens.
  it("is the members, and the chair only where the rules say the chair votes; never an adviser", () => {
    expect(rollOf(committee, false).map((r) => r.userId)).toEqual(["d", "r", "c"]);
    expect(rollOf(committee, true).map((r) => r.userId)).toEqual(["m", "d", "r", "c"]);
    expect(votesUnderRules("adviser", true)).toBe(false);
    expect(votesUnderRules("chair", false)).toBe(false);
    expect(onRoll(rollOf(committee, false), "m")).toBe(false);
  });

  it("counts only votes of people on it, so demoting those against after it opens changes nothing", () => {
    const roll = rollOf(committee, false);
    const cast = [{ userId: "d", choice: "in-favour" as const }, { userId: "r", choice: "against" as const }, { userId: "c", choice: "against" as const }];
    const atOpen = closingResult(rules, roll, cast);
    // Someone not on the roll (an adviser, or a person added later) adds nothing.
    const withOutsider = closingResult(rules, roll, [...cast, { userId: "p", choice: "in-favour" as const }, { userId: "x", choice: "in-favour" as const }]);
    expect(atOpen).toEqual(withOutsider);
    expect(atOpen).toMatchObject({ outcome: "failed", inFavour: 1, against: 2, votingMembers: 3, quorumRequired: 2 });
  });

  it("sets the quorum: a majority of 3 on the roll is 2 (RONR 12th ed. 40:3: a majority of the members)", () => {
    const roll = rollOf(committee, false);
    expect(liveTally(rules, roll, [{ userId: "d", choice: "abstain" }])).toEqual({ inFavour: 0, against: 0, abstain: 1, ballotsCast: 1, votingMembers: 3, quorumRequired: 2 });
    expect(countVotes(roll, [])).toEqual({ inFavour: 0, against: 0, abstain: 0 });
  });

  it("freezes a meeting's counts on the roll size with the one pure decision function", () => {
    // 2 for, 1 against of 3: carried by a majority of the votes cast (RONR 12th ed. 44:1).
    expect(frozenResult(rules, 3, { inFavour: 2, against: 1, abstain: 0 })).toMatchObject({ outcome: "carried", ballotsCast: 3, votingMembers: 3 });
    expect(frozenResult(rules, 3, { inFavour: 1, against: 0, abstain: 0 })).toMatchObject({ outcome: "no-quorum" });
  });
});

describe("changes of voting rights", () => {
  it("any move to or from member or chair changes them; advisers and unchanged roles do not", () => {
    expect(changesVotingRights("member", "adviser")).toBe(true);
    expect(changesVotingRights("adviser", "member")).toBe(true);
    expect(changesVotingRights("chair", "member")).toBe(true);
    expect(changesVotingRights(null, "member")).toBe(true);
    expect(changesVotingRights("member", null)).toBe(true);
    expect(changesVotingRights(null, "adviser")).toBe(false);
    expect(changesVotingRights("member", "member")).toBe(false);
    expect(changesVotingRights("adviser", null)).toBe(false);
  });
});

describe("one route to a result per revision (Placet's own rule)", () => {
  const failed: BallotOnRevision = { kind: "electronic", status: "closed", result: { outcome: "failed" } };
  it("refuses a meeting vote after an electronic ballot closed with a result, and says the way forward", () => {
    expect(meetingVoteRefusal(2, [failed])).toMatch(/new ballot, or a new revision/);
    expect(meetingVoteRefusal(2, [{ ...failed, result: { outcome: "no-quorum" } }])).toMatch(/no quorum/);
    expect(meetingVoteRefusal(2, [{ kind: "electronic", status: "open", result: null }])).toMatch(/is open/);
  });
  it("refuses a second meeting vote once one is recorded, whatever its outcome (one route to a result)", () => {
    expect(meetingVoteRefusal(2, [{ kind: "meeting", status: "closed", result: { outcome: "failed" } }])).toMatch(/already recorded \(failed\).*new revision/);
  });
  it("allows a meeting vote where no electronic ballot has a result (none held, or one withdrawn)", () => {
    expect(meetingVoteRefusal(2, [])).toBeNull();
    expect(meetingVoteRefusal(2, [{ kind: "electronic", status: "withdrawn", result: null }])).toBeNull();
  });
  it("refuses an electronic ballot where a meeting's vote is recorded; a failed electronic ballot may be held again", () => {
    expect(electronicBallotRefusal(2, [{ kind: "meeting", status: "closed", result: { outcome: "carried" } }])).toMatch(/meeting/);
    expect(electronicBallotRefusal(2, [failed])).toBeNull();
  });
});
