import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { getPermissions, setPermissionsNeeded } from "@/lib/dal/permissions";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ commissionId: string }> };
const noStore = { headers: { "cache-control": "private, no-store" } };

/** The permissions the commission needs and what is recorded of each. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await getPermissions(viewer, idParam((await ctx.params).commissionId)), noStore);
});

/** The chair adds a needed permission { name, authority? }, or says none is needed { noneRequired: true, reason }. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  return Response.json(await setPermissionsNeeded(viewer, idParam((await ctx.params).commissionId), await readJson(req)), { status: 201, ...noStore });
});
