"use client";
import { useEffect, useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { commentsKey, type CommentApiError } from "./api";

/** A change to the comments that refreshes the list for everyone on this page when it succeeds. */
export function useCommentChange<A, R>(revisionId: number, fn: (args: A) => Promise<R>, onDone?: (r: R) => void) {
  const qc = useQueryClient();
  return useMutation<R, CommentApiError, A>({
    mutationFn: fn,
    onSuccess: async (r) => {
      onDone?.(r);
      await qc.invalidateQueries({ queryKey: commentsKey(revisionId) });
    },
  });
}

/** The time now, ticking every `ms` (for edit windows counting down). */
export function useNow(ms = 15_000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), ms);
    return () => clearInterval(t);
  }, [ms]);
  return now;
}

const stamp = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });
export const formatWhen = (iso: string) => stamp.format(new Date(iso));
