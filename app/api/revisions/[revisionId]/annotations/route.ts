import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { annotationsFor } from "@/lib/dal/comments";
import { ANNO_CONTENT_TYPE } from "@/models/comments";

export const dynamic = "force-dynamic";

/** The revision's comments as a W3C Web Annotation collection (JSON-LD), to take them elsewhere. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ revisionId: string }> }) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  const collection = await annotationsFor(viewer, revisionId);
  return new Response(JSON.stringify(collection, null, 2), {
    headers: {
      "content-type": ANNO_CONTENT_TYPE,
      "content-disposition": `inline; filename="placet-revision-${revisionId}-comments.jsonld"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
