"use client";
import { useQuery } from "@tanstack/react-query";
import type { CommentsDto, ThreadDto } from "@/models/comments";
import type { FontPart } from "@/models/font";
import { commentsKey, fetchComments } from "./api";

/** New comments from others show within a few seconds: the list is fetched again every 3.5 s while the page is open. */
export const COMMENTS_POLL_MS = 3_500;

/** The whole comments answer (threads, what the viewer may do, the server's clock), kept fresh. */
export function useComments(revisionId: number) {
  return useQuery<CommentsDto>({ queryKey: commentsKey(revisionId), queryFn: () => fetchComments(revisionId), refetchInterval: COMMENTS_POLL_MS, staleTime: 1_000 });
}

/** Just the threads (one shared request with the panel): for pins on the drawings and the model. */
export function useCommentThreads(revisionId: number) {
  return useQuery<CommentsDto, Error, ThreadDto[]>({
    queryKey: commentsKey(revisionId), queryFn: () => fetchComments(revisionId), refetchInterval: COMMENTS_POLL_MS, staleTime: 1_000,
    select: (d) => d.threads,
  });
}

/** Pins for the 3D viewer's `pins` prop, numbered as in the comments list; open threads only. */
export function threadModelPins(threads: ThreadDto[]): { id: string; part: FontPart; point: [number, number, number]; label: string }[] {
  return threads.flatMap((t) => (t.target.kind === "model" && !t.resolved ? [{ id: String(t.id), part: t.target.part, point: t.target.point, label: String(t.number) }] : []));
}
