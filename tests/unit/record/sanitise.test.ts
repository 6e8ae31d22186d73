import { beforeAll, describe, expect, it } from "vitest";
import { PDFDocument, StandardFonts, type PDFFont } from "pdf-lib";
import { isWinAnsi, toWinAnsi, UNKNOWN } from "@/lib/pdf/winansi";

// The WinAnsi set is Windows-1252 (Microsoft's code page 1252 table): printable ASCII, U+00A0–U+00FF and
// the 27 characters at bytes 0x80–0x9F. pdf-lib's standard fonts refuse anything else, so they are the
// reference the sanitiser is checked against here.
let fonts: PDFFont[];
beforeAll(async () => {
  const doc = await PDFDocument.create();
  fonts = await Promise.all([StandardFonts.Helvetica, StandardFonts.HelveticaBold, StandardFonts.TimesRoman].map((f) => doc.embedFont(f)));
});

const encodable = (font: PDFFont, text: string) => {
  try { font.encodeText(text); font.widthOfTextAtSize(text, 10); return true; } catch { return false; }
};

describe("toWinAnsi", () => {
  it("keeps WinAnsi text exactly, curly quotes, dashes, accents and signs included", () => {
    const text = "“St Wenna’s” – the font’s bowl — 150 mm × 2, ±2 mm, 12°, ½ litre, café, Straße, €40, naïve…";
    expect(toWinAnsi(text)).toBe(text);
  });

  it("maps the usual symbols to close ASCII", () => {
    expect(toWinAnsi("depth ≤ 150 mm")).toBe("depth <= 150 mm");
    expect(toWinAnsi("≥ 20 litres, ≠ 0")).toBe(">= 20 litres, != 0");
    expect(toWinAnsi("angle θ = 12°")).toBe("angle theta = 12°");
    expect(toWinAnsi("−3 mm")).toBe("-3 mm");
    expect(toWinAnsi("a → b ⇒ c")).toBe("a -> b => c");
    expect(toWinAnsi("Δh ≈ 1 mm, π r²")).toBe("Deltah ~ 1 mm, pi r²");
    expect(toWinAnsi("5′ 3″")).toBe("5' 3\"");
    expect(toWinAnsi("✓ agreed")).toBe("(yes) agreed");
  });

  it("drops accents WinAnsi lacks and decomposes compatibility characters", () => {
    expect(toWinAnsi("Dvořák, Łódź, Erdős")).toBe("Dvorák, Lódz, Erdos");
    expect(toWinAnsi("ﬁne ⅓ ①")).toBe("fine 1/3 1");
    expect(toWinAnsi("ＡＢＣ")).toBe("ABC");
  });

  it("turns odd spaces into spaces, keeps line breaks, and removes invisible characters", () => {
    expect(toWinAnsi("a\tb\u2009c\u202fd")).toBe("a b c d");
    expect(toWinAnsi("one\r\ntwo\rthree\u2028four")).toBe("one\ntwo\nthree\nfour");
    expect(toWinAnsi("in\u200bvisible\ufeff soft\u00adhyphen\u0007")).toBe("invisible softhyphen");
    expect(toWinAnsi("e\u0301")).toBe("é"); // composed first: WinAnsi has é
    expect(toWinAnsi("q\u0301")).toBe("q"); // no composed form: the accent is dropped
  });

  it("writes ? for what has no equivalent: other scripts, emoji, lone surrogates", () => {
    expect(toWinAnsi("Церковь")).toBe(UNKNOWN.repeat(7));
    expect(toWinAnsi("font 🙂")).toBe(`font ${UNKNOWN}`);
    expect(toWinAnsi("x\ud800y")).toBe(`x${UNKNOWN}y`);
  });

  it("its output can always be drawn by Helvetica, Helvetica-Bold and Times-Roman (every BMP character and some beyond)", () => {
    const all: string[] = [];
    for (let c = 0; c <= 0xffff; c++) all.push(String.fromCharCode(c));
    all.push("🙂", "𝔸", "😀‍🔥", "\u{1F1EC}\u{1F1E7}");
    const out = toWinAnsi(all.join(""));
    for (const font of fonts) expect(encodable(font, out.replace(/\n/g, ""))).toBe(true);
  });

  it("agrees with pdf-lib on which characters are WinAnsi", () => {
    const mismatches: number[] = [];
    for (let c = 0; c <= 0xffff; c++) {
      const ch = String.fromCharCode(c);
      if (isWinAnsi(ch) !== encodable(fonts[0], ch)) mismatches.push(c);
    }
    expect(mismatches).toEqual([]);
  });
});
