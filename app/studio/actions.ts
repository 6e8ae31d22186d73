"use server";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/lib/session";
import { updateStudioSettings } from "@/lib/dal/studio";
import { isKnownError, ValidationError } from "@/lib/errors";
import type { SaveStudioResult } from "@/components/studio/SettingsForm";

/** Saves the studio's machines, abrasive sets and stock; the data-access layer lets only the owner. */
export async function saveStudioSettings(input: unknown): Promise<SaveStudioResult> {
  try {
    const settings = await updateStudioSettings(await requireViewer(), input);
    revalidatePath("/studio", "layout");
    return { ok: true, settings };
  } catch (err) {
    if (err instanceof ValidationError) return { ok: false, errors: err.fields };
    if (isKnownError(err)) return { ok: false, errors: { _form: err.message } };
    console.error(err);
    return { ok: false, errors: { _form: "The settings could not be saved. Nothing was changed." } };
  }
}
