"use server";
import { eq } from "drizzle-orm";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import { signIn, signOut } from "@/lib/auth";
import { logSecurity } from "@/lib/security-log";
import { fieldErrors, signInSchema } from "@/models/schemas/people";
import { safeNext } from "@/lib/safe-next";
import { signInLinksRecently, SIGN_IN_LINKS_PER_WINDOW } from "@/lib/rate-limit";

export interface SignInState { errors?: Record<string, string>; email?: string }

/**
 * Sends a sign-in link if the address belongs to an invited person. The answer is the same either way,
 * so the form cannot be used to learn who is on a committee.
 */
export async function requestSignInLink(_prev: SignInState, form: FormData): Promise<SignInState> {
  const raw = String(form.get("email") ?? "");
  const parsed = signInSchema.safeParse({ email: raw });
  if (!parsed.success) return { errors: fieldErrors(parsed.error), email: raw };
  const email = parsed.data.email;
  const next = safeNext(String(form.get("next") ?? ""));
  const [known] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  if (known && (await signInLinksRecently(email)) >= SIGN_IN_LINKS_PER_WINDOW) {
    // Too many links asked for this address lately: send no more, but answer as usual.
    await logSecurity({ userId: known.id, email, action: "sign-in link withheld: too many requests", detail: {} });
  } else if (known) {
    try {
      await signIn("nodemailer", { email, redirect: false, redirectTo: next });
      await logSecurity({ userId: known.id, email, action: "sign-in link sent", detail: {} });
    } catch (err) {
      console.error("sign-in link could not be sent", err);
      return { errors: { _form: "The sign-in link could not be sent just now. Please try again in a minute." }, email: raw };
    }
  } else {
    await logSecurity({ userId: null, email, action: "sign-in refused: not invited", detail: {} });
  }
  redirect("/sign-in/check-inbox");
}

export async function signOutAction() {
  await signOut({ redirectTo: "/" });
}
