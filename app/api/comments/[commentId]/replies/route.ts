import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { replyToComment } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";

/** Replies in the comment's thread: { body }. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ commentId: string }> }) => {
  const viewer = await requireViewer();
  const commentId = idParam((await ctx.params).commentId);
  const res = await replyToComment(viewer, commentId, await readJson(req));
  return Response.json(res, { status: 201, headers: { "cache-control": "private, no-store" } });
});
