import { describe, expect, it } from "vitest";
import * as f from "./fixtures";
import { expectAccepted, expectRefused } from "./helpers";

describe("PDF checks", () => {
  it("refuses a PDF missing %%EOF", async () => {
    const tail = "startxref\n0\n";
    await expectRefused("spec.pdf", f.handPdf(["<< /Type /Catalog >>"], { tail }), "pdf_malformed", /end-of-file marker/);
  });

  it("refuses a PDF whose %%EOF is more than 1 KiB from the end", async () => {
    const bytes = f.cat(f.plainHandPdf(), f.enc(`%${"x".repeat(2000)}\n`));
    await expectRefused("spec.pdf", bytes, "pdf_malformed", /end-of-file/);
  });

  it("refuses a PDF with data after %%EOF", async () => {
    await expectRefused("spec.pdf", f.cat(f.plainHandPdf(), f.enc("<script>x</script>")), "polyglot");
  });

  it("refuses a PDF that is also a ZIP, even with %%EOF in the ZIP comment", async () => {
    await expectRefused("spec.pdf", f.zipAfter(f.plainHandPdf(), "\n%%EOF\n"), "polyglot", /ZIP/);
  });

  it("refuses a PDF with a bad version header", async () => {
    const bytes = f.plainHandPdf();
    bytes.set(f.enc("%PDF-x.y"), 0);
    await expectRefused("spec.pdf", bytes, "pdf_malformed", /does not begin the way a PDF must/);
  });

  it("refuses a PDF with an open-action /JavaScript", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /Type /Action /S /JavaScript /JS (app.alert(1)) >>"]);
    await expectRefused("spec.pdf", pdf, "pdf_active_content", /contains a script/);
  });

  it("refuses /JS spelled with #-escapes", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /S /J#61vaScript /J#53 (app.alert(1)) >>"]);
    await expectRefused("spec.pdf", pdf, "pdf_active_content", /script/);
  });

  it("refuses a script hidden in a compressed object stream", async () => {
    const pdf = await f.libPdf(f.addOpenScript, true);
    expect(Buffer.from(pdf).includes(Buffer.from("/JavaScript"))).toBe(false); // not visible in the raw bytes
    await expectRefused("spec.pdf", pdf, "pdf_active_content", /script/);
  });

  it("refuses a /Launch action", async () => {
    const pdf = f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /S /Launch /F (cmd.exe) >>"]);
    await expectRefused("spec.pdf", pdf, "pdf_active_content", /starts other programs/);
  });

  it("refuses an embedded file", async () => {
    const pdf = await f.libPdf((doc) => doc.attach(f.enc("MZ payload"), "readme.exe", { mimeType: "application/octet-stream" }));
    await expectRefused("spec.pdf", pdf, "pdf_active_content", /files hidden inside it/);
  });

  it("refuses a password-protected PDF", async () => {
    const pdf = f.handPdf(
      ["<< /Type /Catalog /Pages 2 0 R >>", "<< /Type /Pages /Kids [] /Count 0 >>", "<< /Filter /Standard /V 1 /R 2 /O (x) /U (y) /P -4 >>"],
      { trailerExtra: "/Encrypt 3 0 R " },
    );
    await expectRefused("spec.pdf", pdf, "pdf_encrypted", /password-protected/);
  });

  it("refuses a PDF with no pages", async () => {
    const pdf = f.handPdf(["<< /Type /Catalog /Pages 2 0 R >>", "<< /Type /Pages /Kids [] /Count 0 >>"]);
    await expectRefused("spec.pdf", pdf, "pdf_malformed", /no pages/);
  });

  it("does not mistake a stream's bytes for active content", async () => {
    const text = "/JS /Launch /JavaScript";
    const pdf = f.handPdfWithCatalog("", [`<< /Length ${text.length} >>\nstream\n${text}\nendstream`]);
    const ok = await expectAccepted("spec.pdf", pdf);
    expect(ok.pages).toBe(1);
  });

  it("checks a PDF full of unterminated stream keywords in linear time", async () => {
    const pdf = f.handPdfWithCatalog("", [`(${"stream\n".repeat(200_000)})`]);
    const started = Date.now();
    await expectAccepted("spec.pdf", pdf);
    expect(Date.now() - started).toBeLessThan(3000);
  });
});
