import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { fieldErrors } from "@/models/schemas/people";
import {
  BODY_MAX, commentTextSchema, modelPointTarget, newCommentSchema, noticePreferenceSchema, readTarget, tapTarget, dragTarget,
} from "@/models/comments";

describe("a new comment", () => {
  it("trims the text and defaults to the whole revision", () => {
    expect(newCommentSchema.parse({ body: "  Could the rim be thicker?  " })).toEqual({ body: "Could the rim be thicker?", target: { kind: "revision" } });
  });
  it("keeps HTML as the plain text it is: nothing stripped, nothing escaped", () => {
    const body = `<script>alert("x")</script> <b>bold</b> & "quotes"`;
    expect(newCommentSchema.parse({ body }).body).toBe(body);
  });
  it("keeps line breaks, normalises CR LF and drops other control characters", () => {
    expect(commentTextSchema.parse({ body: "one\r\ntwo\rthree\u0000\u0007\tfour" }).body).toBe("one\ntwo\nthree\tfour");
  });
  it.each([
    [{ body: "" }, "body"],
    [{ body: "   \n  " }, "body"],
    [{ body: "x".repeat(BODY_MAX + 1) }, "body"],
    [{ body: 12 }, "body"],
    [{}, "body"],
    [{ body: "ok", target: { kind: "wall" } }, "target"],
    [{ body: "ok", target: { kind: "attachment", attachmentId: 3, selector: "xywh=percent:90,0,20,5" } }, "target"],
    [{ body: "ok", target: { kind: "attachment", attachmentId: 3, selector: "xywh=160,120,320,240" } }, "target"],
    [{ body: "ok", target: { kind: "attachment", attachmentId: -3, selector: "xywh=percent:1,1,2,2" } }, "target"],
    [{ body: "ok", target: { kind: "model", part: "lid", point: [0, 0, 800] } }, "target"],
    [{ body: "ok", target: { kind: "model", part: "bowl", point: [0, 0, 3001] } }, "target"],
    [{ body: "ok", target: { kind: "model", part: "bowl", point: [0, 0] } }, "target"],
    [{ body: "ok", target: { kind: "model", part: "bowl", point: [0, "a", 1] } }, "target"],
  ])("refuses %j, naming the field", (input, field) => {
    const r = newCommentSchema.safeParse(input);
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error))).toContain(field);
  });
  it("accepts exactly 4000 characters", () => {
    expect(newCommentSchema.safeParse({ body: "é".repeat(BODY_MAX) }).success).toBe(true);
  });
  it("accepts places on drawings and points on the model, rounding points to 0.1 mm", () => {
    expect(newCommentSchema.parse({ body: "here", target: { kind: "attachment", attachmentId: 7, selector: "xywh=percent:24,39,2,2" } }).target)
      .toEqual({ kind: "attachment", attachmentId: 7, selector: "xywh=percent:24,39,2,2" });
    expect(newCommentSchema.parse({ body: "here", target: { kind: "attachment", attachmentId: 7, selector: "xywh=percent:25.00,40.00,0,0" } }).target)
      .toEqual({ kind: "attachment", attachmentId: 7, selector: "xywh=percent:24,39,2,2" });
    expect(newCommentSchema.parse({ body: "here", target: { kind: "model", part: "foot", point: [12.345, -0.04, 80.06] } }).target)
      .toEqual({ kind: "model", part: "foot", point: [12.3, 0, 80.1] });
  });
  it("the builders always make targets the schema accepts", () => {
    const d = fc.double({ min: -1e4, max: 1e4, noNaN: true });
    fc.assert(fc.property(fc.integer({ min: 1, max: 1e9 }), d, d, d, d, (id, a, b, c, e) => {
      expect(newCommentSchema.safeParse({ body: "x", target: tapTarget(id, a, b) }).success).toBe(true);
      expect(newCommentSchema.safeParse({ body: "x", target: dragTarget(id, a, b, c, e) }).success).toBe(true);
    }));
    const p = fc.double({ min: -3000, max: 3000, noNaN: true });
    fc.assert(fc.property(fc.constantFrom("bowl", "foot", "pedestal") as fc.Arbitrary<"bowl" | "foot" | "pedestal">, p, p, p, (part, x, y, z) => {
      const t = modelPointTarget(part, [x, y, z]);
      expect(newCommentSchema.parse({ body: "x", target: t }).target).toEqual(t);
    }));
  });
  it("an unreadable stored target counts as the whole revision", () => {
    expect(readTarget({ kind: "nonsense" })).toEqual({ kind: "revision" });
    expect(readTarget(null)).toEqual({ kind: "revision" });
  });
});

describe("notice preference", () => {
  it("is immediate or digest, and says so when it is neither", () => {
    expect(noticePreferenceSchema.parse({ notices: "digest" }).notices).toBe("digest");
    const r = noticePreferenceSchema.safeParse({ notices: "weekly" });
    expect(r.success).toBe(false);
    if (!r.success) expect(fieldErrors(r.error).notices).toMatch(/daily digest/);
  });
});
