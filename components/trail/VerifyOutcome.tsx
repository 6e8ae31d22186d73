"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatHead, type ChainFailureReason, type TrailHead, type TrailRecord, type VerifyResult } from "@/models/trail";

export type VerifyState =
  | { kind: "idle" }
  | { kind: "checking"; fileName: string }
  | { kind: "refused"; fileName: string | null; message: string }
  | { kind: "done"; fileName: string; record: TrailRecord; result: VerifyResult; quoted: TrailHead | null };

const WHY: Record<ChainFailureReason, string> = {
  "hash mismatch": "What is written no longer matches its hash.",
  gap: "The numbering of the events skips or repeats.",
  "broken link": "An event does not point to the one before it.",
  "wrong commission": "An event belongs to a different commission.",
  malformed: "An event is not in the form a trail event takes.",
  shortened: "The chain stops before the head it must reach: events have been removed from its end.",
  "head mismatch": "The chain does not reach the head it must: it has been rewritten.",
};

/** What the check found, in plain words. */
export function VerifyOutcome({ state, onReset }: { state: VerifyState; onReset: () => void }) {
  if (state.kind === "idle") return null;
  if (state.kind === "checking") return <p className="text-ink-soft">Checking {state.fileName}…</p>;
  if (state.kind === "refused") {
    return (
      <section className="rounded-lg border border-danger bg-danger-soft p-4 sm:p-5">
        <h2 className="font-serif text-2xl text-danger">This file cannot be checked</h2>
        {state.fileName && <p className="mt-1 text-sm text-ink-soft">{state.fileName}</p>}
        <p className="mt-3">{state.message}</p>
        <Again onReset={onReset} />
      </section>
    );
  }
  const { record, result, fileName, quoted } = state;
  const about = (
    <p className="mt-1 text-sm text-ink-soft">
      {record.commission.title} (commission {record.commission.id}) · exported {record.exportedAt} · {fileName}
    </p>
  );
  if (!result.ok) {
    return (
      <section className="rounded-lg border border-danger bg-danger-soft p-4 sm:p-5" data-testid="verify-failed">
        <h2 className="font-serif text-2xl text-danger">The chain does not hold</h2>
        {about}
        <dl className="mt-4 grid gap-x-4 gap-y-2 sm:grid-cols-[max-content_1fr]">
          <dt className="font-medium">Events in the file</dt>
          <dd>{record.events.length}</dd>
          <dt className="font-medium">First failing event</dt>
          <dd>Number {result.seq}</dd>
          <dt className="font-medium">Why</dt>
          <dd>
            {WHY[result.reason]}
            <span className="mt-1 block text-sm text-ink-soft">{result.message}</span>
          </dd>
        </dl>
        <Again onReset={onReset} />
      </section>
    );
  }
  return (
    <section className="rounded-lg border border-line bg-card p-4 sm:p-5">
      <h2 className="font-serif text-2xl">The chain holds</h2>
      {about}
      <p className="mt-3">
        All {result.count} {result.count === 1 ? "event is" : "events are"} in order, linked one to the next, and unchanged since
        they were recorded.
      </p>
      <HeadFindings record={record} quoted={quoted} />
      <FinalHash hash={result.finalHash} />
      <Again onReset={onReset} />
    </section>
  );
}

function HeadFindings({ record, quoted }: { record: TrailRecord; quoted: TrailHead | null }) {
  return (
    <div className="mt-3 space-y-2" data-testid="head-findings">
      {record.head ? (
        <p>It ends exactly at the commission&rsquo;s head recorded in the file ({formatHead(record.head)}).</p>
      ) : (
        <p className="text-ink-soft">This file does not carry the commission&rsquo;s head.</p>
      )}
      {quoted ? (
        <p className="font-medium text-ok">It reaches the head you gave: event {quoted.seq} carries the hash {quoted.hash.slice(0, 12)}….</p>
      ) : (
        <p className="text-sm text-ink-soft">
          To be sure nothing was cut from its end, give the trail head quoted in a decision mail or on the printed record above.
        </p>
      )}
    </div>
  );
}

function FinalHash({ hash }: { hash: string }) {
  const [copied, setCopied] = useState<"no" | "yes" | "failed">("no");
  const [printed, setPrinted] = useState("");
  const typed = printed.replace(/[\s:-]/g, "").toLowerCase();
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(hash);
      setCopied("yes");
      setTimeout(() => setCopied("no"), 2500);
    } catch {
      setCopied("failed");
    }
  };
  return (
    <div className="mt-4 space-y-3">
      <p className="font-medium">Final hash</p>
      <div className="flex flex-wrap items-center gap-3">
        <code className="select-all break-all rounded bg-record-soft px-2 py-1.5 font-mono text-sm text-record" data-testid="final-hash">
          {hash}
        </code>
        <Button type="button" variant="secondary" onClick={copy}>
          {copied === "yes" ? "Copied" : "Copy"}
        </Button>
      </div>
      {copied === "failed" && <p className="text-sm text-ink-soft">Copying is blocked here: select the hash and copy it by hand.</p>}
      <label className="block text-sm font-medium" htmlFor="printed-hash">
        Compare with the final hash printed on the decision record
      </label>
      <input
        id="printed-hash"
        value={printed}
        onChange={(e) => setPrinted(e.target.value)}
        autoComplete="off"
        spellCheck={false}
        className="block min-h-11 w-full rounded-md border border-line bg-card px-3 py-2 font-mono text-sm"
      />
      {typed !== "" &&
        (typed === hash ? (
          <p className="font-medium text-ok">It matches the printed record.</p>
        ) : (
          <p className="font-medium text-danger">
            It does not match: this file is not the chain the printed record describes
            {typed.length !== 64 ? ` (a full hash has 64 characters; ${typed.length} typed)` : ""}.
          </p>
        ))}
    </div>
  );
}

function Again({ onReset }: { onReset: () => void }) {
  return (
    <Button type="button" variant="quiet" className="mt-4" onClick={onReset}>
      Check another file
    </Button>
  );
}
