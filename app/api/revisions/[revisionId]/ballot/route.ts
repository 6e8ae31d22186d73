import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getBallotState, openBallot } from "@/lib/dal/ballots";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };
const noStore = { headers: { "cache-control": "private, no-store" } };

/** The ballot panel's state: rules in words, the open or latest ballot, live tally, who voted how. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  return Response.json(await getBallotState(viewer, revisionId), noStore);
});

/** The chair opens an electronic ballot: { closesAt: ISO time with zone, motion? }. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  await openBallot(viewer, revisionId, await readJson(req));
  return Response.json(await getBallotState(viewer, revisionId), { status: 201, ...noStore });
});
