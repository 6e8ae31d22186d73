import "server-only";
import { fileTypeFromBuffer } from "file-type";
import { KIND_LABEL, type Problem, type UploadKind } from "./types";

const ARCHIVES = new Set([
  "zip", "gz", "7z", "rar", "tar", "bz2", "xz", "zst", "lz", "lz4", "lzh", "lzma", "cab", "cpio", "ar", "arj",
  "Z", "deb", "rpm", "jar", "apk", "xpi", "crx", "asar", "dmg", "iso", "squashfs",
]);
const PROGRAMS = new Set(["exe", "elf", "mach", "macho", "dll", "msi", "class", "wasm", "dex", "swf", "lnk", "sh"]);
const DOCUMENTS = new Set(["docx", "xlsx", "pptx", "doc", "xls", "ppt", "odt", "ods", "odp", "rtf", "epub", "mobi"]);

/** What file-type cannot see: text formats that browsers would run (SVG, HTML) or parse (XML). */
export function sniffMarkup(bytes: Uint8Array): "svg" | "html" | "xml" | null {
  const head = bytes.subarray(0, 4096);
  let encoding = "utf-8";
  if ((head[0] === 0xff && head[1] === 0xfe) || (head[1] === 0 && head[0] !== 0)) encoding = "utf-16le";
  else if ((head[0] === 0xfe && head[1] === 0xff) || (head[0] === 0 && head[1] !== 0)) encoding = "utf-16be";
  const text = new TextDecoder(encoding).decode(head).replace(/^[\uFEFF\s]+/u, "").toLowerCase();
  if (!text.startsWith("<")) return null;
  if (text.includes("<svg")) return "svg";
  if (/<(!doctype html|html|head|body|script|iframe|meta|object|embed|a\s|img|div|style)/u.test(text)) return "html";
  return "xml";
}

export type Detected = { kind: UploadKind } | { problem: NonNullable<Problem> };

const refuse = (message: string): Detected => ({ problem: { code: "type_not_allowed", message } });

/** Decides the kind from the bytes alone; anything but PNG, JPEG, WebP or PDF is refused. */
export async function detectKind(bytes: Uint8Array, shown: string): Promise<Detected> {
  // Markup first: a UTF-16 byte-order mark looks like an MP3 frame to a signature check.
  const markup = sniffMarkup(bytes);
  const found = markup ? undefined : await fileTypeFromBuffer(bytes);
  const ext = found?.ext as string | undefined;
  if (ext === "png" || ext === "apng") return { kind: "png" };
  if (ext === "jpg") return { kind: "jpeg" };
  if (ext === "webp") return { kind: "webp" };
  if (ext === "pdf") return { kind: "pdf" };

  if (markup === "svg") {
    return refuse(`${shown} is an SVG drawing. SVG files can carry scripts, so they are not accepted; export it as PNG or PDF instead.`);
  }
  if (markup === "html") {
    return refuse(`${shown} is a web page (HTML), not a drawing or photo. Save or print it as a PDF instead.`);
  }
  if (markup === "xml" || ext === "xml") {
    return refuse(`${shown} is an XML or markup file, not a drawing or photo. Export it as PNG or PDF instead.`);
  }
  if (!found || !ext) {
    return {
      problem: {
        code: "unknown_type",
        message: `The content of ${shown} was not recognised as ${Object.values(KIND_LABEL).join(", ").replace(/, (?=[^,]*$)/u, " or ")}. It may be damaged or a different kind of file.`,
      },
    };
  }
  if (ARCHIVES.has(ext)) {
    return refuse(`${shown} is a compressed archive (${ext.toUpperCase()}). Archives are not accepted; upload the drawings and photos inside it one by one.`);
  }
  if (PROGRAMS.has(ext)) return refuse(`${shown} is a program, not a drawing or photo, and cannot be uploaded.`);
  if (DOCUMENTS.has(ext)) return refuse(`${shown} is an office document. Save it as a PDF and upload that.`);
  if (ext === "ai") return refuse(`${shown} is a vector-drawing file (.ai). Save a copy as a plain PDF and upload that.`);
  if (ext === "heic" || ext === "heif") {
    return refuse(`${shown} is a HEIC photo (many phones save these). Export it as JPEG and try again.`);
  }
  if (found.mime.startsWith("image/")) {
    return refuse(`${shown} is a ${ext.toUpperCase()} image. Only PNG, JPEG and WebP images are accepted; save it as one of those.`);
  }
  if (found.mime.startsWith("video/") || found.mime.startsWith("audio/")) {
    return refuse(`${shown} is a ${found.mime.startsWith("video/") ? "video" : "sound"} file. Only drawings, photos and PDFs can be attached.`);
  }
  return refuse(`${shown} is a ${ext.toUpperCase()} file (${found.mime}), which cannot be attached. Only PNG, JPEG, WebP and PDF files are accepted.`);
}

const NAME_KIND: Record<string, UploadKind> = { png: "png", jpg: "jpeg", jpeg: "jpeg", webp: "webp", pdf: "pdf" };
const PREFERRED: Record<UploadKind, string> = { png: ".png", jpeg: ".jpg", webp: ".webp", pdf: ".pdf" };

/** The name's extension must say what the content is. */
export function checkExtension(extension: string | null, kind: UploadKind, shown: string): Problem {
  const content = KIND_LABEL[kind];
  if (extension === null) {
    return {
      code: "name_mismatch",
      message: `${shown} has no file extension. Its content is ${content}, so rename it to end in ${PREFERRED[kind]}.`,
    };
  }
  const named = NAME_KIND[extension];
  if (named === kind) return null;
  if (named) {
    return {
      code: "name_mismatch",
      message: `${shown} is named as ${KIND_LABEL[named]} but its content is ${content}. Rename it to end in ${PREFERRED[kind]}, or choose the right file.`,
    };
  }
  return {
    code: "name_mismatch",
    message: `${shown} ends in “.${extension}”, but its content is ${content}. Names must end in .png, .jpg, .jpeg, .webp or .pdf to match the content.`,
  };
}
