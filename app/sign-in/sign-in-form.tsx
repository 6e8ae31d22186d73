"use client";
import { useActionState } from "react";
import { requestSignInLink, type SignInState } from "./actions";
import { TextField, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function SignInForm({ next }: { next?: string }) {
  const [state, action, pending] = useActionState<SignInState, FormData>(requestSignInLink, {});
  return (
    <form action={action} noValidate>
      <FormError message={state.errors?._form} />
      <input type="hidden" name="next" value={next ?? ""} />
      <TextField label="E-mail address" name="email" type="email" autoComplete="email" inputMode="email" defaultValue={state.email} error={state.errors?.email} hint="We send a link that signs you in. No password to remember." required />
      <Button type="submit" disabled={pending} className="w-full sm:w-auto">{pending ? "Sending…" : "Send me a sign-in link"}</Button>
    </form>
  );
}
