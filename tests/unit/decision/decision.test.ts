import { describe, expect, it } from "vitest";
import { decisionRefusal, parseDecision, splitConditions, stageAfterDecision } from "@/models/decision";

describe("the decision's input", () => {
  it("splits conditions one per line, dropping blank lines", () => {
    expect(splitConditions("  Lower the rim by 5 mm \r\n\n Cut the wren badge into the foot\n")).toEqual(["Lower the rim by 5 mm", "Cut the wren badge into the foot"]);
    expect(splitConditions(["a", " b "])).toEqual(["a", "b"]);
    expect(splitConditions(7)).toBeNull();
  });
  it("needs at least one condition for approved as noted, and none otherwise", () => {
    expect(parseDecision({ outcome: "approved-as-noted", conditions: "\n" })).toMatchObject({ ok: false, errors: { conditions: expect.stringContaining("at least one") } });
    expect(parseDecision({ outcome: "not-approved", conditions: "x" })).toMatchObject({ ok: false, errors: { conditions: expect.any(String) } });
    expect(parseDecision({ outcome: "approved-as-noted", conditions: "x\ny", statement: " ok " })).toEqual({ ok: true, data: { outcome: "approved-as-noted", conditions: ["x", "y"], statement: "ok" } });
  });
});

describe("when approval is allowed", () => {
  const basis = (status: "open" | "closed" | "withdrawn" | null, outcome: "carried" | "failed" | "no-quorum" | null = null) =>
    ({ number: 2, latest: status ? { status, outcome } : null });
  it("needs a carried ballot on the revision", () => {
    expect(decisionRefusal("approved", basis("closed", "carried"))).toBeNull();
    expect(decisionRefusal("approved-as-noted", basis(null))).toMatch(/none has been held/);
    expect(decisionRefusal("approved", basis("closed", "failed"))).toMatch(/failed/);
    expect(decisionRefusal("approved", basis("closed", "no-quorum"))).toMatch(/quorum/);
  });
  it("lets the chair send a design back without a ballot, but not while one is open", () => {
    expect(decisionRefusal("revise-and-resubmit", basis(null))).toBeNull();
    expect(decisionRefusal("not-approved", basis("closed", "failed"))).toBeNull();
    expect(decisionRefusal("not-approved", basis("open"))).toMatch(/still open/);
  });
  it("moves only the stages before approval", () => {
    expect(stageAfterDecision("design-development", "approved")).toBe("approved");
    expect(stageAfterDecision("concept", "revise-and-resubmit")).toBe("design-development");
    expect(stageAfterDecision("design-development", "not-approved")).toBe("design-development");
    expect(stageAfterDecision("in-fabrication", "approved")).toBe("in-fabrication");
    expect(stageAfterDecision("on-hold", "approved")).toBe("on-hold");
  });
});
