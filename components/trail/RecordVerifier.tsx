"use client";

import { useCallback, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { Button } from "@/components/ui/button";
import { WebCryptoUnavailableError, parseHead, parseRecordText, verifyRecordAsync, type TrailHead, type TrailRecord } from "@/models/trail";
import { VerifyOutcome, type VerifyState } from "./VerifyOutcome";

const MAX_BYTES = 100 * 1024 * 1024;

type Loaded = { fileName: string; record: TrailRecord };

/** The head typed in, read; "" means none was given. */
function readHead(text: string): { head: TrailHead | null; error: string | null } {
  if (text.trim() === "") return { head: null, error: null };
  const parsed = parseHead(text);
  return parsed.ok ? { head: parsed.head, error: null } : { head: null, error: parsed.message };
}

/** Checks a downloaded record in this browser, optionally against a head quoted in a mail or the PDF: nothing is sent anywhere. */
export function RecordVerifier() {
  const [state, setState] = useState<VerifyState>({ kind: "idle" });
  const [loaded, setLoaded] = useState<Loaded | null>(null);
  const [headText, setHeadText] = useState("");
  const headError = readHead(headText).error;

  const check = useCallback(async (file: Loaded, text: string) => {
    const { head, error } = readHead(text);
    if (error) return setState({ kind: "refused", fileName: file.fileName, message: `The trail head you gave cannot be read: ${error}` });
    try {
      const result = await verifyRecordAsync(file.record, head ?? undefined);
      setState({ kind: "done", fileName: file.fileName, record: file.record, result, quoted: head });
    } catch (err) {
      const message = err instanceof WebCryptoUnavailableError ? err.message : "The file could not be read. Try downloading the record again.";
      setState({ kind: "refused", fileName: file.fileName, message });
    }
  }, []);

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
      const next = { fileName: file.name, record: parsed.record };
      setLoaded(next);
      await check(next, headText);
    } catch {
      setState({ kind: "refused", fileName: file.name, message: "The file could not be read. Try downloading the record again." });
    }
  }, [check, headText]);

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    onDrop,
    accept: { "application/json": [".json"] },
    maxFiles: 1,
    maxSize: MAX_BYTES,
    noClick: true,
    noKeyboard: true,
  });

  const onHead = (text: string) => {
    setHeadText(text);
    if (loaded && !readHead(text).error) void check(loaded, text);
  };

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
      <div className="space-y-1">
        <label className="block font-medium" htmlFor="expected-head">
          Trail head from a decision mail or the printed record (optional)
        </label>
        <p className="text-sm text-ink-soft" id="expected-head-help">
          Paste the line &ldquo;event N, hash …&rdquo;. The file must reach it: its event N must carry that hash.
        </p>
        <textarea
          id="expected-head"
          rows={2}
          value={headText}
          onChange={(e) => onHead(e.target.value)}
          aria-describedby="expected-head-help"
          aria-invalid={headError ? true : undefined}
          autoComplete="off"
          spellCheck={false}
          className="block w-full rounded-md border border-line bg-card px-3 py-2 font-mono text-sm"
        />
        {headError && <p className="text-sm text-danger" role="alert">{headError}</p>}
      </div>
      <p className="text-sm text-ink-soft">
        The check runs in this browser with its own SHA-256. The file is not uploaded and no one is told you checked it.
      </p>
      <div aria-live="polite">
        <VerifyOutcome state={state} onReset={() => { setState({ kind: "idle" }); setLoaded(null); }} />
      </div>
    </div>
  );
}
