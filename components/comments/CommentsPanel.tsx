"use client";
import { useMemo } from "react";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import type { CommentTarget } from "@/models/comments";
import type { LengthUnit } from "@/models/font";
import { Composer } from "./Composer";
import { NoticePreference } from "./NoticePreference";
import { ThreadCard } from "./ThreadCard";
import { useNow } from "./hooks";
import { useComments } from "./use-comment-threads";

export interface CommentsPanelProps {
  revisionId: number;
  attachments: AttachmentDto[];
  canComment: boolean;
  canResolve: boolean;
  /** Where the next comment goes, picked on a drawing or the model; none means the whole revision. */
  pendingTarget?: CommentTarget | null;
  onClearTarget?: () => void;
  /** Asks the page to show a thread's pin (open the drawing, turn to the point). */
  onFocusThread?: (commentId: number) => void;
  focusedThreadId?: number | null;
  /** Units for describing points on the model; millimetres unless given. */
  units?: LengthUnit;
}

/** The revision's comment threads: open ones first, resolved ones folded away below, and a box for a new one. */
export function CommentsPanel({ revisionId, attachments, canComment, canResolve, pendingTarget = null, onClearTarget, onFocusThread, focusedThreadId = null, units = "mm" }: CommentsPanelProps) {
  const q = useComments(revisionId);
  const now = useNow();
  const names = useMemo(() => new Map(attachments.map((a) => [a.id, a.caption || a.name])), [attachments]);
  const skewMs = useMemo(() => (q.data ? new Date(q.data.serverTime).getTime() - q.dataUpdatedAt : 0), [q.data, q.dataUpdatedAt]);
  const threads = q.data?.threads ?? [];
  const open = threads.filter((t) => !t.resolved);
  const resolved = threads.filter((t) => t.resolved);
  const mayComment = canComment && (q.data?.you.canComment ?? true);
  const mayResolve = canResolve && (q.data?.you.canResolve ?? true);
  const card = (t: (typeof threads)[number]) => (
    <ThreadCard key={t.id} t={t} revisionId={revisionId} canComment={mayComment} canResolve={mayResolve}
      focused={focusedThreadId === t.id} onFocusThread={onFocusThread} now={now} skewMs={skewMs} />
  );

  return (
    <div className="grid gap-4" data-testid="comments-panel">
      {mayComment && (
        <Composer revisionId={revisionId} target={pendingTarget} attachmentName={(id) => names.get(id)} units={units} onClearTarget={onClearTarget} />
      )}
      {q.isPending && <p className="text-ink-soft">Loading comments…</p>}
      {q.isError && !q.data && <p role="alert" className="text-danger">{q.error.message}</p>}
      {q.data && (
        <>
          <p className="text-sm text-ink-soft" aria-live="polite">
            {threads.length === 0 ? "No comments yet." : `${open.length} open ${open.length === 1 ? "thread" : "threads"}${resolved.length ? `, ${resolved.length} resolved` : ""}.`}
          </p>
          {open.length > 0 && <ol className="grid gap-3" aria-label="Open comment threads">{open.map(card)}</ol>}
          {resolved.length > 0 && (
            <section aria-label="Resolved comment threads" className="grid gap-3">
              <h4 className="font-serif text-lg font-semibold">Resolved</h4>
              <ol className="grid gap-3">{resolved.map(card)}</ol>
            </section>
          )}
          <NoticePreference initial={q.data.you.notices} />
          <p className="text-sm">
            <a href={`/api/revisions/${revisionId}/annotations`} className="inline-flex min-h-11 items-center" download>
              Download these comments as W3C Web Annotations (JSON-LD)
            </a>
          </p>
        </>
      )}
    </div>
  );
}
