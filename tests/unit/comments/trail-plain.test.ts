import { describe, expect, it } from "vitest";
import { describeEvent } from "@/models/trail/plain";

const ev = (action: "comment posted" | "comment edited" | "comment resolved", payload: Record<string, unknown>) =>
  describeEvent({ action, payload, subjectType: "comment", subjectId: "5" });

describe("comment events in plain words: who said what", () => {
  it("a new thread, with where it is pinned and the words", () => {
    expect(ev("comment posted", { number: 2, parentId: null, target: { kind: "attachment" }, body: "Rim too thin?" })).toBe("Commented on Revision 2 (on a drawing): “Rim too thin?”");
    expect(ev("comment posted", { number: 2, parentId: null, target: { kind: "model", part: "bowl" }, body: "Chip risk" })).toBe("Commented on Revision 2 (on the bowl): “Chip risk”");
    expect(ev("comment posted", { number: 2, parentId: null, target: { kind: "revision" }, body: "Good" })).toBe("Commented on Revision 2: “Good”");
  });
  it("a reply, and long words cut to a line", () => {
    expect(ev("comment posted", { number: 3, parentId: 4, body: "Yes" })).toBe("Replied to a comment on Revision 3: “Yes”");
    const long = ev("comment posted", { number: 3, parentId: 4, body: "word ".repeat(100) });
    expect(long.length).toBeLessThan(220);
    expect(long.endsWith("…”")).toBe(true);
  });
  it("an edit says what it reads now; older events without words still read", () => {
    expect(ev("comment edited", { number: 2, from: "a", to: "b\nc" })).toBe("Edited a comment on Revision 2, now reading “b c”");
    expect(ev("comment posted", { number: 1 })).toBe("Commented on Revision 1.");
    expect(ev("comment resolved", { number: 1 })).toBe("Marked a comment thread on Revision 1 resolved.");
  });
});
