import { describe, expect, it } from "vitest";
import { createElement as h } from "react";
import { renderToString } from "react-dom/server";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { CommentsPanel } from "@/components/comments/CommentsPanel";
import { ImagePins } from "@/components/comments/ImagePins";
import { NoticePreference } from "@/components/comments/NoticePreference";
import { commentsKey } from "@/components/comments/api";
import { threadModelPins } from "@/components/comments/use-comment-threads";
import { modelPointTarget, tapTarget, type CommentsDto, type ThreadDto } from "@/models/comments";
import type { AttachmentDto } from "@/lib/dal/revisions-read";

const author = { id: "u1", name: "David Osei", role: "member", roleLabel: "Committee member" };
const base = { author, createdAt: "2026-12-01T10:00:00.000Z", editedAt: null, editableUntil: null, resolved: false, resolvedAt: null, resolvedBy: null, replies: [] };
const threads: ThreadDto[] = [
  { ...base, id: 1, number: 1, body: `<script>alert("x")</script> too thin?`, target: tapTarget(7, 25, 40), targetLabel: "on drawing “West elevation” at 25% across, 40% down",
    editableUntil: "2999-01-01T00:00:00.000Z",
    replies: [{ id: 4, body: "We can go to 15 mm.", author: { id: "u2", name: "Elias Brandt", role: "designer", roleLabel: "Designer" }, createdAt: "2026-12-01T11:00:00.000Z", editedAt: null, editableUntil: null }] },
  { ...base, id: 2, number: 2, body: "Proportions are good.", target: { kind: "revision" }, targetLabel: "on the whole revision", resolved: true, resolvedAt: "2026-12-02T09:00:00.000Z", resolvedBy: "Elias Brandt" },
  { ...base, id: 3, number: 3, body: "Chip risk.", target: modelPointTarget("bowl", [210, 0, 830]), targetLabel: "on the bowl, 830 mm up and 210 mm out from the centre" },
  { ...base, id: 5, number: 4, body: "Area here", target: { kind: "attachment", attachmentId: 7, selector: "xywh=percent:10,20,30,40" }, targetLabel: "area" },
  { ...base, id: 6, number: 5, body: "Other drawing", target: tapTarget(8, 50, 50), targetLabel: "other" },
];
const dto = (over: Partial<CommentsDto> = {}): CommentsDto => ({ revisionId: 9, threads, you: { canComment: true, canResolve: false, notices: "immediate" }, serverTime: new Date().toISOString(), ...over });
const drawing = { id: 7, name: "west.png", caption: "West elevation" } as AttachmentDto;

function render(el: ReturnType<typeof h>, data?: CommentsDto): string {
  const qc = new QueryClient();
  if (data) qc.setQueryData(commentsKey(9), data);
  return renderToString(h(QueryClientProvider, { client: qc }, el)).replace(/<!-- -->/g, "");
}
const panel = (over: Record<string, unknown> = {}, data = dto()) =>
  render(h(CommentsPanel, { revisionId: 9, attachments: [drawing], canComment: true, canResolve: false, ...over }), data);

describe("the comments panel draws", () => {
  it("people's words as text, never as HTML", () => {
    const html = panel();
    expect(html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; too thin?");
    expect(html).not.toContain("<script>");
  });
  it("open threads with replies and a reply button; resolved ones kept, folded, with who resolved them", () => {
    const html = panel();
    expect(html).toContain("4 open threads, 1 resolved");
    expect(html).toContain("We can go to 15 mm.");
    expect(html).toContain(">Reply<");
    expect(html).toContain("Resolved by Elias Brandt");
    expect(html).toContain("Show thread");
    expect(html).not.toContain(">Proportions are good.</p>"); // folded: only a one-line summary
    expect(html).toContain('id="comment-2"');
  });
  it("an edit button on one's own comment while the window is open", () => {
    expect(panel()).toMatch(/Edit <span[^>]*>\(\d+ min left\)/);
  });
  it("where the next comment goes, in words, with a way back to the whole revision", () => {
    expect(panel()).toContain("on the whole revision");
    const pinned = panel({ pendingTarget: tapTarget(7, 25, 40), onClearTarget: () => {} });
    expect(pinned).toContain("on drawing “West elevation” at 25% across, 40% down");
    expect(pinned).toContain("Use the whole revision instead");
    expect(panel({ pendingTarget: modelPointTarget("bowl", [0, 0, 254]), units: "in" })).toContain("on the bowl, on the centre line, 10 in up");
  });
  it("resolve buttons for the studio only, and no composer without the right to comment", () => {
    expect(panel()).not.toContain("Mark resolved");
    expect(panel({ canResolve: true }, dto({ you: { canComment: true, canResolve: true, notices: "immediate" } }))).toContain("Mark resolved");
    const readOnly = panel({ canComment: false });
    expect(readOnly).not.toContain("Post comment");
    expect(readOnly).not.toContain(">Reply<");
  });
  it("the notice choice and the open-format download", () => {
    const html = panel({}, dto({ you: { canComment: true, canResolve: false, notices: "digest" } }));
    expect(html).toMatch(/checked="" value="digest"/);
    expect(html).toContain('href="/api/revisions/9/annotations"');
    expect(render(h(NoticePreference, { initial: "immediate" }))).toMatch(/checked="" value="immediate"/);
  });
});

describe("pins", () => {
  it("on a picture: numbered, at the box's centre in per cents, 44 px to tap, only this picture's", () => {
    const html = render(h(ImagePins, { attachmentId: 7, threads, onOpen: () => {} }));
    expect(html.match(/data-testid="image-pin"/g)).toHaveLength(2);
    expect(html).toContain("left:25%;top:40%");
    expect(html).toContain("left:25%;top:40%;transform:translate(-50%, -50%) scale(calc(1 / var(--viewer-scale, 1)))");
    expect(html).toContain("h-11 w-11");
    expect(html).toContain("left:10%;top:20%;width:30%;height:40%"); // the marked area
    expect(html).not.toContain("Other drawing");
    expect(html).toContain('aria-label="Comment 1 by David Osei: &lt;script&gt;');
  });
  it("on the model: open threads pinned to a point, numbered as in the list", () => {
    expect(threadModelPins(threads)).toEqual([{ id: "3", part: "bowl", point: [210, 0, 830], label: "3" }]);
  });
});
