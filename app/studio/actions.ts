"use server";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/lib/session";
import { updateStudioSettings } from "@/lib/dal/studio";
import { formErrors } from "@/lib/action-errors";
import type { SaveStudioResult } from "@/components/studio/SettingsForm";

/** Saves the studio's machines, abrasive sets and stock; the data-access layer lets only the owner. */
export async function saveStudioSettings(input: unknown): Promise<SaveStudioResult> {
  try {
    const settings = await updateStudioSettings(await requireViewer(), input);
    revalidatePath("/studio", "layout");
    return { ok: true, settings };
  } catch (err) {
    return { ok: false, errors: formErrors(err, "The settings could not be saved. Nothing was changed.") };
  }
}
