import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { addAttachment, checkCanAttach, listAttachments } from "@/lib/dal/attachments";
import { readUploadForm } from "@/lib/upload-request";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ revisionId: string }> };

/** The revision's files, in order. */
export const GET = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  return Response.json({ attachments: await listAttachments(viewer, revisionId) });
});

/** Adds one file (multipart fields `file` and `caption`) to a draft revision: 201 with the attachment. */
export const POST = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const revisionId = idParam((await ctx.params).revisionId);
  await checkCanAttach(viewer, revisionId); // before reading a body of up to 25 MB
  const form = await readUploadForm(req);
  if (form instanceof Response) return form;
  const attachment = await addAttachment(viewer, revisionId, form);
  return Response.json(attachment, { status: 201 });
}, { body: "multipart" });
