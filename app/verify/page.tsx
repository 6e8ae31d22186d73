import type { Metadata } from "next";
import { RecordVerifier } from "@/components/trail/RecordVerifier";

export const metadata: Metadata = { title: "Verify a record" };

export default function VerifyPage() {
  return (
    <div className="mx-auto max-w-2xl">
      <h1 className="mb-2 text-3xl font-semibold">Verify a decision record</h1>
      <p className="mb-6 text-ink-soft">
        Drop a record file downloaded from a commission's trail. Your browser recomputes every hash itself —
        nothing is sent anywhere — and tells you whether the chain holds and what its final hash is. Give it
        the trail head quoted in a decision mail or on the printed record, and it also tells you whether the file
        reaches that head, so that a record cut short or rewritten at its end is caught.
      </p>
      <RecordVerifier />
    </div>
  );
}
