"use client";
import { useRef, useState, useTransition, type ReactNode } from "react";
import { useRouter } from "next/navigation";
import { FontEditor } from "@/components/font";
import { Button } from "@/components/ui/button";
import { TextArea, FormError } from "@/components/ui/field";
import type { FontParameters, StudioSettings } from "@/models/font";
import { saveDraftAction, circulateAction, type SaveResult } from "@/app/commissions/[commissionId]/revisions/[number]/edit/actions";

interface Props {
  commissionId: number;
  number: number;
  initialParams: FontParameters;
  initialNote: string;
  studioSettings: StudioSettings;
  units: "mm" | "in";
  committeeCount: number;
  /** the uploader and gallery, rendered between the model and the circulate step */
  attachments: ReactNode;
}

/** The designer's draft: the model with live figures, the note, the files, then circulate. */
export function DraftEditor({ commissionId, number, initialParams, initialNote, studioSettings, units, committeeCount, attachments }: Props) {
  const router = useRouter();
  const params = useRef<FontParameters>(initialParams);
  const [valid, setValid] = useState(true);
  const [note, setNote] = useState(initialNote);
  const [result, setResult] = useState<SaveResult | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [pending, start] = useTransition();

  const save = () => start(async () => setResult(await saveDraftAction(commissionId, number, params.current, note)));
  const send = () =>
    start(async () => {
      const r = await circulateAction(commissionId, number, params.current, note);
      setResult(r);
      setConfirming(false);
      if (r.ok) router.push(`/commissions/${commissionId}/revisions/${number}`);
    });

  return (
    <div className="grid gap-5">
      <section aria-labelledby="model-h">
        <h2 id="model-h" className="mb-2 text-2xl font-semibold">The model</h2>
        <FontEditor initialParams={initialParams} studioSettings={studioSettings} initialUnits={units}
          onChange={(p, ok) => { params.current = p; setValid(ok); }} />
      </section>
      <section aria-labelledby="note-h" className="rounded-lg border border-line bg-card p-4">
        <h2 id="note-h" className="mb-2 text-2xl font-semibold">What changed and why</h2>
        <TextArea label="Note to the committee" name="note" rows={5} value={note} onChange={(e) => setNote(e.target.value)}
          error={result?.errors?.note} hint="Plain words: what is different from the last revision, and why. The committee reads this first." />
        <div className="flex flex-wrap items-center gap-3">
          <Button type="button" variant="secondary" onClick={save} disabled={pending || !valid}>{pending ? "Saving…" : "Save the draft"}</Button>
          {!valid && <span className="text-sm text-danger">Fix the highlighted values first.</span>}
        </div>
      </section>
      <section aria-labelledby="files-h" className="rounded-lg border border-line bg-card p-4">
        <h2 id="files-h" className="mb-2 text-2xl font-semibold">Drawings, renders and photos</h2>
        {attachments}
      </section>
      <section aria-labelledby="circ-h" className="rounded-lg border border-action bg-card p-4">
        <h2 id="circ-h" className="mb-2 text-2xl font-semibold">Circulate to the committee</h2>
        <p className="mb-3 text-ink-soft">
          Circulating freezes Revision {number} — the model, its figures, the note and the files — under a content hash, and
          e-mails the {committeeCount} people on the committee. Nothing in it can change afterwards; a later change becomes a new revision.
        </p>
        <FormError message={result && !result.ok ? result.message : undefined} />
        {result?.ok && <p role="status" className="mb-3 text-ok">{result.message}</p>}
        {!confirming ? (
          <Button type="button" onClick={() => setConfirming(true)} disabled={pending || !valid}>Circulate Revision {number}…</Button>
        ) : (
          <div className="flex flex-wrap gap-3">
            <Button type="button" onClick={send} disabled={pending}>{pending ? "Circulating…" : `Yes, freeze and circulate Revision ${number}`}</Button>
            <Button type="button" variant="quiet" onClick={() => setConfirming(false)} disabled={pending}>Not yet</Button>
          </div>
        )}
      </section>
    </div>
  );
}
