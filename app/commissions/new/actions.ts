"use server";
import { redirect } from "next/navigation";
import { requireViewer } from "@/lib/session";
import { createCommission } from "@/lib/dal/commissions";
import { formErrors } from "@/lib/action-errors";

export interface NewCommissionState { errors?: Record<string, string>; values?: Record<string, string> }

export async function createCommissionAction(_prev: NewCommissionState, form: FormData): Promise<NewCommissionState> {
  const values = { title: String(form.get("title") ?? ""), clientBody: String(form.get("clientBody") ?? ""), site: String(form.get("site") ?? "") };
  let id: number;
  try {
    ({ id } = await createCommission(await requireViewer(), values));
  } catch (err) {
    return { errors: formErrors(err, "The commission could not be created. Nothing was saved."), values };
  }
  redirect(`/commissions/${id}`);
}
