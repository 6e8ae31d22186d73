import { inflateSync } from "node:zlib";
import { PDFArray, PDFDocument, PDFName, PDFRawStream, type PDFObject } from "pdf-lib";

// Windows-1252 bytes 0x80–0x9F as Unicode (the rest of the range is Latin-1).
const CP1252_HIGH = "€\u0081‚ƒ„…†‡ˆ‰Š‹Œ\u008dŽ\u008f\u0090‘’“”•–—˜™š›œ\u009džŸ";
const cp1252 = (bytes: Buffer) => Array.from(bytes, (b) => (b >= 0x80 && b <= 0x9f ? CP1252_HIGH[b - 0x80] : String.fromCharCode(b))).join("");

function streamBytes(doc: PDFDocument, obj: PDFObject | undefined): Buffer[] {
  if (obj instanceof PDFArray) return obj.asArray().flatMap((o) => streamBytes(doc, doc.context.lookup(o)));
  if (!(obj instanceof PDFRawStream)) return [];
  const raw = Buffer.from(obj.contents);
  return [obj.dict.get(PDFName.of("Filter")) === PDFName.of("FlateDecode") ? inflateSync(raw) : raw];
}

/**
 * The text each page shows, one string a page, lines joined by "\n". Reads the page content streams
 * (inflating them) and decodes the strings shown with Tj, which is how pdf-lib writes standard-font text.
 */
export async function pdfPageTexts(bytes: Uint8Array): Promise<string[]> {
  const doc = await PDFDocument.load(bytes);
  return doc.getPages().map((page) => {
    const ops = streamBytes(doc, page.node.Contents()).map((b) => b.toString("latin1")).join("\n");
    const shown = [...ops.matchAll(/<([0-9A-Fa-f]*)>\s*Tj/g)].map((m) => cp1252(Buffer.from(m[1], "hex")));
    return shown.join("\n");
  });
}
