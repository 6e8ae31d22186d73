// Action types and the trigger entries are those of ISO 32000-1:2008 (PDF 1.7): §12.6.3 trigger events
// (/AA, /OpenAction in the catalog, Table 28), §12.6.4 action types (/URI, /GoToR, /GoTo).
import { describe, expect, it } from "vitest";
import { PDFName, PDFString } from "pdf-lib";
import * as f from "./fixtures";
import { expectAccepted, expectRefused } from "./helpers";

const PAGE_TREE_WITH = (pageExtra: string) => [
  "<< /Type /Catalog /Pages 2 0 R >>",
  "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
  `<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] ${pageExtra} >>`,
];

describe("PDF actions that run by themselves or leave the file", () => {
  it("refuses additional actions (/AA) on a page, naming them (ISO 32000-1 §12.6.3)", async () => {
    const pdf = f.handPdf(PAGE_TREE_WITH("/AA << /O << /S /GoTo /D [3 0 R /Fit] >> >>"));
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /additional actions \(\/AA\)/);
  });

  it("refuses a link annotation with a /URI action (ISO 32000-1 §12.6.4.7)", async () => {
    const pdf = f.handPdf([...PAGE_TREE_WITH("/Annots [4 0 R]"),
      "<< /Type /Annot /Subtype /Link /Rect [0 0 100 100] /A << /S /URI /URI (http://example.test/x) >> >>"]);
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /opens a web address \(\/URI\)/);
  });

  it("refuses a remote go-to (/GoToR) action (ISO 32000-1 §12.6.4.3)", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /S /GoToR /F (other.pdf) /D [0 /Fit] >>"]);
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /opens another file \(\/GoToR\)/);
  });

  it("refuses an /OpenAction that is an action, even a plain go-to (ISO 32000-1 Table 28)", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction << /S /GoTo /D [3 0 R /Fit] >>");
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /open action \(\/OpenAction\)/);
  });

  it("refuses an /OpenAction action reached by reference", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /S /GoTo /D [3 0 R /Fit] >>"]);
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /\/OpenAction/);
  });

  it("refuses a /URI action packed in a compressed object stream", async () => {
    const pdf = await f.libPdf((doc) => {
      const action = doc.context.obj({ S: "URI", URI: PDFString.of("http://example.test/") });
      const annot = doc.context.obj({ Type: "Annot", Subtype: "Link", Rect: [0, 0, 50, 50], A: action });
      doc.getPage(0).node.set(PDFName.of("Annots"), doc.context.obj([doc.context.register(annot)]));
    }, true);
    expect(Buffer.from(pdf).includes(Buffer.from("/URI"))).toBe(false);
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /\/URI/);
  });

  it("refuses /AA spelled with #-escapes", async () => {
    const pdf = f.handPdf(PAGE_TREE_WITH("/#41A << /C << /S /GoTo /D [3 0 R /Fit] >> >>"));
    await expectRefused("drawing.pdf", pdf, "pdf_active_content", /\/AA/);
  });

  it("keeps an /OpenAction that only names the page to show (a destination, not an action)", async () => {
    const ok = await expectAccepted("drawing.pdf", f.handPdfWithCatalog("/OpenAction [3 0 R /Fit]"));
    expect(ok.pages).toBe(1);
  });

  it("keeps an internal link to another page (a /GoTo within the file)", async () => {
    const pdf = f.handPdf([...PAGE_TREE_WITH("/Annots [4 0 R]"),
      "<< /Type /Annot /Subtype /Link /Rect [0 0 100 100] /A << /S /GoTo /D [3 0 R /Fit] >> >>"]);
    await expectAccepted("drawing.pdf", pdf);
  });
});
