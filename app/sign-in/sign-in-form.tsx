"use client";
import { useState } from "react";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

/** A plain form post to /sign-in/request: it works before any script has loaded. */
export function SignInForm({ next, email, error }: { next?: string; email?: string; error?: string }) {
  const [pending, setPending] = useState(false);
  return (
    <form method="post" action="/sign-in/request" noValidate onSubmit={() => setPending(true)}>
      <input type="hidden" name="next" value={next ?? ""} />
      <TextField label="E-mail address" name="email" type="email" autoComplete="email" inputMode="email" defaultValue={email} error={error} hint="We send a link that signs you in. No password to remember." required />
      <Button type="submit" disabled={pending} className="w-full sm:w-auto">{pending ? "Sending…" : "Send me a sign-in link"}</Button>
    </form>
  );
}
