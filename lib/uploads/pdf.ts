import "server-only";
import { PDFArray, PDFDict, PDFDocument, PDFName, PDFStream, type PDFObject } from "pdf-lib";
import { hasZipDirectory } from "./structure";
import type { Problem } from "./types";

/** PDF names that run code, start programs, carry hidden files or send data. */
const ACTIVE: Record<string, string> = {
  JavaScript: "a script",
  JS: "a script",
  Launch: "an action that starts other programs",
  EmbeddedFile: "files hidden inside it",
  EmbeddedFiles: "files hidden inside it",
  RichMedia: "embedded media content",
  XFA: "an interactive XFA form",
  SubmitForm: "a form that sends data elsewhere",
  ImportData: "a form that loads outside data",
  GoToE: "a link into a hidden embedded file",
  AA: "additional actions (/AA) that run by themselves when a page or field is opened or closed",
  URI: "a link action that opens a web address (/URI)",
  GoToR: "an action that opens another file (/GoToR)",
};

const OPEN_ACTION = "an open action (/OpenAction) that runs an action as soon as the file is opened";

const WHITESPACE = new Set([0x00, 0x09, 0x0a, 0x0c, 0x0d, 0x20]);

/** `#xx` escapes decoded (either case, repeatedly) so `/J#61vaScript` cannot slip through. */
function decodeName(name: string): string {
  let out = name;
  for (let i = 0; i < 3 && out.includes("#"); i++) {
    out = out.replace(/#([0-9a-f]{2})/giu, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
  }
  return out;
}

/** The text with stream bodies cut out, in one linear pass (no backtracking on hostile input). */
function withoutStreams(text: string): string {
  const start = /\bstream(?:\r\n|\n|\r)/gu;
  let out = "";
  let from = 0;
  for (let m = start.exec(text); m; m = start.exec(text)) {
    const end = text.indexOf("endstream", start.lastIndex);
    if (end < 0) break;
    out += text.slice(from, m.index) + " ";
    from = end + "endstream".length;
    start.lastIndex = from;
  }
  return out + text.slice(from);
}

/** Active-content names in the file's text outside streams (catches what a lenient parser skips). */
function scanRaw(text: string): string | null {
  for (const match of withoutStreams(text).matchAll(/\/([^\x00\t\n\f\r \/<>[\]()%{}]+)/gu)) {
    const label = ACTIVE[decodeName(match[1]!)];
    if (label) return label;
  }
  return null;
}

/** Active-content names in every parsed object, including those packed in object streams. */
function scanObjects(doc: PDFDocument): string | null {
  const check = (obj: PDFObject | undefined, depth: number): string | null => {
    if (!obj || depth > 64) return null;
    if (obj instanceof PDFName) return ACTIVE[decodeName(obj.asString().slice(1))] ?? null;
    if (obj instanceof PDFStream) return check(obj.dict, depth + 1);
    if (obj instanceof PDFArray) {
      for (const item of obj.asArray()) {
        const found = check(item, depth + 1);
        if (found) return found;
      }
    }
    if (obj instanceof PDFDict) {
      for (const [key, value] of obj.entries()) {
        const found = check(key, depth + 1) ?? check(value, depth + 1);
        if (found) return found;
      }
    }
    return null;
  };
  for (const [, obj] of doc.context.enumerateIndirectObjects()) {
    const found = check(obj, 0);
    if (found) return found;
  }
  return check(doc.context.trailerInfo.Root, 0) ?? openAction(doc);
}

/** An /OpenAction may name a page to show (an array); a dictionary is an action, and is refused. */
function openAction(doc: PDFDocument): string | null {
  let value: PDFObject | undefined;
  try {
    value = doc.catalog.lookup(PDFName.of("OpenAction"));
  } catch {
    return OPEN_ACTION;
  }
  return value === undefined || value instanceof PDFArray ? null : OPEN_ACTION;
}

/**
 * A PDF is kept byte for byte, so it must be plainly one: `%PDF-` first, `%%EOF` within the
 * last KiB with nothing after it but whitespace, not also a ZIP, not encrypted, at least one
 * page, and no scripts, launch actions, embedded files, additional actions (/AA), web-address or
 * other-file actions (/URI, /GoToR), nor an /OpenAction that runs an action.
 */
export async function checkPdf(bytes: Uint8Array, shown: string): Promise<{ problem: NonNullable<Problem> } | { pages: number }> {
  const fail = (code: NonNullable<Problem>["code"], message: string) => ({ problem: { code, message } });
  const text = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString("latin1");
  if (!/^%PDF-[12]\.\d/u.test(text)) {
    return fail("pdf_malformed", `${shown} does not begin the way a PDF must, so it cannot be read as one. Export it as a PDF again.`);
  }
  const eof = text.lastIndexOf("%%EOF");
  if (eof < 0 || eof < text.length - 1024) {
    return fail("pdf_malformed", `${shown} is incomplete: it is missing the end-of-file marker every PDF has. It may have been cut short; export or download it again.`);
  }
  const after = bytes.subarray(eof + 5);
  if (!after.every((b) => WHITESPACE.has(b)) || hasZipDirectory(bytes)) {
    return fail("polyglot", `${shown} has another file hidden in it (for example a ZIP archive), so it could be read as two different things. Print or export it to a new PDF and upload that.`);
  }
  const active = (label: string) =>
    fail("pdf_active_content", `${shown} contains ${label}. Only plain PDFs are accepted; print or export it to a new PDF and upload that.`);
  const rawFinding = scanRaw(text) ?? (/\/OpenAction\s*<</u.test(withoutStreams(text)) ? OPEN_ACTION : null);
  if (rawFinding) return active(rawFinding);

  let doc: PDFDocument;
  try {
    doc = await PDFDocument.load(bytes, { ignoreEncryption: true, updateMetadata: false, throwOnInvalidObject: false });
  } catch {
    return fail("pdf_malformed", `${shown} is damaged: its contents cannot be read as a PDF. Export it again and retry.`);
  }
  if (doc.isEncrypted) {
    return fail("pdf_encrypted", `${shown} is password-protected, so it cannot be checked or shown to the committee. Save a copy without a password and upload that.`);
  }
  const objectFinding = scanObjects(doc);
  if (objectFinding) return active(objectFinding);
  let pages = 0;
  try {
    pages = doc.getPageCount();
  } catch {
    pages = 0;
  }
  if (pages < 1) return fail("pdf_malformed", `${shown} has no pages that can be read. Export it again and retry.`);
  return { pages };
}
