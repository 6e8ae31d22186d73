import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { sendDecisionSignInLink } from "@/lib/decision-link";

export const dynamic = "force-dynamic";

/** The chair asks for a fresh sign-in link (to their own address) before recording a decision. */
export const POST = handle(async (_req: Request, ctx: { params: Promise<{ revisionId: string }> }) => {
  const viewer = await requireViewer();
  return Response.json(await sendDecisionSignInLink(viewer, idParam((await ctx.params).revisionId)), { headers: { "cache-control": "private, no-store" } });
});
