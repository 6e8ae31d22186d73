import { describe, expect, it } from "vitest";
import { ACTIONS, can, invitableRoles, mayVote, type Action, type Actor } from "@/models/permissions/policy";

const actors: Record<string, Actor> = {
  owner: { studioRole: "owner", committeeRole: null, treasurer: false },
  designer: { studioRole: "designer", committeeRole: null, treasurer: false },
  chair: { studioRole: null, committeeRole: "chair", treasurer: false },
  member: { studioRole: null, committeeRole: "member", treasurer: false },
  treasurer: { studioRole: null, committeeRole: "member", treasurer: true },
  adviser: { studioRole: null, committeeRole: "adviser", treasurer: false },
  outsider: { studioRole: null, committeeRole: null, treasurer: false },
};

// The expected table, written out by hand from the roles of the product's design (owner ⊇ designer,
// chair ⊇ member, adviser: view and comment only, treasurer or chair: pays the deposit; owner: releases and sets the money).
const Y = true, N = false;
const expected: Record<Action, [boolean, boolean, boolean, boolean, boolean, boolean, boolean]> = {
  //                         owner designer chair member treasurer adviser outsider
  "commission.view":         [Y, Y, Y, Y, Y, Y, N],
  "commission.create":       [Y, Y, N, N, N, N, N],
  "commission.changeStage":  [Y, Y, N, N, N, N, N],
  "people.view":             [Y, Y, Y, Y, Y, Y, N],
  "people.inviteCommittee":  [Y, Y, N, N, N, N, N],
  "people.inviteAdviser":    [Y, Y, Y, N, N, N, N],
  "rules.edit":              [N, N, Y, N, N, N, N],
  "revision.viewDraft":      [Y, Y, N, N, N, N, N],
  "revision.viewCirculated": [Y, Y, Y, Y, Y, Y, N],
  "revision.draft":          [Y, Y, N, N, N, N, N],
  "revision.circulate":      [Y, Y, N, N, N, N, N],
  "attachment.upload":       [Y, Y, N, N, N, N, N],
  "comment.post":            [Y, Y, Y, Y, Y, Y, N],
  "comment.resolve":         [Y, Y, N, N, N, N, N],
  "progress.post":           [Y, Y, N, N, N, N, N],
  "ballot.open":             [N, N, Y, N, N, N, N],
  "ballot.close":            [N, N, Y, N, N, N, N],
  "ballot.vote":             [N, N, Y, Y, Y, N, N],
  "ballot.recordMeeting":    [N, N, Y, N, N, N, N],
  "decision.record":         [N, N, Y, N, N, N, N],
  "permission.record":       [N, N, Y, N, N, N, N],
  "handover.sign":           [N, N, Y, N, N, N, N],
  "release.release":         [Y, N, N, N, N, N, N],
  "money.set":               [Y, N, N, N, N, N, N],
  "condition.answer":        [Y, Y, N, N, N, N, N],
  "deposit.pay":             [N, N, Y, N, Y, N, N],
  "deposit.waive":           [Y, N, N, N, N, N, N],
  "studio.manage":           [Y, N, N, N, N, N, N],
  "trail.view":              [Y, Y, Y, Y, Y, Y, N],
  "record.export":           [Y, Y, Y, Y, Y, Y, N],
};

describe("permission policy: every role × every action", () => {
  const names = Object.keys(actors);
  it("covers every action", () => {
    expect(Object.keys(expected).sort()).toEqual([...ACTIONS].sort());
  });
  for (const action of ACTIONS) {
    names.forEach((name, i) => {
      it(`${name} ${expected[action][i] ? "may" : "may not"} ${action}`, () => {
        expect(can(actors[name], action)).toBe(expected[action][i]);
      });
    });
  }

  it("the chair votes only when the rules say so; advisers and studio never", () => {
    expect(mayVote(actors.chair, false)).toBe(false);
    expect(mayVote(actors.chair, true)).toBe(true);
    expect(mayVote(actors.member, false)).toBe(true);
    for (const n of ["owner", "designer", "adviser", "outsider"]) expect(mayVote(actors[n], true)).toBe(false);
  });

  it("studio may invite any committee role, the chair only advisers, others nobody", () => {
    expect(invitableRoles(actors.designer)).toEqual(["chair", "member", "adviser"]);
    expect(invitableRoles(actors.chair)).toEqual(["adviser"]);
    expect(invitableRoles(actors.member)).toEqual([]);
    expect(invitableRoles(actors.adviser)).toEqual([]);
  });

  it("someone on both sides (studio staff who also sits on a committee) gets the union", () => {
    const both: Actor = { studioRole: "designer", committeeRole: "chair", treasurer: false };
    expect(can(both, "revision.draft")).toBe(true);
    expect(can(both, "decision.record")).toBe(true);
  });
});
