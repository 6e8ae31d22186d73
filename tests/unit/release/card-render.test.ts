import { describe, expect, it } from "vitest";
import { createElement as h } from "react";
import { renderToString } from "react-dom/server";
import { ReleaseCard } from "@/components/release/ReleaseCard";
import { describeEvent } from "@/models/trail/plain";

describe("release card (plain words; people's text never as HTML — OWASP ASVS 4.0.3 V5.3.3)", () => {
  it("lists what is missing, escaped", () => {
    const html = renderToString(h(ReleaseCard, { commissionId: 1, mayRelease: true, status: { ready: false, missing: ["The deposit, paid or waived", "<b>x</b>"], releasedAt: null } }));
    expect(html).toContain("The deposit, paid or waived");
    expect(html).toContain("&lt;b&gt;x&lt;/b&gt;");
    expect(html).not.toContain("Release to fabrication</button>");
  });
  it("says when it was released, and offers no button", () => {
    const html = renderToString(h(ReleaseCard, { commissionId: 1, mayRelease: true, status: { ready: true, missing: [], releasedAt: "2026-12-02T09:30:00.000Z" } }));
    expect(html.replace(/<!-- -->/g, "")).toContain("Released to fabrication on 2026-12-02 09:30 UTC");
    expect(html).not.toContain("<button");
  });
  it("shows no button to someone who may not release", () => {
    const html = renderToString(h(ReleaseCard, { commissionId: 1, mayRelease: false, status: { ready: true, missing: [], releasedAt: null } }));
    expect(html).toContain("Everything is in place");
    expect(html).not.toContain("<button");
  });
  it("the trail says it in plain words", () => {
    expect(describeEvent({ action: "released to fabrication", payload: { number: 3, contentHash: "ab".repeat(32) }, subjectType: "revision", subjectId: "9" }))
      .toBe("Released Revision 3 to fabrication (content hash abababababab…).");
  });
});
