import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { ValidationError } from "@/lib/errors";
import { removeAttachment, updateCaption } from "@/lib/dal/attachments";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ attachmentId: string }> };

/** Changes the caption: JSON `{ caption }`; answers with the attachment. */
export const PATCH = handle(async (req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const attachmentId = idParam((await ctx.params).attachmentId);
  const body = await readJson(req);
  if (typeof body !== "object" || body === null || !("caption" in body)) throw new ValidationError({ caption: "Send the new caption." });
  return Response.json(await updateCaption(viewer, attachmentId, (body as { caption: unknown }).caption));
});

/** Takes the file off its draft revision. */
export const DELETE = handle(async (_req: Request, ctx: Ctx) => {
  const viewer = await requireViewer();
  const attachmentId = idParam((await ctx.params).attachmentId);
  await removeAttachment(viewer, attachmentId);
  return new Response(null, { status: 204 });
});
