"use client";
import { useMemo, useState } from "react";
import type { RevisionDto } from "@/lib/dal/revisions-read";
import { modelFont, type FontFigures as Figures, type FontParameters, type LengthUnit } from "@/models/font";
import { FontFigures, FontViewer } from "@/components/font";
import { Badge } from "@/components/ui/card";
import { CopyHash } from "@/components/copy-hash";
import { Gallery } from "./Gallery";
import { UnitsToggle } from "./UnitsToggle";
import { useRevision } from "./use-revision";
import { CommentsPanel } from "@/components/comments/CommentsPanel";
import { ImagePins } from "@/components/comments/ImagePins";
import { threadModelPins, useCommentThreads } from "@/components/comments/use-comment-threads";
import { tapTarget, type CommentTarget } from "@/models/comments";
import { BallotPanel } from "@/components/ballot/BallotPanel";
import { DecisionForm } from "@/components/ballot/DecisionForm";
import { DecisionSummary } from "@/components/ballot/DecisionSummary";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeStyle: "short", timeZone: "UTC" });

/** The revision as the committee reads it on a phone: render, note, ballot, figures, model, drawings, comments. */
export function RevisionView({ initial, commissionId }: { initial: RevisionDto; commissionId: number }) {
  const { data: rev = initial } = useRevision(initial.id, initial);
  const [units, setUnits] = useState<LengthUnit>(initial.you.units);
  const [target, setTarget] = useState<CommentTarget | null>(null);
  const [focused, setFocused] = useState<number | null>(null);
  const threads = useCommentThreads(rev.id);
  // The form worked out once, with the figures the server sent rather than working them out again.
  const model = useMemo(() => modelFont(rev.params as FontParameters, rev.figures as Figures | null), [rev.params, rev.figures]);
  const pick = (t: CommentTarget) => { if (rev.you.canComment) { setTarget(t); document.getElementById("comments")?.scrollIntoView({ behavior: "smooth" }); } };

  return (
    <article className="grid gap-5" data-testid="revision-view">
      <header className="grid gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <h2 className="font-serif text-3xl font-semibold">Revision {rev.number}</h2>
          <Badge tone={rev.state === "circulated" ? "action" : rev.state === "decided" ? "ok" : "neutral"}>{rev.stateLabel}</Badge>
        </div>
        {rev.contentHash && (
          <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft" data-testid="content-hash" data-hash={rev.contentHash}>
            Content hash <CopyHash hash={rev.contentHash} label="content hash" />
          </p>
        )}
        {rev.circulatedAt && (
          <p className="text-sm text-ink-soft">
            Circulated {when.format(new Date(rev.circulatedAt))} UTC{rev.circulatedBy ? ` by ${rev.circulatedBy}` : ""}
          </p>
        )}
      </header>

      <section aria-labelledby="note-h" className="rounded-lg border border-line bg-card p-4">
        <h3 id="note-h" className="mb-1 font-serif text-xl font-semibold">What changed and why</h3>
        <p className="whitespace-pre-line" data-testid="revision-note">{rev.note}</p>
      </section>

      <section aria-labelledby="files-h" className="grid gap-2">
        <h3 id="files-h" className="font-serif text-2xl font-semibold">Drawings and renders</h3>
        {rev.you.canComment && rev.attachments.length > 0 && <p className="text-sm text-ink-soft">Open a drawing and tap it to comment on that spot.</p>}
        {rev.attachments.length ? (
          <Gallery attachments={rev.attachments} closeOnImageClick
            renderOverlay={(a) => <ImagePins attachmentId={a.id} threads={threads.data ?? []} onOpen={(id) => { setFocused(id); document.getElementById("comments")?.scrollIntoView({ behavior: "smooth" }); }} />}
            onImageClick={rev.you.canComment ? (a, x, y) => pick(tapTarget(a.id, x, y)) : undefined} />
        ) : <p className="text-ink-soft">No drawings attached to this revision.</p>}
      </section>

      {rev.state !== "draft" && (
        <section aria-labelledby="decide-h" className="grid gap-4">
          <h3 id="decide-h" className="sr-only">Ballot and decision</h3>
          <DecisionSummary revisionId={rev.id} />
          <BallotPanel revisionId={rev.id} commissionId={commissionId} />
          {rev.contentHash && rev.state === "circulated" && <DecisionForm revisionId={rev.id} contentHash={rev.contentHash} number={rev.number} />}
        </section>
      )}

      <section aria-labelledby="fig-h" className="grid gap-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 id="fig-h" className="font-serif text-2xl font-semibold">Figures</h3>
          <UnitsToggle units={units} onChange={setUnits} />
        </div>
        {rev.figures ? <FontFigures figures={model.figures} units={units} /> : <p className="text-danger">The model's values do not make a valid font yet.</p>}
      </section>

      <section aria-labelledby="model-h" className="grid gap-2">
        <h3 id="model-h" className="font-serif text-2xl font-semibold">The model</h3>
        {rev.you.canComment && <p className="text-sm text-ink-soft">Tap the model to comment on that exact spot.</p>}
        <FontViewer model={model} units={units} pins={threadModelPins(threads.data ?? [])}
          onPinSelect={(id) => { setFocused(Number(id)); document.getElementById(`comment-${id}`)?.scrollIntoView({ behavior: "smooth" }); }}
          onPickPoint={rev.you.canComment ? (part, point) => pick({ kind: "model", part, point }) : undefined} />
      </section>

      {rev.state !== "draft" && (
        <section id="comments" aria-labelledby="comments-h" className="scroll-mt-4">
          <h3 id="comments-h" className="mb-2 font-serif text-2xl font-semibold">Comments</h3>
          <CommentsPanel units={units} revisionId={rev.id} attachments={rev.attachments} canComment={rev.you.canComment} canResolve={rev.you.canResolve}
            pendingTarget={target} onClearTarget={() => setTarget(null)} focusedThreadId={focused} onFocusThread={setFocused} />
        </section>
      )}
    </article>
  );
}
