"use client";
import { Button } from "@/components/ui/button";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="mx-auto max-w-md py-10">
      <h1 className="mb-3 text-3xl font-semibold">Something went wrong</h1>
      <p className="mb-4 text-ink-soft">The page could not be loaded. Nothing you entered has been lost on the server.</p>
      <Button onClick={reset}>Try again</Button>
    </div>
  );
}
