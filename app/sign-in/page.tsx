import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/lib/session";
import { Card } from "@/components/ui/card";
import { fieldErrors, signInSchema } from "@/models/schemas/people";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

const ERRORS: Record<string, string> = {
  Verification: "That sign-in link has expired or has already been used. Links work once, for 10 minutes. Ask for a new one below.",
};

type Params = { error?: string; next?: string; email?: string };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Params> }) {
  const { error, next, email } = await searchParams;
  if (await getViewer()) redirect("/commissions");
  // A malformed address comes back here: the same schema says what is wrong with it, beside the field.
  const parsed = email === undefined ? null : signInSchema.safeParse({ email });
  const fieldError = parsed && !parsed.success ? fieldErrors(parsed.error).email : undefined;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-2 text-3xl font-semibold">Sign in</h1>
      <p className="mb-6 text-ink-soft">Use the address the studio or your committee invited.</p>
      {error && (
        <p role="alert" data-testid="sign-in-error" className="mb-4 rounded-md border border-danger bg-danger-soft px-3 py-2 text-danger">
          {ERRORS[error] ?? ERRORS.Verification}
        </p>
      )}
      <Card><SignInForm next={next} email={email} error={fieldError} /></Card>
    </div>
  );
}
