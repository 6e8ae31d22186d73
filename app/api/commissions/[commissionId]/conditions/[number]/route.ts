import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { answerCondition } from "@/lib/dal/condition-answers";

export const dynamic = "force-dynamic";

/** The studio answers condition {number} (from 1): { answer } says how it will be met. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ commissionId: string; number: string }> }) => {
  const viewer = await requireViewer();
  const p = await ctx.params;
  return Response.json(await answerCondition(viewer, idParam(p.commissionId), idParam(p.number), await readJson(req)), { headers: { "cache-control": "private, no-store" } });
});
