import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/lib/session";
import { Card } from "@/components/ui/card";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

const ERRORS: Record<string, string> = {
  Verification: "That sign-in link has expired or has already been used. Links work once, for 10 minutes. Ask for a new one below.",
  AccessDenied: "That address has not been invited to Placet. Ask the studio or your committee's chair to invite you.",
  Configuration: "Sign-in is not working on the server just now. Please try again shortly.",
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ error?: string; next?: string }> }) {
  const { error, next } = await searchParams;
  if (await getViewer()) redirect("/commissions");
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-2 text-3xl font-semibold">Sign in</h1>
      <p className="mb-6 text-ink-soft">Use the address the studio or your committee invited.</p>
      {error && (
        <p role="alert" data-testid="sign-in-error" className="mb-4 rounded-md border border-danger bg-danger-soft px-3 py-2 text-danger">
          {ERRORS[error] ?? ERRORS.Verification}
        </p>
      )}
      <Card><SignInForm next={next} /></Card>
    </div>
  );
}
