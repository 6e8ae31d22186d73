import { describe, expect, it } from "vitest";
import { createElement as h } from "react";
import { renderToString } from "react-dom/server";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { BallotPanel } from "@/components/ballot/BallotPanel";
import { DecisionForm } from "@/components/ballot/DecisionForm";
import { DecisionSummary } from "@/components/ballot/DecisionSummary";
import { ballotKey, decisionKey } from "@/components/ballot/api";
import type { BallotStateDto } from "@/models/ballot/state";
import type { DecisionStateDto } from "@/models/decision";

const rules = { quorum: "majority" as const, threshold: "majority" as const, chairVotes: false, electronicAuthority: "Standing order 9(c)" };
const voters = [
  { userId: "a", name: "Ruth Penhallow", role: "member" as const },
  { userId: "b", name: "David Osei", role: "member" as const },
  { userId: "c", name: "Colin Marsh", role: "member" as const },
];

function ballotState(over: Partial<BallotStateDto> = {}): BallotStateDto {
  return {
    revisionId: 7, revisionNumber: 2, revisionState: "circulated",
    ballot: { id: 3, kind: "electronic", status: "open", motion: "That Revision 2 be approved.", openedAt: "2026-12-01T10:00:00.000Z", openedByName: "Margaret Ellery", closesAt: "2026-12-08T18:00:00.000Z", closedAt: null, meetingDate: null, minutesRef: null },
    tally: { inFavour: 1, against: 1, abstain: 0, ballotsCast: 2, votingMembers: 3, quorumRequired: 2 },
    whoVotedHow: voters.map((v, i) => ({ ...v, choice: (["in-favour", "against", null] as const)[i], at: null })),
    yourVote: "in-favour", youMayVote: true, result: null, rules, rulesText: ["A vote counts only if more than half take part.", "Members may vote here."],
    electronicAllowed: true, votingMembers: voters, roll: voters, rulesConfirmed: true, meetingRefusal: null, openRefusal: null, you: { isChair: false, canOpen: false, canClose: false, canRecordMeeting: false }, earlier: [],
    serverTime: "2026-12-02T10:00:00.000Z", ...over,
  };
}

const decisionState = (over: Partial<DecisionStateDto> = {}): DecisionStateDto => ({
  revisionId: 7, number: 2, revisionState: "circulated", contentHash: "ab".repeat(32), decision: null,
  basis: { ballotId: 3, kind: "electronic", meetingDate: null, inFavour: 3, against: 0, abstain: 0, votingMembers: 3, outcome: "carried", outcomeLabel: "Carried", minutesRef: null, roll: voters },
  refusals: { approved: null, "approved-as-noted": null, "revise-and-resubmit": null, "not-approved": "The ballot is still open." },
  you: { mayRecord: true, freshSignInNeeded: false, signedInAt: "2026-12-02T09:58:00.000Z" }, ...over,
});

function render(el: ReturnType<typeof h>, seed: (qc: QueryClient) => void): string {
  const qc = new QueryClient();
  seed(qc);
  return renderToString(h(QueryClientProvider, { client: qc }, el)).replace(/<!-- -->/g, "");
}

describe("the ballot panel draws", () => {
  it("an open ballot for a voter: three vote buttons, the current choice pressed, the tally and who voted how", () => {
    const html = render(h(BallotPanel, { revisionId: 7, commissionId: 1 }), (qc) => qc.setQueryData(ballotKey(7), ballotState()));
    expect(html.match(/aria-pressed="true"/g)).toHaveLength(1);
    expect(html).toContain("In favour ✓");
    expect(html).toContain("min-h-14");
    expect(html).toContain("2 of 3 voting members have voted");
    expect(html).toContain("Not voted");
    expect(html).toContain("You voted in favour.");
  });
  it("the chair's tools: close now, and the meeting form when no ballot is open", () => {
    const chairOpen = render(h(BallotPanel, { revisionId: 7, commissionId: 1 }), (qc) => qc.setQueryData(ballotKey(7), ballotState({ youMayVote: false, you: { isChair: true, canOpen: false, canClose: true, canRecordMeeting: false } })));
    expect(chairOpen).toContain("Close the ballot now");
    expect(chairOpen).toContain("the chair does not vote");
    const none = render(h(BallotPanel, { revisionId: 7, commissionId: 1 }), (qc) => qc.setQueryData(ballotKey(7), ballotState({ ballot: null, tally: null, whoVotedHow: [], yourVote: null, youMayVote: false, electronicAllowed: false, you: { isChair: true, canOpen: false, canClose: false, canRecordMeeting: true } })));
    expect(none).toContain("No vote has been held on Revision 2 yet.");
    expect(none).toContain("Record the vote taken at a meeting");
    expect(none).not.toContain("Open the ballot");
  });
  it("a closed ballot's result in words", () => {
    const html = render(h(BallotPanel, { revisionId: 7, commissionId: 1 }), (qc) => qc.setQueryData(ballotKey(7), ballotState({
      ballot: { ...ballotState().ballot!, status: "closed", closedAt: "2026-12-05T10:00:00.000Z" }, youMayVote: false,
      result: { rules, votingMembers: 3, inFavour: 2, against: 0, abstain: 1, outcome: "carried", quorumRequired: 2, ballotsCast: 3, outcomeLabel: "Carried", sentence: "Carried: 2 in favour, 0 against, 1 abstaining." },
    })));
    expect(html).toContain("Carried: 2 in favour");
    expect(html).not.toContain("vote-buttons");
  });
});

describe("the decision form", () => {
  it("says what the chair signs, with the hash, and why an outcome is not available", () => {
    const html = render(h(DecisionForm, { revisionId: 7, contentHash: "ab".repeat(32), number: 2 }), (qc) => qc.setQueryData(decisionKey(7), decisionState()));
    expect(html).toContain("You are recording, as chair, the committee&#x27;s decision on Revision 2.");
    expect(html).toContain("ab".repeat(32));
    expect(html).toContain("Not available: The ballot is still open.");
    expect(html).toContain("Carried by electronic ballot: 3 in favour");
  });
  it("asks for a fresh sign-in instead of the record button", () => {
    const html = render(h(DecisionForm, { revisionId: 7, contentHash: "ab".repeat(32), number: 2 }), (qc) => qc.setQueryData(decisionKey(7), decisionState({ you: { mayRecord: true, freshSignInNeeded: true, signedInAt: null } })));
    expect(html).toContain("E-mail me a confirmation link");
    expect(html).not.toContain("Record and sign the decision");
  });
  it("renders nothing for anyone who may not record", () => {
    expect(render(h(DecisionForm, { revisionId: 7, contentHash: "x", number: 2 }), (qc) => qc.setQueryData(decisionKey(7), decisionState({ you: { mayRecord: false, freshSignInNeeded: false, signedInAt: null } })))).toBe("");
  });
  it("the summary shows conditions as plain text", () => {
    const html = render(h(DecisionSummary, { revisionId: 7 }), (qc) => qc.setQueryData(decisionKey(7), decisionState({
      decision: { id: 1, revisionId: 7, number: 2, outcome: "approved-as-noted", outcomeLabel: "Approved as noted", conditions: ["<b>Lower</b> the rim", "Anchor the foot"], statement: "", contentHash: "ab".repeat(32), recordedByName: "Margaret Ellery", recordedAt: "2026-12-05T10:00:00.000Z", tally: null },
    })));
    expect(html).toContain("&lt;b&gt;Lower&lt;/b&gt; the rim");
    expect(html).toContain("Recorded by Margaret Ellery, chair");
  });
});
