import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getRevision } from "@/lib/dal/revisions-read";

export const dynamic = "force-dynamic";

/** One revision: parameters, figures, note, attachments, hash and what the viewer may do with it. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ revisionId: string }> }) => {
  const viewer = await requireViewer();
  const { revisionId } = await ctx.params;
  return Response.json({ revision: await getRevision(viewer, idParam(revisionId)) });
});
