import { MAX_NAME_LENGTH } from "./limits";

/**
 * File names are only ever displayed: storage keys are chosen by the server. So a name is
 * refused only when it signals a crafted request or would mislead the people reading it, and
 * is otherwise cleaned into a safe display name:
 *
 * - refused: folder separators (`/`, `\`) — browsers send the bare file name, so a path means
 *   the request was made by hand, usually to try a traversal;
 * - refused: text-direction controls (U+202E and friends) — they make `photo‮gnp.exe` show as
 *   `photoexe.png`, so the name would lie about the file's type;
 * - refused: NUL and other control characters — no file picker produces them, and they break
 *   headers and logs;
 * - refused: a blank name;
 * - cleaned: invisible zero-width characters are dropped, characters that are unsafe in
 *   download headers or on some desktop file systems (`" * : < > ? |`) become `_`, runs of spaces collapse,
 *   leading dots and trailing dots/spaces go, and names over 200 characters are shortened in the
 *   middle keeping the extension — long names are common from cameras and drawing exports and
 *   harmless once shortened.
 */
export type NameCheck =
  | { ok: true; safeName: string; extension: string | null }
  | { ok: false; code: "bad_name"; message: string; safeName: string };

const BIDI = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/u;
const CONTROL = /[\u0000-\u001F\u007F-\u009F]/u;
const SEPARATOR = /[/\\]/u;

/** The name cleaned for display; never empty. */
export function safeDisplayName(raw: unknown): string {
  let name = typeof raw === "string" ? raw.normalize("NFC") : "";
  name = name.split(/[/\\]/u).pop() ?? "";
  name = name
    .replace(new RegExp(BIDI.source, "gu"), "")
    .replace(new RegExp(CONTROL.source, "gu"), "")
    .replace(/[\u00AD\u200B\u2060-\u2064\uFEFF]/gu, "")
    .replace(/["*:<>?|]/gu, "_")
    .replace(/\s+/gu, " ")
    .replace(/^[\s.]+/u, "")
    .replace(/[\s.]+$/u, "");
  return shorten(name) || "file";
}

function shorten(name: string): string {
  const chars = Array.from(name);
  if (chars.length <= MAX_NAME_LENGTH) return name;
  const dot = name.lastIndexOf(".");
  const ext = dot > 0 ? Array.from(name.slice(dot)) : [];
  if (ext.length === 0 || ext.length > 12) return chars.slice(0, MAX_NAME_LENGTH - 1).join("") + "…";
  const stem = Array.from(name.slice(0, dot));
  return stem.slice(0, MAX_NAME_LENGTH - ext.length - 1).join("") + "…" + ext.join("");
}

/** The lower-cased extension of a display name, or null when it has none. */
export function extensionOf(safeName: string): string | null {
  const dot = safeName.lastIndexOf(".");
  if (dot <= 0) return null;
  const ext = safeName.slice(dot + 1).toLowerCase();
  return /^[a-z0-9]{1,10}$/u.test(ext) ? ext : null;
}

export function checkName(raw: unknown): NameCheck {
  const name = typeof raw === "string" ? raw : "";
  const safeName = safeDisplayName(name);
  const refuse = (message: string): NameCheck => ({ ok: false, code: "bad_name", message, safeName });
  const shown = `“${safeName}”`;
  if (SEPARATOR.test(name)) {
    return refuse(
      `The file ${shown} was sent with folder names in front of it ("/" or "\\"). Choose the file itself and try again.`,
    );
  }
  if (BIDI.test(name)) {
    return refuse(
      `The name of ${shown} contains hidden characters that reverse the direction of text, which can make a file look like a different type. Rename the file and try again.`,
    );
  }
  if (CONTROL.test(name)) {
    return refuse(`The name of ${shown} contains invisible control characters. Rename the file and try again.`);
  }
  if (!name.replace(/[\s.\u00AD\u200B\u2060-\u2064\uFEFF]/gu, "")) {
    return refuse("The file has no name. Give it a name ending in .png, .jpg, .webp or .pdf and try again.");
  }
  return { ok: true, safeName, extension: extensionOf(safeName) };
}
