"use server";
import { redirect } from "next/navigation";
import { signOutEverywhereElse } from "@/lib/dal/devices";
import { requireViewer } from "@/lib/session";

export async function signOutOthersAction() {
  const ended = await signOutEverywhereElse(await requireViewer());
  redirect(`/account/devices?ended=${ended}`);
}
