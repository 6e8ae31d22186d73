"use server";
import { redirect } from "next/navigation";
import { signOutEverywhereElse } from "@/lib/dal/devices";
import { viewerOrSignIn } from "@/lib/session";

/** Ends every other session of the person asking; someone signed out is sent to sign in. */
export async function signOutOthersAction() {
  const ended = await signOutEverywhereElse(await viewerOrSignIn("/account/devices"));
  redirect(`/account/devices?ended=${ended}`);
}
