import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { closeBallot } from "@/lib/dal/ballots";

export const dynamic = "force-dynamic";

/** The chair closes the ballot now; the answer is the frozen result. */
export const POST = handle(async (_req: Request, ctx: { params: Promise<{ ballotId: string }> }) => {
  const viewer = await requireViewer();
  const result = await closeBallot(viewer, idParam((await ctx.params).ballotId));
  return Response.json({ result }, { headers: { "cache-control": "private, no-store" } });
});
