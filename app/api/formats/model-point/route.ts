import { MODEL_POINT_FORMAT_TEXT } from "@/models/comments";

export const dynamic = "force-static";

/** What a model-point FragmentSelector means: the page its conformsTo names. Public; describes a format only. */
export function GET(): Response {
  return new Response(MODEL_POINT_FORMAT_TEXT, { headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "public, max-age=86400" } });
}
