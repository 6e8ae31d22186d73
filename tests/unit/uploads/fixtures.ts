/** Files built in the test run: good ones with sharp and pdf-lib, hostile ones by byte surgery. */
import { crc32, deflateSync, gzipSync } from "node:zlib";
import { PDFDocument, PDFName, PDFString } from "pdf-lib";
import sharp from "sharp";

export const enc = (s: string) => new TextEncoder().encode(s);
export const cat = (...parts: Uint8Array[]) => new Uint8Array(Buffer.concat(parts));

/** Deterministic noise, so compressed images have real entropy-coded data to cut. */
function noise(width: number, height: number, channels: 3 | 4): Buffer {
  const out = Buffer.alloc(width * height * channels);
  let x = 2463534242;
  for (let i = 0; i < out.length; i++) {
    x ^= x << 13; x ^= x >>> 17; x ^= x << 5;
    out[i] = x & 0xff;
  }
  return out;
}

const raw = (w: number, h: number, channels: 3 | 4 = 3) =>
  sharp(noise(w, h, channels), { raw: { width: w, height: h, channels } });

export const png = async (w = 640, h = 400) => new Uint8Array(await raw(w, h).png().toBuffer());
export const jpeg = async (w = 640, h = 400) => new Uint8Array(await raw(w, h).jpeg({ quality: 80 }).toBuffer());
export const webp = async (w = 640, h = 400) => new Uint8Array(await raw(w, h).webp({ quality: 80 }).toBuffer());
export const gif = async () => new Uint8Array(await raw(16, 16).gif().toBuffer());

/** A JPEG whose EXIF says "rotate 90° clockwise to view", with a copyright line that must not survive. */
export const orientedJpeg = async () =>
  new Uint8Array(
    await raw(300, 100)
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExifMerge({ IFD0: { Copyright: "Secret Studio Archive" } })
      .toBuffer(),
  );

export function pngChunk(type: string, data: Uint8Array): Uint8Array {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, "latin1");
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, "latin1"), data])), 0);
  return cat(head, data, crc);
}

export const PNG_SIGNATURE = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** A well-formed PNG header claiming width × height, with a tiny compressed body. */
export function pngClaiming(width: number, height: number): Uint8Array {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 0; // greyscale
  return cat(PNG_SIGNATURE, pngChunk("IHDR", ihdr), pngChunk("IDAT", deflateSync(Buffer.alloc(width + 1))), pngChunk("IEND", new Uint8Array(0)));
}

/** Inserts a chunk straight after IHDR. */
export function withChunk(file: Uint8Array, chunk: Uint8Array): Uint8Array {
  const afterIhdr = 8 + 12 + 13;
  return cat(file.subarray(0, afterIhdr), chunk, file.subarray(afterIhdr));
}

/** A minimal, valid ZIP holding one stored file. */
export function zip(name = "inside.txt", body = enc("hello")): Uint8Array {
  const n = Buffer.from(name);
  const crc = crc32(body);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(20, 4);
  local.writeUInt32LE(crc, 14);
  local.writeUInt32LE(body.length, 18);
  local.writeUInt32LE(body.length, 22);
  local.writeUInt16LE(n.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(20, 6);
  central.writeUInt32LE(crc, 16);
  central.writeUInt32LE(body.length, 20);
  central.writeUInt32LE(body.length, 24);
  central.writeUInt16LE(n.length, 28);
  const cdOffset = local.length + n.length + body.length;
  const eocd = Buffer.alloc(22);
  eocd.writeUInt32LE(0x06054b50, 0);
  eocd.writeUInt16LE(1, 8);
  eocd.writeUInt16LE(1, 10);
  eocd.writeUInt32LE(central.length + n.length, 12);
  eocd.writeUInt32LE(cdOffset, 16);
  return cat(local, n, body, central, n, eocd);
}

/** A ZIP whose offsets assume it starts `at` bytes into a file, as real polyglots do. */
export function zipAt(at: number, comment = ""): Uint8Array {
  const z = Buffer.from(zip());
  const eocd = z.length - 22;
  const central = z.readUInt32LE(eocd + 16);
  z.writeUInt32LE(central + at, eocd + 16);
  z.writeUInt32LE(z.readUInt32LE(central + 42) + at, central + 42);
  z.writeUInt16LE(comment.length, eocd + 20);
  return cat(z, enc(comment));
}

export const zipAfter = (prefix: Uint8Array, comment = "") => cat(prefix, zipAt(prefix.length, comment));

export const gzip = () => new Uint8Array(gzipSync(Buffer.from("a drawing, honestly")));
export const sevenZip = () => cat(new Uint8Array([0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c, 0, 4]), new Uint8Array(24));
export const rar = () => cat(new Uint8Array([0x52, 0x61, 0x72, 0x21, 0x1a, 0x07, 0x01, 0x00]), new Uint8Array(24));

export function tar(): Uint8Array {
  const block = Buffer.alloc(1024);
  block.write("drawing.png", 0);
  block.write("0000644\0", 100);
  block.write("00000000000\0", 124);
  block.write("ustar\u000000", 257, "latin1");
  block.fill(0x20, 148, 156);
  let sum = 0;
  for (let i = 0; i < 512; i++) sum += block[i]!;
  block.write(sum.toString(8).padStart(6, "0") + "\0 ", 148, "latin1");
  return new Uint8Array(block);
}

/** The start of a Windows program: "MZ", a DOS stub and a PE header. */
export function exe(): Uint8Array {
  const b = Buffer.alloc(256);
  b.write("MZ", 0, "latin1");
  b.writeUInt32LE(0x80, 0x3c);
  b.write("This program cannot be run in DOS mode.", 0x40, "latin1");
  b.write("PE\0\0", 0x80, "latin1");
  b.writeUInt16LE(0x14c, 0x84);
  return new Uint8Array(b);
}

export const elf = () => cat(new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), new Uint8Array(56));

/**
 * Builds a PDF by hand from object bodies (object 1 must be the catalog), with a correct
 * cross-reference table. `trailerExtra` adds trailer entries, `tail` replaces the ending.
 */
export function handPdf(objects: string[], opts: { trailerExtra?: string; tail?: string } = {}): Uint8Array {
  let out = "%PDF-1.7\n%\xe2\xe3\xcf\xd3\n";
  const offsets: number[] = [];
  objects.forEach((body, i) => {
    offsets.push(out.length);
    out += `${i + 1} 0 obj\n${body}\nendobj\n`;
  });
  const xref = out.length;
  out += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const offset of offsets) out += `${String(offset).padStart(10, "0")} 00000 n \n`;
  out += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R ${opts.trailerExtra ?? ""}>>\n`;
  out += opts.tail ?? `startxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(out, "latin1"));
}

const DRAWING = "72 72 m 523 770 l 4 w S";
const PAGE_TREE = [
  "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
  "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Contents 4 0 R >>",
  `<< /Length ${DRAWING.length} >>\nstream\n${DRAWING}\nendstream`,
];

/** One A4 page, nothing else. */
export const plainHandPdf = () => handPdf(["<< /Type /Catalog /Pages 2 0 R >>", ...PAGE_TREE]);

/** One page and a catalog entry `extra` (e.g. an OpenAction). */
export const handPdfWithCatalog = (extra: string, more: string[] = []) =>
  handPdf([`<< /Type /Catalog /Pages 2 0 R ${extra} >>`, ...PAGE_TREE, ...more]);

/** A two-page PDF from pdf-lib, written with compressed object streams (its default). */
export async function libPdf(edit?: (doc: PDFDocument) => Promise<void> | void, useObjectStreams = true) {
  const doc = await PDFDocument.create();
  doc.addPage([595, 842]).drawText("Font, elevation", { x: 72, y: 720, size: 24 });
  doc.addPage([842, 595]).drawText("Font, plan", { x: 72, y: 500, size: 24 });
  await edit?.(doc);
  return doc.save({ useObjectStreams });
}

/** Adds a document-open JavaScript action through pdf-lib's low-level API. */
export function addOpenScript(doc: PDFDocument) {
  const action = doc.context.obj({ Type: "Action", S: "JavaScript", JS: PDFString.of("app.alert('hi')") });
  doc.catalog.set(PDFName.of("OpenAction"), doc.context.register(action));
}
