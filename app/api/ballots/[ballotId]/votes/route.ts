import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { castVote } from "@/lib/dal/ballots";

export const dynamic = "force-dynamic";

/** A voting member casts or changes their vote: { choice: "in-favour" | "against" | "abstain" }. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ ballotId: string }> }) => {
  const viewer = await requireViewer();
  const ballotId = idParam((await ctx.params).ballotId);
  const res = await castVote(viewer, ballotId, await readJson(req));
  return Response.json(res, { headers: { "cache-control": "private, no-store" } });
});
