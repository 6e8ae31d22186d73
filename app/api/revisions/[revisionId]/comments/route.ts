import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { listComments, postComment } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };
const noStore = { "cache-control": "private, no-store" };

/** The revision's comment threads, with replies, pins and what the viewer may do. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await listComments(viewer, idParam((await ctx.params).revisionId)), { headers: noStore });
});

/** Starts a thread: { body, target? } where target is the whole revision, a place on a drawing, or a point on the model. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  const res = await postComment(viewer, revisionId, await readJson(req));
  return Response.json(res, { status: 201, headers: noStore });
});
