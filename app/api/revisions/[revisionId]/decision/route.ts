import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getDecision, recordDecision } from "@/lib/dal/decisions";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };
const noStore = { headers: { "cache-control": "private, no-store" } };

/** The decision on a revision, if any, and for the chair what may be recorded now and why not. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await getDecision(viewer, idParam((await ctx.params).revisionId)), noStore);
});

/**
 * The chair records the decision: { outcome, conditions (one per line), statement? }. A sign-in more than
 * ten minutes old is answered 428 with code "fresh-sign-in-required".
 */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  await recordDecision(viewer, revisionId, await readJson(req));
  return Response.json(await getDecision(viewer, revisionId), { status: 201, ...noStore });
});
