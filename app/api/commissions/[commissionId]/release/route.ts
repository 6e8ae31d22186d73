import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getReleaseStatus, releaseToFabrication } from "@/lib/dal/release";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ commissionId: string }> };
const noStore = { headers: { "cache-control": "private, no-store" } };

/** { ready, missing, releasedAt }: what still stands between the commission and release, in plain words. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await getReleaseStatus(viewer, idParam((await ctx.params).commissionId)), noStore);
});

/** The studio owner releases to fabrication (409 with what is missing when not ready). Body: {} or none. */
export const POST = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await releaseToFabrication(viewer, idParam((await ctx.params).commissionId)), { status: 201, ...noStore });
});
