import type { AttachmentKind } from "@/models/revision/attachment-kinds";

/** The kinds of file a revision may carry. */
export type UploadKind = AttachmentKind;

export const MIME: Record<UploadKind, string> = {
  png: "image/png",
  jpeg: "image/jpeg",
  webp: "image/webp",
  pdf: "application/pdf",
};

/** Plain-English name of each kind, used in messages. */
export const KIND_LABEL: Record<UploadKind, string> = {
  png: "a PNG image",
  jpeg: "a JPEG image",
  webp: "a WebP image",
  pdf: "a PDF",
};

export type UploadRefusalCode =
  | "bad_name" // the name has path parts, control or text-direction characters, or is blank
  | "empty" // zero bytes
  | "too_large" // over MAX_FILE_BYTES
  | "type_not_allowed" // recognised, but not a kind we take (SVG, HTML, archive, program, GIF…)
  | "unknown_type" // content not recognised at all
  | "name_mismatch" // the name's extension is missing, odd, or disagrees with the content
  | "corrupt" // cut short or undecodable
  | "too_many_pixels" // image dimensions over MAX_PIXELS
  | "polyglot" // a second file hidden in or after the first
  | "pdf_malformed" // missing %PDF- header or %%EOF, unreadable structure, no pages
  | "pdf_encrypted" // password-protected
  | "pdf_active_content" // scripts, launch actions, embedded files, /AA, /URI, /GoToR, an /OpenAction action
  | "too_many_files"; // over MAX_FILES_PER_REVISION

export interface UploadRefusal {
  ok: false;
  field: "file";
  code: UploadRefusalCode;
  message: string;
  /** The display name, made safe, so the page can show which file this was. */
  safeName: string;
}

export interface UploadAccepted {
  ok: true;
  kind: UploadKind;
  mime: string;
  /** SHA-256 (hex) of `normalized`, the bytes to store and serve. */
  sha256: string;
  /** SHA-256 (hex) of the bytes as uploaded. */
  originalSha256: string;
  width?: number;
  height?: number;
  pages?: number;
  safeName: string;
  normalized: Uint8Array;
  thumbnail?: Uint8Array;
}

export type UploadResult = UploadAccepted | UploadRefusal;

/** A check that found nothing wrong returns null; otherwise the code and message. */
export type Problem = { code: UploadRefusalCode; message: string } | null;
