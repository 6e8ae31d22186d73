"use client";
import { useState } from "react";
import type { CommentDto } from "@/models/comments";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/field";
import { patchComment } from "./api";
import { formatWhen, useCommentChange } from "./hooks";

/** One comment: who, when, the words as plain text, and the author's edit while the window is open. */
export function CommentText({ c, revisionId, now, skewMs }: { c: CommentDto; revisionId: number; now: number; skewMs: number }) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(c.body);
  const save = useCommentChange(revisionId, (body: string) => patchComment(c.id, body), () => setEditing(false));
  const left = c.editableUntil ? new Date(c.editableUntil).getTime() - (now + skewMs) : 0;
  const minutes = Math.max(1, Math.ceil(left / 60_000));
  const fieldId = `edit-${c.id}`;

  return (
    <div className="grid gap-1" data-testid="comment" data-comment-id={c.id}>
      <p className="text-sm text-ink-soft">
        <span className="font-semibold text-ink">{c.author.name}</span> · {c.author.roleLabel} · <time dateTime={c.createdAt}>{formatWhen(c.createdAt)}</time>
        {c.editedAt && <span> · edited</span>}
      </p>
      {editing ? (
        <form onSubmit={(e) => { e.preventDefault(); save.mutate(draft); }}>
          <TextArea label="Change your comment" name={fieldId} rows={3} value={draft} onChange={(e) => setDraft(e.target.value)}
            error={save.error?.fields.body ?? save.error?.message} maxLength={4000} />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" disabled={save.isPending}>{save.isPending ? "Saving…" : "Save"}</Button>
            <Button type="button" variant="quiet" onClick={() => { setEditing(false); setDraft(c.body); save.reset(); }}>Cancel</Button>
          </div>
        </form>
      ) : (
        <p className="whitespace-pre-wrap break-words" data-testid="comment-body">{c.body}</p>
      )}
      {!editing && left > 0 && (
        <div>
          <Button type="button" variant="quiet" className="-ml-4" onClick={() => { setDraft(c.body); setEditing(true); }}>
            Edit <span className="text-sm font-normal text-ink-soft">({minutes} min left)</span>
          </Button>
        </div>
      )}
    </div>
  );
}
