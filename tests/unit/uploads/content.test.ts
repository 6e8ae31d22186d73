import { describe, expect, it } from "vitest";
import { MAX_FILE_BYTES } from "@/lib/uploads";
import * as f from "./fixtures";
import { expectAccepted, expectRefused } from "./helpers";

describe("size", () => {
  it("refuses an empty file", async () => {
    await expectRefused("drawing.png", new Uint8Array(0), "empty", /empty \(0 bytes\)/);
  });

  it("refuses a file one byte over 25 MB, giving its exact size", async () => {
    const big = new Uint8Array(MAX_FILE_BYTES + 1);
    big.set(await f.png(8, 8));
    await expectRefused("render.png", big, "too_large", /26,214,401 bytes, over the limit of 25 MB/);
  });

  it("accepts a file of exactly 25 MB", async () => {
    const exact = new Uint8Array(MAX_FILE_BYTES);
    exact.set(await f.png(8, 8)); // the rest is zero padding after IEND
    const ok = await expectAccepted("render.png", exact);
    expect(ok.normalized.byteLength).toBeLessThan(10_000);
  });
});

describe("type is decided by content", () => {
  it("refuses a PNG with its magic bytes altered", async () => {
    const bytes = await f.png();
    bytes[1] = 0x51; // "\x89QNG"
    await expectRefused("drawing.png", bytes, "unknown_type", /not recognised/);
  });

  it("refuses random bytes and plain text", async () => {
    await expectRefused("noise.jpg", Uint8Array.from({ length: 4096 }, (_, i) => (i * 131) & 0xff), "unknown_type");
    await expectRefused("notes.pdf", f.enc("Bowl 420 mm, three engravings"), "unknown_type");
  });

  it("refuses an SVG carrying a script", async () => {
    const svg = f.enc('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(document.cookie)</script></svg>');
    await expectRefused("font.svg", svg, "type_not_allowed", /SVG.*scripts/);
  });

  it("refuses an SVG renamed .png, with a byte-order mark and XML prolog", async () => {
    const svg = f.enc('\uFEFF  <?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>');
    await expectRefused("font.png", svg, "type_not_allowed", /SVG/);
  });

  it("refuses HTML, including UTF-16 HTML renamed .jpg", async () => {
    await expectRefused("page.html", f.enc("<!DOCTYPE html><html><body>hi</body></html>"), "type_not_allowed", /web page \(HTML\)/);
    const utf16 = new Uint8Array(Buffer.from("\uFEFF<html><script>alert(1)</script></html>", "utf16le"));
    await expectRefused("photo.jpg", utf16, "type_not_allowed", /HTML/);
  });

  it("refuses XML", async () => {
    await expectRefused("data.pdf", f.enc('<?xml version="1.0"?><order><glass/></order>'), "type_not_allowed", /XML/);
  });

  it.each([
    ["ZIP", "drawings.zip", () => f.zip()],
    ["ZIP named .pdf", "drawings.pdf", () => f.zip()],
    ["gzip", "drawing.png.gz", () => f.gzip()],
    ["7z", "drawings.7z", () => f.sevenZip()],
    ["RAR", "drawings.rar", () => f.rar()],
    ["tar", "drawings.tar", () => f.tar()],
  ])("refuses a %s archive", async (_label, name, make) => {
    await expectRefused(name, make(), "type_not_allowed", /compressed archive/);
  });

  it("refuses a Windows program named .png and a Linux program", async () => {
    await expectRefused("setup.png", f.exe(), "type_not_allowed", /is a program/);
    await expectRefused("tool.pdf", f.elf(), "type_not_allowed", /is a program/);
  });

  it("refuses image formats other than PNG, JPEG and WebP", async () => {
    await expectRefused("sketch.gif", await f.gif(), "type_not_allowed", /GIF image/);
  });
});

describe("name must agree with content", () => {
  it("refuses a PNG named .pdf", async () => {
    await expectRefused("plan.pdf", await f.png(), "name_mismatch", /named as a PDF but its content is a PNG image.*\.png/);
  });

  it("refuses a JPEG named .png", async () => {
    await expectRefused("photo.png", await f.jpeg(), "name_mismatch", /content is a JPEG image.*\.jpg/);
  });

  it("refuses a WebP named .jpg and a PDF named .webp", async () => {
    await expectRefused("render.jpg", await f.webp(), "name_mismatch", /WebP/);
    await expectRefused("render.webp", f.plainHandPdf(), "name_mismatch", /content is a PDF/);
  });

  it("refuses names with no extension or an odd one", async () => {
    await expectRefused("drawing", await f.png(), "name_mismatch", /no file extension/);
    await expectRefused("drawing.png.exe", await f.png(), "name_mismatch", /ends in “\.exe”/);
    await expectRefused(".png", await f.png(), "name_mismatch", /no file extension/);
  });
});
