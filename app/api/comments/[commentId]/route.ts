import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { editComment } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";

/** The author edits their comment within ten minutes of posting it: { body }. */
export const PATCH = handle(async (req: Request, ctx: { params: Promise<{ commentId: string }> }) => {
  const viewer = await requireViewer();
  const commentId = idParam((await ctx.params).commentId);
  return Response.json(await editComment(viewer, commentId, await readJson(req)), { headers: { "cache-control": "private, no-store" } });
});
