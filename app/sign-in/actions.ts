"use server";
import { redirect } from "next/navigation";
import { signOutHere } from "@/lib/session";

/** Sign-in links are asked for by the form's POST to /sign-in/request; this file only signs out. */
export async function signOutAction() {
  await signOutHere();
  redirect("/");
}
