import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { listRevisions } from "@/lib/dal/revisions-read";

export const dynamic = "force-dynamic";

/** Every revision of the commission the viewer may see, newest first. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ commissionId: string }> }) => {
  const viewer = await requireViewer();
  const { commissionId } = await ctx.params;
  return Response.json({ revisions: await listRevisions(viewer, idParam(commissionId)) });
});
