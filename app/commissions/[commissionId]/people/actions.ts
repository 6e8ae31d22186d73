"use server";
import { revalidatePath } from "next/cache";
import { requireViewer } from "@/lib/session";
import { invitePerson } from "@/lib/dal/people";
import { formErrors } from "@/lib/action-errors";

export interface InviteState { ok?: string; errors?: Record<string, string>; values?: Record<string, string> }

export async function inviteAction(commissionId: number, _prev: InviteState, form: FormData): Promise<InviteState> {
  const values = { email: String(form.get("email") ?? ""), name: String(form.get("name") ?? ""), role: String(form.get("role") ?? "") };
  try {
    const viewer = await requireViewer();
    const res = await invitePerson(viewer, commissionId, { ...values, treasurer: form.get("treasurer") === "on" });
    revalidatePath(`/commissions/${commissionId}`, "layout");
    const msg = res.created ? `Invited ${values.email}. They will get an e-mail.` : res.roleChanged ? `Changed the role of ${values.email}.` : `${values.email} is already on this commission.`;
    return { ok: msg };
  } catch (err) {
    return { errors: formErrors(err, "The invitation could not be saved. Nothing was changed."), values };
  }
}
