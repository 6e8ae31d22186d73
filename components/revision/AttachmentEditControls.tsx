"use client";
import { useState } from "react";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import { Button } from "@/components/ui/button";
import { deleteAttachment, saveCaption } from "./attachment-api";
import { CAPTION_LIMIT } from "./caption";

/** Caption editing and removal of one file of a draft, through the attachment routes. */
export function AttachmentEditControls({ attachment: a, onChanged }: { attachment: AttachmentDto; onChanged?: () => void }) {
  const [mode, setMode] = useState<"idle" | "caption" | "remove">("idle");
  const [caption, setCaption] = useState(a.caption);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const inputId = `caption-${a.id}`;

  async function run(work: () => Promise<unknown>) {
    setBusy(true);
    setError(null);
    try {
      await work();
      setMode("idle");
      onChanged?.();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="mt-2 grid gap-2" data-testid="attachment-edit">
      {mode === "caption" && (
        <form className="grid gap-2" onSubmit={(e) => { e.preventDefault(); void run(() => saveCaption(a.id, caption)); }}>
          <label htmlFor={inputId} className="text-sm font-medium">Caption for {a.name}</label>
          <textarea id={inputId} value={caption} maxLength={CAPTION_LIMIT} rows={2} onChange={(e) => setCaption(e.target.value)}
            aria-invalid={error ? true : undefined} aria-describedby={error ? `${inputId}-error` : undefined}
            className="block min-h-11 w-full rounded-md border border-line bg-card px-3 py-2 text-base" />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" disabled={busy}>{busy ? "Saving…" : "Save caption"}</Button>
            <Button type="button" variant="quiet" onClick={() => { setMode("idle"); setCaption(a.caption); setError(null); }}>Cancel</Button>
          </div>
        </form>
      )}
      {mode === "remove" && (
        <div className="grid gap-2 rounded-md border border-danger bg-danger-soft p-3" role="group" aria-label={`Remove ${a.name}`}>
          <p className="text-sm text-danger">Take “{a.name}” off this draft? The file will be deleted.</p>
          <div className="flex flex-wrap gap-2">
            <Button type="button" variant="danger" disabled={busy} onClick={() => void run(() => deleteAttachment(a.id))}>{busy ? "Removing…" : "Yes, remove it"}</Button>
            <Button type="button" variant="quiet" onClick={() => { setMode("idle"); setError(null); }}>Keep it</Button>
          </div>
        </div>
      )}
      {mode === "idle" && (
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" onClick={() => { setCaption(a.caption); setMode("caption"); }}>Edit caption</Button>
          <Button type="button" variant="quiet" onClick={() => setMode("remove")}>Remove</Button>
        </div>
      )}
      {error && <p id={`${inputId}-error`} role="alert" className="text-sm font-medium text-danger">{error}</p>}
    </div>
  );
}
