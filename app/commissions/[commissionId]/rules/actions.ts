"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireViewer } from "@/lib/session";
import { confirmRules, updateRules } from "@/lib/dal/rules";
import { formErrors } from "@/lib/action-errors";

export interface RulesState { errors?: Record<string, string> }

export async function rulesAction(commissionId: number, _prev: RulesState, form: FormData): Promise<RulesState> {
  const mode = String(form.get("quorumMode") ?? "majority");
  const raw = String(form.get("quorumCount") ?? "").trim();
  const input = {
    quorum: mode === "majority" ? "majority" : raw === "" ? undefined : Number(raw),
    threshold: String(form.get("threshold") ?? ""),
    chairVotes: form.get("chairVotes") === "on",
    electronicAuthority: String(form.get("electronicAuthority") ?? "").trim() || null,
  };
  try {
    await updateRules(await requireViewer(), commissionId, input);
  } catch (err) {
    return { errors: formErrors(err, "The rules could not be saved. Nothing was changed.") };
  }
  revalidatePath(`/commissions/${commissionId}`, "layout");
  redirect(`/commissions/${commissionId}`);
}

/** The chair confirms the rules the studio proposed, as they stand. */
export async function confirmRulesAction(commissionId: number, _prev: RulesState, _form: FormData): Promise<RulesState> {
  try {
    await confirmRules(await requireViewer(), commissionId);
  } catch (err) {
    return { errors: formErrors(err, "The rules could not be confirmed. Nothing was changed.") };
  }
  revalidatePath(`/commissions/${commissionId}`, "layout");
  redirect(`/commissions/${commissionId}`);
}
