import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { dropPermission } from "@/lib/dal/permissions";

export const dynamic = "force-dynamic";

/** The chair takes a permission that has not been recorded off the list. */
export const POST = handle(async (_req: Request, ctx: { params: Promise<{ permissionId: string }> }) => {
  const viewer = await requireViewer();
  return Response.json(await dropPermission(viewer, idParam((await ctx.params).permissionId)));
});
