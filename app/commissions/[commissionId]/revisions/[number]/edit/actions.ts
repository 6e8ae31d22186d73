"use server";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/lib/session";
import { circulate, updateDraft } from "@/lib/dal/revisions-write";
import { isKnownError, ValidationError } from "@/lib/errors";

export interface SaveResult { ok: boolean; message?: string; errors?: Record<string, string>; contentHash?: string }

function fail(err: unknown): SaveResult {
  if (err instanceof ValidationError) return { ok: false, errors: err.fields, message: err.message };
  if (isKnownError(err)) return { ok: false, message: err.message };
  console.error(err);
  return { ok: false, message: "Could not save just now. Your changes are still on this page; try again." };
}

export async function saveDraftAction(commissionId: number, number: number, params: unknown, note: string): Promise<SaveResult> {
  try {
    const { changed } = await updateDraft(await requireViewer(), commissionId, number, { params, note });
    revalidatePath(`/commissions/${commissionId}/revisions`);
    return { ok: true, message: changed.length ? `Saved (${changed.length} value${changed.length === 1 ? "" : "s"} changed).` : "Saved." };
  } catch (err) {
    return fail(err);
  }
}

export async function circulateAction(commissionId: number, number: number, params: unknown, note: string): Promise<SaveResult> {
  try {
    const viewer = await requireViewer();
    await updateDraft(viewer, commissionId, number, { params, note });
    const { contentHash } = await circulate(viewer, commissionId, number);
    revalidatePath(`/commissions/${commissionId}`, "layout");
    return { ok: true, contentHash, message: `Revision ${number} circulated.` };
  } catch (err) {
    return fail(err);
  }
}
