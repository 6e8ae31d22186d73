import { describe, expect, it } from "vitest";
import { EDIT_WINDOW_MS, describeTarget, editableUntil, mayEdit, modelPointTarget, tapTarget } from "@/models/comments";

describe("where a comment is pinned, in words", () => {
  const names = (id: number) => (id === 4 ? "West elevation" : undefined);
  it("the whole revision", () => {
    expect(describeTarget({ kind: "revision" })).toBe("on the whole revision");
  });
  it("a tap and an area on a drawing", () => {
    expect(describeTarget(tapTarget(4, 25, 40), { attachmentName: names })).toBe("on drawing “West elevation” at 25% across, 40% down");
    expect(describeTarget({ kind: "attachment", attachmentId: 4, selector: "xywh=percent:10,20,30,40" }, { attachmentName: names }))
      .toBe("on drawing “West elevation”, the area 10–40% across and 20–60% down");
    expect(describeTarget(tapTarget(9, 50, 50), { attachmentName: names })).toBe("on a drawing at 50% across, 50% down");
    // As a device may send it before the server stores the canonical form:
    expect(describeTarget({ kind: "attachment", attachmentId: 4, selector: "xywh=percent:30.12,40.70,0,0" }, { attachmentName: names })).toBe("on drawing “West elevation” at 30% across, 41% down");
  });
  it("a point on the model, in the viewer's units", () => {
    expect(describeTarget(modelPointTarget("bowl", [210, 0, 830]))).toBe("on the bowl, 830 mm up and 210 mm out from the centre");
    expect(describeTarget(modelPointTarget("foot", [0, 0, 254]), { units: "in" })).toBe("on the foot, on the centre line, 10 in up");
  });
});

describe("the edit window", () => {
  const created = new Date("2026-12-01T10:00:00Z");
  it("is ten minutes, for the author only", () => {
    expect(EDIT_WINDOW_MS).toBe(600_000);
    expect(editableUntil(created).toISOString()).toBe("2026-12-01T10:10:00.000Z");
    expect(mayEdit({ authorId: "a", createdAt: created }, "a", new Date("2026-12-01T10:09:59Z"))).toBe(true);
    expect(mayEdit({ authorId: "a", createdAt: created }, "a", new Date("2026-12-01T10:10:01Z"))).toBe(false);
    expect(mayEdit({ authorId: "a", createdAt: created }, "b", new Date("2026-12-01T10:01:00Z"))).toBe(false);
  });
});
