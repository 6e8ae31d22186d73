"use client";
import { useRef, useState } from "react";
import { useDropzone } from "react-dropzone";
import { Button } from "@/components/ui/button";
import { CAPTION_LIMIT } from "./caption";
import { uploadAttachment } from "./attachment-api";
import { ACCEPT_ATTRIBUTE, precheck } from "./upload-precheck";

export interface AttachmentUploaderProps {
  revisionId: number;
  /** Files the revision already holds (for the early count check; the server decides). */
  existingCount: number;
  /** Called after each file the server accepts. */
  onUploaded?: () => void;
}

type Status = "ready" | "uploading" | "done" | "refused";
interface Item { key: number; file: File; name: string; caption: string; status: Status; progress: number; message: string | null }

let nextKey = 1;

/** Drop or pick drawings, renders and PDFs; each goes up on its own with a progress bar and its own answer. */
export function AttachmentUploader({ revisionId, existingCount, onUploaded }: AttachmentUploaderProps) {
  const [items, setItems] = useState<Item[]>([]);
  const [busy, setBusy] = useState(false);
  const aborts = useRef(new Map<number, () => void>());
  const patch = (key: number, change: Partial<Item>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));

  const onDrop = (files: File[]) => {
    setItems((all) => {
      let taken = existingCount + all.filter((i) => i.status === "ready" || i.status === "uploading").length;
      const added = files.map((file): Item => {
        const { safeName, problem } = precheck(file, taken);
        if (!problem) taken += 1;
        return { key: nextKey++, file, name: safeName, caption: "", status: problem ? "refused" : "ready", progress: 0, message: problem };
      });
      return [...all, ...added];
    });
  };
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({ onDrop, multiple: true, noClick: true, noKeyboard: true });

  async function uploadAll() {
    setBusy(true);
    for (const item of items.filter((i) => i.status === "ready")) {
      patch(item.key, { status: "uploading", progress: 0, message: null });
      const { promise, abort } = uploadAttachment(revisionId, item.file, item.caption, (p) => patch(item.key, { progress: p }));
      aborts.current.set(item.key, abort);
      const outcome = await promise;
      aborts.current.delete(item.key);
      if (outcome.ok) {
        patch(item.key, { status: "done", progress: 1, message: null });
        onUploaded?.();
      } else {
        patch(item.key, { status: outcome.aborted || outcome.retry ? "ready" : "refused", progress: 0, message: outcome.message });
      }
    }
    setBusy(false);
  }

  const ready = items.filter((i) => i.status === "ready").length;
  return (
    <section className="grid gap-3" data-testid="attachment-uploader" aria-label="Add drawings and files">
      <div {...getRootProps({ className: `grid place-items-center gap-2 rounded-lg border-2 border-dashed p-6 text-center ${isDragActive ? "border-action bg-paper-deep" : "border-line bg-card"}` })}>
        <input {...getInputProps({ accept: ACCEPT_ATTRIBUTE })} aria-label="Choose files to attach" data-testid="attachment-input" />
        <p className="text-ink-soft">{isDragActive ? "Drop the files here." : "Drop drawings, renders or PDFs here, or"}</p>
        <Button type="button" variant="secondary" onClick={open}>Choose files</Button>
        <p className="text-sm text-ink-soft">PNG, JPEG, WebP or PDF · up to 25 MB each</p>
      </div>

      {items.length > 0 && (
        <ul className="grid gap-3" aria-label="Files to attach">
          {items.map((item) => (
            <li key={item.key} className="rounded-lg border border-line bg-card p-3" data-testid="upload-item" data-status={item.status}>
              <div className="flex flex-wrap items-center justify-between gap-2">
                <span className="min-w-0 break-words font-medium">{item.name}</span>
                {item.status === "done" && <span className="text-sm font-medium text-ok">Attached</span>}
                {item.status === "uploading" && <Button type="button" variant="quiet" onClick={() => aborts.current.get(item.key)?.()}>Stop</Button>}
                {(item.status === "ready" || item.status === "refused") && (
                  <Button type="button" variant="quiet" disabled={busy && item.status === "ready"} onClick={() => setItems((all) => all.filter((i) => i.key !== item.key))}>
                    Take off the list
                  </Button>
                )}
              </div>
              {item.status === "ready" && (
                <label className="mt-2 block text-sm font-medium">
                  Caption (optional)
                  <input type="text" value={item.caption} maxLength={CAPTION_LIMIT} disabled={busy}
                    onChange={(e) => patch(item.key, { caption: e.target.value })}
                    className="mt-1 block min-h-11 w-full rounded-md border border-line bg-card px-3 py-2 text-base font-normal" />
                </label>
              )}
              {(item.status === "uploading" || item.status === "done") && (
                <div role="progressbar" aria-label={`Uploading ${item.name}`} aria-valuemin={0} aria-valuemax={100}
                  aria-valuenow={Math.round(item.progress * 100)} className="mt-2 h-3 overflow-hidden rounded-full bg-paper-deep">
                  <div className={`h-full ${item.status === "done" ? "bg-ok" : "bg-action"} transition-[width]`} style={{ width: `${Math.round(item.progress * 100)}%` }} />
                </div>
              )}
              {item.message && <p role="alert" className="mt-2 rounded-md bg-danger-soft px-3 py-2 text-sm text-danger">{item.message}</p>}
            </li>
          ))}
        </ul>
      )}

      {ready > 0 && (
        <Button type="button" onClick={uploadAll} disabled={busy} className="justify-self-start">
          {busy ? "Uploading…" : `Upload ${ready} file${ready === 1 ? "" : "s"}`}
        </Button>
      )}
      {items.some((i) => i.status === "done" || i.status === "refused") && !busy && (
        <Button type="button" variant="quiet" className="justify-self-start"
          onClick={() => setItems((all) => all.filter((i) => i.status === "ready" || i.status === "uploading"))}>
          Clear finished
        </Button>
      )}
    </section>
  );
}
