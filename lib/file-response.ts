import "server-only";
import type { StoredFile } from "./dal/attachments";

/** Types a stored file may be served as. Anything else (above all text/html) is never sent. */
const SERVABLE = new Set(["image/png", "image/jpeg", "image/webp", "application/pdf"]);

/**
 * A stored file as a response: its checked type, a fixed download name chosen by the server, no
 * sniffing, and a sandbox so nothing in it can run as a page of ours. Content never changes per id.
 */
export function fileResponse(file: StoredFile, req?: Request): Response {
  if (!SERVABLE.has(file.mime)) throw new Error(`refusing to serve type ${file.mime}`);
  const headers = new Headers({
    "Content-Type": file.mime,
    "Content-Length": String(file.bytes.byteLength),
    "Content-Disposition": `inline; filename="${file.downloadName}"`,
    "X-Content-Type-Options": "nosniff",
    "Content-Security-Policy": "sandbox; default-src 'none'",
    "Cache-Control": "private, max-age=3600",
    "Cross-Origin-Resource-Policy": "same-origin",
  });
  if (file.sha256) {
    const etag = `"${file.sha256}"`;
    headers.set("ETag", etag);
    if (req?.headers.get("if-none-match") === etag) {
      headers.delete("Content-Length");
      return new Response(null, { status: 304, headers });
    }
  }
  return new Response(new Uint8Array(file.bytes), { status: 200, headers });
}
