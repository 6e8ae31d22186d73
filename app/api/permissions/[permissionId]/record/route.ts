import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { checkCanRecordPermission, recordPermission } from "@/lib/dal/permission-record";
import { readUploadForm } from "@/lib/upload-request";

export const dynamic = "force-dynamic";

/** The chair records a permission: multipart `file` (PDF or image) with authority, reference, grantedOn, conditions. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ permissionId: string }> }) => {
  const viewer = await requireViewer();
  const permissionId = idParam((await ctx.params).permissionId);
  await checkCanRecordPermission(viewer, permissionId); // before reading a body of up to 25 MB
  const form = await readUploadForm(req);
  if (form instanceof Response) return form;
  return Response.json(await recordPermission(viewer, permissionId, form), { status: 201 });
}, { body: "multipart" });
