import { MAX_FILE_BYTES } from "./uploads/limits";

/** Room for the multipart boundaries, part headers and a caption beside one file of the largest size. */
export const UPLOAD_OVERHEAD_BYTES = 256 * 1024;
export const MAX_UPLOAD_REQUEST_BYTES = MAX_FILE_BYTES + UPLOAD_OVERHEAD_BYTES;

/** What a mutating route accepts as its body. */
export type BodyKind = "json" | "form" | "multipart";

/** Largest body each kind may carry, checked before anything parses it. */
export const BODY_LIMITS: Record<BodyKind, number> = {
  json: 64 * 1024,
  form: 8 * 1024,
  multipart: MAX_UPLOAD_REQUEST_BYTES,
};

export const MUTATING_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

const ACCEPTED: Record<BodyKind, (type: string) => boolean> = {
  json: (t) => t === "application/json" || /^application\/[a-z0-9.+-]+\+json$/u.test(t),
  form: (t) => t === "application/x-www-form-urlencoded" || t === "multipart/form-data",
  multipart: (t) => t === "multipart/form-data",
};

const WHAT: Record<BodyKind, string> = {
  json: "JSON (Content-Type: application/json)",
  form: "a form (application/x-www-form-urlencoded or multipart/form-data)",
  multipart: "a file upload (multipart/form-data)",
};

export const FILE_TOO_LARGE = "The file is over the limit of 25 MB per file. Make it smaller (for a photo, export it at a lower size) and try again.";

function refuse(status: number, code: string, message: string, fields?: Record<string, string>): Response {
  return Response.json({ error: message, code, ...(fields ? { fields } : {}) }, { status, headers: { "cache-control": "no-store" } });
}

function mediaType(header: string | null): string | null {
  const t = header?.split(";")[0]?.trim().toLowerCase();
  return t ? t : null;
}

/** Reads a body, stopping as soon as it passes `limit` bytes (a missing or false Content-Length included). */
export async function readCapped(req: Request, limit: number): Promise<Uint8Array<ArrayBuffer> | null> {
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const parts: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      return null;
    }
    parts.push(value);
  }
  return new Uint8Array(Buffer.concat(parts));
}

/**
 * A small URL-encoded form (the sign-in forms), read through the cap so that neither a large
 * Content-Length nor a chunked body without one is ever buffered past `limit`. Null when too large.
 */
export async function readSmallForm(req: Request, limit: number): Promise<URLSearchParams | null> {
  const bytes = await readCapped(req, limit);
  return bytes ? new URLSearchParams(new TextDecoder().decode(bytes)) : null;
}

/** Is the request sent from one of our own pages? Refuses a missing or foreign Origin and a cross-site fetch. */
function originRefusal(req: Request, appOrigin: string): Response | null {
  if (req.headers.get("sec-fetch-site") === "cross-site") {
    return refuse(403, "cross-site", "Changes are accepted only from Placet's own pages (this request came from another site).");
  }
  const origin = req.headers.get("origin");
  if (!origin) return refuse(403, "origin-missing", "Changes are accepted only from Placet's own pages (the request names no Origin).");
  if (origin !== appOrigin) return refuse(403, "origin-foreign", `Changes are accepted only from Placet's own pages, not from ${origin.slice(0, 100)}.`);
  return null;
}

/**
 * For a mutating request: a refusal (403 foreign or missing origin, 415 wrong body type, 413 too large), or
 * the request to hand on. JSON and form bodies are read here, capped, and handed on in a fresh Request, so
 * nothing downstream ever parses more than the limit; uploads stream on to their own capped reader.
 */
export async function guardRequest(req: Request, appOrigin: string, kind: BodyKind): Promise<Request | Response> {
  if (!MUTATING_METHODS.has(req.method.toUpperCase())) return req;
  const bad = originRefusal(req, appOrigin);
  if (bad) return bad;
  const type = mediaType(req.headers.get("content-type"));
  const limit = BODY_LIMITS[kind];
  const tooLarge = () =>
    kind === "multipart"
      ? refuse(413, "body-too-large", FILE_TOO_LARGE, { file: FILE_TOO_LARGE })
      : refuse(413, "body-too-large", `The request body is over the limit of ${Math.round(limit / 1024)} KB.`);
  const wrongType = () => refuse(415, "unsupported-media-type", `Send the request body as ${WHAT[kind]}.`);
  if (type !== null && !ACCEPTED[kind](type)) return wrongType();
  const declared = Number(req.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > limit) return tooLarge();
  if (kind === "multipart" && type !== null) return req; // streamed on; the upload reader counts it as it reads
  const bytes = await readCapped(req, limit);
  if (!bytes) return tooLarge();
  if (type === null && bytes.byteLength > 0) return wrongType();
  return new Request(req.url, { method: req.method, headers: req.headers, body: bytes.byteLength ? bytes : null, signal: req.signal });
}
