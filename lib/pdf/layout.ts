import "server-only";
import { PDFDocument, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import { toWinAnsi } from "./winansi";

/** A4 in PDF points (1/72 inch): 210 × 297 mm. */
export const A4: [number, number] = [595.28, 841.89];

export const INK = rgb(0.12, 0.12, 0.14);
export const MUTED = rgb(0.4, 0.4, 0.44);
export const GOLD = rgb(0.7, 0.58, 0.34);

export interface Style { font: PDFFont; size: number; color?: ReturnType<typeof rgb>; leading?: number }

/** Breaks one over-long word (a hash, an address) into pieces that each fit. */
function breakWord(word: string, font: PDFFont, size: number, width: number): string[] {
  const out: string[] = [];
  let piece = "";
  for (const ch of word) {
    if (piece && font.widthOfTextAtSize(piece + ch, size) > width) { out.push(piece); piece = ""; }
    piece += ch;
  }
  if (piece) out.push(piece);
  return out;
}

/**
 * Lines of at most `width` points in `font` at `size`. Breaks at spaces; a word wider than the line is cut
 * where it must be. "\n" starts a new line; blank lines are kept. The text must already be WinAnsi.
 */
export function wrapText(text: string, font: PDFFont, size: number, width: number): string[] {
  const lines: string[] = [];
  for (const para of text.split("\n")) {
    const words = para.split(/ +/).filter(Boolean);
    if (!words.length) { lines.push(""); continue; }
    let line = "";
    for (const word of words) {
      const tryLine = line ? `${line} ${word}` : word;
      if (font.widthOfTextAtSize(tryLine, size) <= width) { line = tryLine; continue; }
      if (line) lines.push(line);
      if (font.widthOfTextAtSize(word, size) <= width) { line = word; continue; }
      const pieces = breakWord(word, font, size, width);
      lines.push(...pieces.slice(0, -1));
      line = pieces[pieces.length - 1];
    }
    lines.push(line);
  }
  return lines;
}

/** Cuts a single line to fit, ending it with "…". */
export function fitLine(text: string, font: PDFFont, size: number, width: number): string {
  if (font.widthOfTextAtSize(text, size) <= width) return text;
  let t = text;
  while (t && font.widthOfTextAtSize(`${t}…`, size) > width) t = t.slice(0, -1);
  return `${t.trimEnd()}…`;
}

const leadingOf = (s: Style) => s.leading ?? s.size * 1.35;

/**
 * Draws flowing text down A4 pages: a cursor `y` from the top, new pages as the text needs them.
 * Every string is made WinAnsi before it is measured or drawn.
 */
export class Writer {
  readonly pages: PDFPage[] = [];
  page!: PDFPage;
  y = 0;
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;

  constructor(readonly doc: PDFDocument, margins = { top: 64, bottom: 72, side: 62 }) {
    this.left = margins.side;
    this.right = A4[0] - margins.side;
    this.top = A4[1] - margins.top;
    this.bottom = margins.bottom;
    this.newPage();
  }

  get width() { return this.right - this.left; }

  newPage() {
    this.page = this.doc.addPage(A4);
    this.pages.push(this.page);
    this.y = this.top;
  }

  /** Starts a new page unless `height` points still fit on this one. */
  ensure(height: number) {
    if (this.y - height < this.bottom && this.y < this.top) this.newPage();
  }

  gap(points: number) {
    this.y -= points;
  }

  /** The wrapped lines of `text` for a column `width` wide. */
  lines(text: string, style: Style, width = this.width): string[] {
    return wrapText(toWinAnsi(text), style.font, style.size, width);
  }

  height(lines: number, style: Style) {
    return lines * leadingOf(style);
  }

  /**
   * One line below the cursor (the cursor does not move). Its baseline sits `drop` points down: the font size
   * by default; pass a larger one to share the baseline of bigger text beside it.
   */
  drawLine(text: string, style: Style, x = this.left, drop = style.size) {
    this.page.drawText(toWinAnsi(text), { x, y: this.y - drop, font: style.font, size: style.size, color: style.color ?? INK });
  }

  /** Draws text flush right against `right`. */
  drawRight(text: string, style: Style, right = this.right, drop = style.size) {
    const t = toWinAnsi(text);
    this.page.drawText(t, { x: right - style.font.widthOfTextAtSize(t, style.size), y: this.y - drop, font: style.font, size: style.size, color: style.color ?? INK });
  }

  /** A wrapped paragraph from `x` (indent from the left margin), flowing across pages line by line. */
  paragraph(text: string, style: Style, opts: { indent?: number; width?: number } = {}) {
    const indent = opts.indent ?? 0;
    const lines = this.lines(text, style, opts.width ?? this.width - indent);
    for (const line of lines) {
      this.ensure(leadingOf(style));
      if (line) this.page.drawText(line, { x: this.left + indent, y: this.y - style.size, font: style.font, size: style.size, color: style.color ?? INK });
      this.y -= leadingOf(style);
    }
  }

  /** A horizontal rule across the text column at the cursor. */
  rule(color = GOLD, thickness = 0.75) {
    this.page.drawLine({ start: { x: this.left, y: this.y }, end: { x: this.right, y: this.y }, thickness, color });
  }
}

/** Writes "page N of M" (and a line naming the document) at the foot of every page. */
export function footPages(w: Writer, label: string, style: Style) {
  const total = w.pages.length;
  w.pages.forEach((page, i) => {
    const y = w.bottom - 30;
    page.drawLine({ start: { x: w.left, y: y + style.size + 6 }, end: { x: w.right, y: y + style.size + 6 }, thickness: 0.5, color: GOLD });
    const n = toWinAnsi(`page ${i + 1} of ${total}`);
    const nWidth = style.font.widthOfTextAtSize(n, style.size);
    page.drawText(n, { x: w.right - nWidth, y, font: style.font, size: style.size, color: style.color ?? MUTED });
    const left = fitLine(toWinAnsi(label), style.font, style.size, w.width - nWidth - 24);
    page.drawText(left, { x: w.left, y, font: style.font, size: style.size, color: style.color ?? MUTED });
  });
}
