import "server-only";
import { createHash } from "node:crypto";
import { checkTrailing, normalizeImage } from "./images";
import { MAX_FILE_BYTES } from "./limits";
import { checkName } from "./names";
import { checkPdf } from "./pdf";
import { checkExtension, detectKind } from "./sniff";
import { MIME, type Problem, type UploadResult } from "./types";

export { MAX_FILE_BYTES, MAX_FILES_PER_REVISION, MAX_PIXELS, THUMBNAIL_WIDTH, countCheck, type CountCheck } from "./limits";
export { checkName, safeDisplayName } from "./names";
export type { UploadAccepted, UploadKind, UploadRefusal, UploadRefusalCode, UploadResult } from "./types";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

function describeSize(bytes: number): string {
  const mb = (bytes / (1024 * 1024)).toFixed(1);
  return Number(mb) * 1024 * 1024 > MAX_FILE_BYTES ? `${mb} MB` : `${bytes.toLocaleString("en-GB")} bytes`;
}

function asBytes(value: unknown): Uint8Array | null {
  if (value instanceof Uint8Array) return value;
  if (value instanceof ArrayBuffer) return new Uint8Array(value);
  return null;
}

/**
 * Checks one uploaded file and prepares what to store. The type comes from the content alone;
 * the name only has to agree with it. Images are fully decoded and re-encoded without metadata
 * (orientation applied) with a WebP thumbnail; PDFs are kept as uploaded once they pass.
 * Never throws: every problem comes back as a refusal with a message naming the file.
 */
export async function inspectUpload(input: { name: string; bytes: Uint8Array | ArrayBuffer }): Promise<UploadResult> {
  const name = checkName(input?.name);
  const { safeName } = name;
  const shown = `“${safeName}”`;
  const refuse = (problem: NonNullable<Problem>): UploadResult => ({ ok: false, field: "file", ...problem, safeName });
  try {
    if (!name.ok) return refuse(name);
    const bytes = asBytes(input.bytes);
    if (!bytes || bytes.byteLength === 0) {
      return refuse({ code: "empty", message: `${shown} is empty (0 bytes). Choose the file again; if it is still empty, the file itself is damaged.` });
    }
    if (bytes.byteLength > MAX_FILE_BYTES) {
      return refuse({
        code: "too_large",
        message: `${shown} is ${describeSize(bytes.byteLength)}, over the limit of 25 MB per file. Make it smaller (for a photo, export it at a lower size) and try again.`,
      });
    }
    const detected = await detectKind(bytes, shown);
    if ("problem" in detected) return refuse(detected.problem);
    const { kind } = detected;
    const mismatch = checkExtension(name.extension, kind, shown);
    if (mismatch) return refuse(mismatch);

    if (kind === "pdf") {
      const pdf = await checkPdf(bytes, shown);
      if ("problem" in pdf) return refuse(pdf.problem);
      const hash = sha256(bytes);
      return { ok: true, kind, mime: MIME.pdf, sha256: hash, originalSha256: hash, pages: pdf.pages, safeName, normalized: bytes };
    }

    const trailing = checkTrailing(kind, bytes, shown);
    if (trailing) return refuse(trailing);
    const result = await normalizeImage(kind, bytes, shown);
    if ("problem" in result) return refuse(result.problem);
    const { normalized, thumbnail, width, height } = result.image;
    return {
      ok: true,
      kind,
      mime: MIME[kind],
      sha256: sha256(normalized),
      originalSha256: sha256(bytes),
      width,
      height,
      safeName,
      normalized,
      thumbnail,
    };
  } catch {
    return refuse({ code: "corrupt", message: `${shown} could not be read. It may be damaged; export or copy it again and retry.` });
  }
}
