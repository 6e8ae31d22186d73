import "server-only";
import { NextResponse } from "next/server";
import { ValidationError } from "./errors";
import { FILE_TOO_LARGE as TOO_LARGE, MAX_UPLOAD_REQUEST_BYTES, readCapped } from "./request-guard";

export { MAX_UPLOAD_REQUEST_BYTES, UPLOAD_OVERHEAD_BYTES } from "./request-guard";

/** The answer for a request body over the limit: 413, with the message against the file field. */
export function tooLarge(): Response {
  return NextResponse.json({ error: TOO_LARGE, fields: { file: TOO_LARGE } }, { status: 413 });
}

export interface UploadForm {
  name: string;
  bytes: Uint8Array;
  caption: string | null;
  /** The form's other text fields, by name. */
  fields: Record<string, string>;
}

/**
 * One file (field `file`) and an optional `caption` from a multipart/form-data request, or a Response
 * refusing it as too large. Anything else malformed is a ValidationError naming the file field.
 */
export async function readUploadForm(req: Request): Promise<UploadForm | Response> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data;/iu.test(type)) {
    throw new ValidationError({ file: "Send the file as a form upload (multipart/form-data), one file per request." });
  }
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (Number.isFinite(declared) && declared > MAX_UPLOAD_REQUEST_BYTES) return tooLarge();
  const body = await readCapped(req, MAX_UPLOAD_REQUEST_BYTES);
  if (!body) return tooLarge();
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": type } }).formData();
  } catch {
    throw new ValidationError({ file: "The upload could not be read; it may have been cut off. Try again." });
  }
  const files = form.getAll("file");
  if (files.length === 0) throw new ValidationError({ file: "Choose a file to upload." });
  if (files.length > 1) throw new ValidationError({ file: "Send one file per request." });
  const file = files[0];
  if (typeof file === "string") throw new ValidationError({ file: "Choose a file to upload: the form sent text instead of a file." });
  const caption = form.get("caption");
  if (caption !== null && typeof caption !== "string") throw new ValidationError({ caption: "The caption must be text." });
  const fields: Record<string, string> = {};
  for (const [k, v] of form.entries()) if (typeof v === "string" && k !== "file") fields[k] = v;
  return { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()), caption, fields };
}
