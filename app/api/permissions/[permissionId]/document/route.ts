import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { readPermissionDocument } from "@/lib/dal/permission-record";
import { fileResponse } from "@/lib/file-response";

export const dynamic = "force-dynamic";

/** The permission's document as recorded, for everyone on the commission. */
export const GET = handle(async (req: Request, ctx: { params: Promise<{ permissionId: string }> }) => {
  const viewer = await requireViewer();
  return fileResponse(await readPermissionDocument(viewer, idParam((await ctx.params).permissionId)), req);
});
