import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { resolveThread } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";

/** The studio marks the comment's thread resolved (it stays in the record). */
export const POST = handle(async (_req: Request, ctx: { params: Promise<{ commentId: string }> }) => {
  const viewer = await requireViewer();
  const commentId = idParam((await ctx.params).commentId);
  return Response.json(await resolveThread(viewer, commentId), { headers: { "cache-control": "private, no-store" } });
});
