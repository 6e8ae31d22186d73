import { beforeAll, describe, expect, it } from "vitest";
import { PDFDocument, StandardFonts, type PDFFont } from "pdf-lib";
import { fitLine, wrapText } from "@/lib/pdf/layout";
import { renderDecisionRecordPdf } from "@/lib/record-pdf";
import { pdfPageTexts } from "../../pdf-text";
import { recordFixture } from "./fixture";

let serif: PDFFont;
beforeAll(async () => { serif = await (await PDFDocument.create()).embedFont(StandardFonts.TimesRoman); });

describe("wrapText", () => {
  const text = "The committee approves the revision on the conditions below and asks to see the final drawing of the foot at its January meeting.";

  it("keeps every line within the width and every word, in order", () => {
    for (const width of [60, 120, 300]) {
      const lines = wrapText(text, serif, 11, width);
      for (const l of lines) expect(serif.widthOfTextAtSize(l, 11)).toBeLessThanOrEqual(width);
      expect(lines.join(" ")).toBe(text);
    }
  });

  it("cuts a word wider than the line (a hash) and keeps blank lines", () => {
    const hash = "ab".repeat(32);
    const lines = wrapText(`Hash:\n\n${hash}`, serif, 11, 100);
    expect(lines.slice(0, 2)).toEqual(["Hash:", ""]);
    expect(lines.slice(2).join("")).toBe(hash);
    for (const l of lines) expect(serif.widthOfTextAtSize(l, 11)).toBeLessThanOrEqual(100);
  });

  it("fitLine ends a line that is too long with an ellipsis", () => {
    expect(fitLine("short", serif, 10, 200)).toBe("short");
    const cut = fitLine(text, serif, 10, 150);
    expect(cut.endsWith("…")).toBe(true);
    expect(serif.widthOfTextAtSize(cut, 10)).toBeLessThanOrEqual(150);
  });
});

describe("renderDecisionRecordPdf", () => {
  it("writes an A4 record, numbered 'page N of M', ending with the final hash and how to check it", async () => {
    const input = recordFixture(60);
    const bytes = await renderDecisionRecordPdf(input, { verifyUrl: "https://placet.example/verify" });
    expect(Buffer.from(bytes.slice(0, 5)).toString("latin1")).toBe("%PDF-");
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBeGreaterThan(1);
    for (const p of doc.getPages()) expect(p.getSize()).toEqual({ width: 595.28, height: 841.89 });
    const pages = await pdfPageTexts(bytes);
    pages.forEach((t, i) => expect(t).toContain(`page ${i + 1} of ${pages.length}`));
    const all = pages.join(" ").replace(/\n/g, " "); // lines joined, so wrapped sentences read whole
    expect(pages[0]).toContain("Decision record");
    for (const s of ["Baptismal font for the west end", "Parochial church council of St Wenna’s, Tregony", "Hollowmere Glass", "Approved"]) expect(pages[0]).toContain(s);
    expect(all).toContain(input.revisions[1].contentHash);
    expect(all).toContain("Revision 2: Approved as noted");
    expect(all).toContain("Lower the rim by 30 mm");
    expect(all).toContain("<= ±2 mm"); // sanitised from "≤ ±2 mm"
    expect(all).toContain("carried, with 4 in favour, 1 against and 0 abstaining, of 5 voting members");
    expect(all).toContain("by Margaret Ellery on 2026-11-20 19:30 UTC");
    expect(all).toContain("2026-11-02 09:00:00 UTC");
    expect(all).toContain(`${input.trail[59].hash.slice(0, 12)}…`);
    const last = pages[pages.length - 1];
    expect(last).toContain("Final hash");
    expect(last).toContain(input.finalHash);
    expect(last).toContain("Record format: placet-trail/1");
    expect(last.replace(/\n/g, " ")).toContain("Download the JSON record from the trail page and check it at /verify, or with any SHA-256 tool following the format described in the record; the final hash must match the one printed here.");
  });

  it("says plainly when nothing has been circulated or decided, and prints 64 zeros for an empty trail", async () => {
    const input = { ...recordFixture(0), revisions: [], decisions: [] };
    const all = (await pdfPageTexts(await renderDecisionRecordPdf(input))).join("\n");
    expect(all).toContain("No revision has been circulated to the committee yet.");
    expect(all).toContain("No decision has been recorded on this commission yet.");
    expect(all).toContain("0".repeat(64));
    expect(all).toContain("page 1 of 1");
  });

  it("carries long statements and many conditions over pages without losing a word", async () => {
    const base = recordFixture(3);
    const statement = Array.from({ length: 120 }, (_, i) => `Sentence ${i + 1} of the statement, on the font’s lead lining and drainage.`).join(" ");
    const conditions = Array.from({ length: 40 }, (_, i) => `Condition ${i + 1}: ${"the stone is to be honed, not polished, ".repeat(4).trim()}`);
    const input = { ...base, decisions: [{ ...base.decisions[0], statement, conditions }] };
    const pages = await pdfPageTexts(await renderDecisionRecordPdf(input));
    expect(pages.length).toBeGreaterThan(2);
    const words = pages.join(" ").replace(/\s+/g, " ");
    expect(words).toContain("Sentence 120 of the statement");
    expect(words).toContain("Condition 40:");
    expect(words).toContain("40.");
  });
});
