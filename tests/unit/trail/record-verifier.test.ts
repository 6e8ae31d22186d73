import { createElement } from "react";
import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { RecordVerifier } from "@/components/trail/RecordVerifier";

describe("RecordVerifier", () => {
  it("renders its drop area and file button before any file is chosen", () => {
    const html = renderToString(createElement(RecordVerifier));
    expect(html).toContain("Drop a decision record here");
    expect(html).toContain("Choose a file");
    expect(html).toContain('type="file"');
    expect(html).toContain("not uploaded");
  });
});
