"use client";
import { useState } from "react";
import { describeTarget, type CommentTarget } from "@/models/comments";
import type { LengthUnit } from "@/models/font";
import { Button } from "@/components/ui/button";
import { FormError, TextArea } from "@/components/ui/field";
import { postThread } from "./api";
import { useCommentChange } from "./hooks";

interface Props {
  revisionId: number;
  target: CommentTarget | null;
  attachmentName: (id: number) => string | undefined;
  units: LengthUnit;
  onClearTarget?: () => void;
  onPosted?: (id: number) => void;
}

/** Writing a new comment: plain text, and where it will be pinned, said in words. */
export function Composer({ revisionId, target, attachmentName, units, onClearTarget, onPosted }: Props) {
  const [body, setBody] = useState("");
  const [done, setDone] = useState(false);
  const post = useCommentChange(revisionId, ({ text, where }: { text: string; where: CommentTarget }) => postThread(revisionId, text, where), (r) => {
    setBody("");
    setDone(true);
    onClearTarget?.();
    onPosted?.(r.id);
  });
  const where = describeTarget(target ?? { kind: "revision" }, { attachmentName, units });
  const fieldError = post.error?.fields.body;
  const formError = post.error && !fieldError ? (post.error.fields.target ?? post.error.message) : undefined;

  return (
    <form className="rounded-lg border border-line bg-card p-4" data-testid="comment-composer"
      onSubmit={(e) => { e.preventDefault(); setDone(false); post.mutate({ text: body, where: target ?? { kind: "revision" } }); }}>
      <div className="mb-3 flex flex-wrap items-center gap-2 text-sm" data-testid="composer-target">
        <span className="text-ink-soft">Pinned</span>
        <span className="font-medium">{where}</span>
        {target && onClearTarget && (
          <Button type="button" variant="quiet" onClick={onClearTarget}>Use the whole revision instead</Button>
        )}
      </div>
      {!target && <p className="mb-2 text-sm text-ink-soft">To pin a comment to a spot, tap it on a drawing or on the model first.</p>}
      <FormError message={formError} />
      <TextArea label="Your comment" name={`new-comment-${revisionId}`} rows={4} value={body} maxLength={4000} error={fieldError}
        hint="Plain text. Mention someone with @ and their name, e.g. @Margaret." onChange={(e) => { setBody(e.target.value); setDone(false); }} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={post.isPending || !body.trim()}>{post.isPending ? "Posting…" : "Post comment"}</Button>
        <p role="status" className="text-sm text-ok">{done ? "Posted." : ""}</p>
      </div>
    </form>
  );
}
