"use client";
import { Button } from "@/components/ui/button";

export default function StudioError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="mx-auto max-w-md py-10">
      <h1 className="mb-3 text-3xl font-semibold">Something went wrong</h1>
      <p className="mb-4 text-ink-soft">The studio page could not be loaded. Saved settings are unchanged.</p>
      <Button onClick={reset}>Try again</Button>
    </div>
  );
}
