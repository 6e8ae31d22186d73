import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";

export const metadata: Metadata = { title: "Confirm sign-in" };

/**
 * The e-mailed link lands here. Opening the page changes nothing (mail scanners open links before people
 * do); the button posts, and only then is the one-time link used.
 */
export default async function ConfirmPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const { token, email, next } = await searchParams;
  if (!token || !email) {
    return (
      <div className="mx-auto max-w-md">
        <h1 className="mb-4 text-3xl font-semibold">This link is incomplete</h1>
        <Card><p>Copy the whole link from the e-mail, or <a href="/sign-in">ask for a new one</a>.</p></Card>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-4 text-3xl font-semibold">Sign in to Placet</h1>
      <Card>
        <p className="mb-4">You are signing in as <strong className="break-all">{email}</strong>.</p>
        <form method="post" action="/sign-in/confirm/complete">
          <input type="hidden" name="token" value={token} />
          <input type="hidden" name="email" value={email} />
          <input type="hidden" name="next" value={next ?? ""} />
          <button type="submit" className={buttonClass("primary", "w-full")}>Sign in</button>
        </form>
        <p className="mt-4 text-sm text-ink-soft">Not you? Close this page; nothing has happened yet.</p>
      </Card>
    </div>
  );
}
