"use client";
import { useEffect, useRef, useState } from "react";
import type { ThreadDto } from "@/models/comments";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/field";
import { postReply, setThreadResolved } from "./api";
import { CommentText } from "./CommentText";
import { formatWhen, useCommentChange } from "./hooks";

interface Props {
  t: ThreadDto;
  revisionId: number;
  canComment: boolean;
  canResolve: boolean;
  focused: boolean;
  onFocusThread?: (id: number) => void;
  now: number;
  skewMs: number;
}

/** A thread: its pin and place, the first comment, replies, a reply box, and the studio's resolve. */
export function ThreadCard({ t, revisionId, canComment, canResolve, focused, onFocusThread, now, skewMs }: Props) {
  const [open, setOpen] = useState(!t.resolved);
  const [replying, setReplying] = useState(false);
  const [reply, setReply] = useState("");
  const ref = useRef<HTMLLIElement>(null);
  const send = useCommentChange(revisionId, (body: string) => postReply(t.id, body), () => { setReply(""); setReplying(false); });
  const resolve = useCommentChange(revisionId, (v: boolean) => setThreadResolved(t.id, v));
  useEffect(() => {
    if (!focused) return;
    setOpen(true);
    ref.current?.scrollIntoView({ behavior: "smooth", block: "nearest" });
  }, [focused]);
  const expanded = open;
  const pinned = t.target.kind !== "revision";

  return (
    <li ref={ref} id={`comment-${t.id}`} data-testid="comment-thread" data-thread-id={t.id} data-resolved={t.resolved}
      className={`scroll-mt-4 rounded-lg border bg-card p-4 ${focused ? "border-action ring-2 ring-action" : "border-line"} ${t.resolved ? "opacity-90" : ""}`}>
      <div className="mb-2 flex flex-wrap items-center gap-2 text-sm">
        <span aria-label={`Comment ${t.number}`} className={`inline-flex h-7 min-w-7 items-center justify-center rounded-full px-2 font-semibold ${t.resolved ? "bg-ok-soft text-ok" : "bg-action text-action-ink"}`}>{t.number}</span>
        {pinned && onFocusThread ? (
          <button type="button" className="min-h-11 text-left text-action underline-offset-2 hover:underline" onClick={() => onFocusThread(t.id)} title="Show where this is pinned">
            {t.targetLabel}
          </button>
        ) : <span className="text-ink-soft">{t.targetLabel}</span>}
      </div>
      {t.resolved && (
        <p className="mb-2 text-sm text-ok">Resolved{t.resolvedBy ? ` by ${t.resolvedBy}` : ""}{t.resolvedAt ? `, ${formatWhen(t.resolvedAt)}` : ""}.</p>
      )}
      {expanded ? (
        <>
          <CommentText c={t} revisionId={revisionId} now={now} skewMs={skewMs} />
          {t.replies.length > 0 && (
            <ol className="mt-3 grid gap-3 border-l-2 border-line pl-3" aria-label="Replies">
              {t.replies.map((r) => <li key={r.id} id={`comment-${r.id}`}><CommentText c={r} revisionId={revisionId} now={now} skewMs={skewMs} /></li>)}
            </ol>
          )}
          {replying && (
            <form className="mt-3" onSubmit={(e) => { e.preventDefault(); send.mutate(reply); }}>
              <TextArea label="Your reply" name={`reply-${t.id}`} rows={3} value={reply} onChange={(e) => setReply(e.target.value)}
                error={send.error?.fields.body ?? send.error?.message} maxLength={4000} />
              <div className="flex flex-wrap gap-2">
                <Button type="submit" disabled={send.isPending}>{send.isPending ? "Sending…" : "Send reply"}</Button>
                <Button type="button" variant="quiet" onClick={() => { setReplying(false); send.reset(); }}>Cancel</Button>
              </div>
            </form>
          )}
          <div className="mt-2 flex flex-wrap gap-2">
            {canComment && !replying && <Button type="button" variant="secondary" onClick={() => setReplying(true)}>Reply</Button>}
            {canResolve && (
              <Button type="button" variant="quiet" disabled={resolve.isPending} onClick={() => resolve.mutate(!t.resolved)}>
                {t.resolved ? "Reopen thread" : "Mark resolved"}
              </Button>
            )}
            {t.resolved && <Button type="button" variant="quiet" onClick={() => setOpen(false)}>Fold away</Button>}
          </div>
          {resolve.error && <p role="alert" className="mt-1 text-sm text-danger">{resolve.error.message}</p>}
        </>
      ) : (
        <div className="flex flex-wrap items-center gap-2">
          <p className="min-w-0 flex-1 truncate text-ink-soft">{t.author.name}: {t.body}</p>
          <Button type="button" variant="quiet" aria-expanded={false} onClick={() => setOpen(true)}>
            Show thread{t.replies.length ? ` (${t.replies.length + 1} comments)` : ""}
          </Button>
        </div>
      )}
    </li>
  );
}
