"use client";

import { useCallback, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { Button } from "@/components/ui/button";
import {
  WebCryptoUnavailableError,
  parseRecordText,
  verifyRecordAsync,
  type ChainFailureReason,
  type TrailRecord,
  type VerifyResult,
} from "@/models/trail";

const MAX_BYTES = 100 * 1024 * 1024;

type State =
  | { kind: "idle" }
  | { kind: "checking"; fileName: string }
  | { kind: "refused"; fileName: string | null; message: string }
  | { kind: "done"; fileName: string; record: TrailRecord; result: VerifyResult };

const WHY: Record<ChainFailureReason, string> = {
  "hash mismatch": "What is written no longer matches its hash.",
  gap: "The numbering of the events skips or repeats.",
  "broken link": "An event does not point to the one before it.",
  "wrong commission": "An event belongs to a different commission.",
  malformed: "An event is not in the form a trail event takes.",
};

/** Checks a downloaded record in this browser: nothing is sent anywhere. */
export function RecordVerifier() {
  const [state, setState] = useState<State>({ kind: "idle" });

  const onDrop = useCallback(async (accepted: File[], rejected: FileRejection[]) => {
    if (rejected.length > 0 || accepted.length !== 1) {
      const first = rejected[0];
      const tooBig = first?.errors.some((e) => e.code === "file-too-large");
      const message = tooBig
        ? "That file is larger than 100 MB, which is more than any trail record."
        : accepted.length + rejected.length > 1
          ? "Choose one record file at a time."
          : "That is not a JSON file. Choose the record file (.json) you downloaded.";
      setState({ kind: "refused", fileName: first?.file.name ?? null, message });
      return;
    }
    const file = accepted[0];
    setState({ kind: "checking", fileName: file.name });
    try {
      const parsed = parseRecordText(await file.text());
      if (!parsed.ok) return setState({ kind: "refused", fileName: file.name, message: parsed.message });
      const result = await verifyRecordAsync(parsed.record);
      setState({ kind: "done", fileName: file.name, record: parsed.record, result });
    } catch (err) {
      const message =
        err instanceof WebCryptoUnavailableError ? err.message : "The file could not be read. Try downloading the record again.";
      setState({ kind: "refused", fileName: file.name, message });
    }
  }, []);

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    onDrop,
    accept: { "application/json": [".json"] },
    maxFiles: 1,
    maxSize: MAX_BYTES,
    noClick: true,
    noKeyboard: true,
  });

  return (
    <div className="space-y-6">
      <div
        {...getRootProps({
          className: `flex min-h-44 flex-col items-center justify-center gap-3 rounded-lg border-2 border-dashed p-6 text-center ${
            isDragActive ? "border-action bg-paper-deep" : "border-line bg-card"
          }`,
        })}
      >
        <input {...getInputProps({ "aria-label": "Record file" })} />
        <p className="font-serif text-xl">{isDragActive ? "Drop the record here" : "Drop a decision record here"}</p>
        <p className="text-ink-soft">The JSON file downloaded from a commission&rsquo;s trail.</p>
        <Button type="button" onClick={open}>
          Choose a file
        </Button>
      </div>
      <p className="text-sm text-ink-soft">
        The check runs in this browser with its own SHA-256. The file is not uploaded and no one is told you checked it.
      </p>
      <div aria-live="polite">
        <Outcome state={state} onReset={() => setState({ kind: "idle" })} />
      </div>
    </div>
  );
}

function Outcome({ state, onReset }: { state: State; onReset: () => void }) {
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
  const { record, result, fileName } = state;
  const about = (
    <p className="mt-1 text-sm text-ink-soft">
      {record.commission.title} (commission {record.commission.id}) · exported {record.exportedAt} · {fileName}
    </p>
  );
  if (!result.ok) {
    return (
      <section className="rounded-lg border border-danger bg-danger-soft p-4 sm:p-5">
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
      <FinalHash hash={result.finalHash} />
      <Again onReset={onReset} />
    </section>
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
