import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getConditions } from "@/lib/dal/condition-answers";

export const dynamic = "force-dynamic";

/** The conditions of the latest approval as noted, with the studio's answers. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ commissionId: string }> }) => {
  const viewer = await requireViewer();
  return Response.json(await getConditions(viewer, idParam((await ctx.params).commissionId)), { headers: { "cache-control": "private, no-store" } });
});
