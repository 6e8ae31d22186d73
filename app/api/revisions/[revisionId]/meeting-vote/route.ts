import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getBallotState, recordMeetingVote } from "@/lib/dal/ballots";

export const dynamic = "force-dynamic";

/** The chair records a meeting's vote: { meetingDate: "YYYY-MM-DD", counts: {…} } or { meetingDate, perMember: [...] }. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ revisionId: string }> }) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  await recordMeetingVote(viewer, revisionId, await readJson(req));
  return Response.json(await getBallotState(viewer, revisionId), { status: 201, headers: { "cache-control": "private, no-store" } });
});
