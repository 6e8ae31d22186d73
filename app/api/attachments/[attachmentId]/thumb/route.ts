import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { idParam } from "@/lib/route-ids";
import { readAttachment } from "@/lib/dal/attachments";
import { fileResponse } from "@/lib/file-response";

export const dynamic = "force-dynamic";

/** The stored WebP thumbnail of an image, for whoever may see its revision. */
export const GET = handle(async (req: Request, ctx: { params: Promise<{ attachmentId: string }> }) => {
  const viewer = await requireViewer();
  const attachmentId = idParam((await ctx.params).attachmentId);
  return fileResponse(await readAttachment(viewer, attachmentId, "thumb"), req);
});
