import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { reopenThread } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";

/** The studio reopens the comment's resolved thread. */
export const POST = handle(async (_req: Request, ctx: { params: Promise<{ commentId: string }> }) => {
  const viewer = await requireViewer();
  const commentId = idParam((await ctx.params).commentId);
  return Response.json(await reopenThread(viewer, commentId), { headers: { "cache-control": "private, no-store" } });
});
