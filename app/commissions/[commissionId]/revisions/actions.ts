"use server";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/lib/session";
import { createDraft } from "@/lib/dal/revisions-write";
import { isKnownError } from "@/lib/errors";

export interface DraftState { error?: string }

export async function createDraftAction(commissionId: number, _prev: DraftState, form: FormData): Promise<DraftState> {
  let number: number;
  try {
    ({ number } = await createDraft(await requireViewer(), commissionId, { note: String(form.get("note") ?? "") }));
  } catch (err) {
    if (isKnownError(err)) return { error: err.message };
    console.error(err);
    return { error: "The draft could not be started. Nothing was saved." };
  }
  revalidatePath(`/commissions/${commissionId}`, "layout");
  redirect(`/commissions/${commissionId}/revisions/${number}/edit`);
}
