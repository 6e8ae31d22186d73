import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Check your inbox" };

export default function CheckInboxPage() {
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-4 text-3xl font-semibold">Check your inbox</h1>
      <Card>
        <p className="mb-3">If that address has been invited to Placet, a sign-in link is on its way to it.</p>
        <p className="mb-3 text-ink-soft">The link works once, for 10 minutes. Open it on this device or any other.</p>
        <p className="text-ink-soft">Nothing arrived? Look in the spam folder, or <Link href="/sign-in">ask for another link</Link>.</p>
      </Card>
    </div>
  );
}
