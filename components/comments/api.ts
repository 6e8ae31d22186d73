"use client";
import type { CommentsDto } from "@/models/comments";

/** A refusal from the comments API: the server's message, and its message for each field. */
export class CommentApiError extends Error {
  constructor(message: string, readonly status: number, readonly fields: Record<string, string> = {}) {
    super(message);
    this.name = "CommentApiError";
  }
}

function plainMessage(status: number): string {
  if (status === 401) return "You have been signed out. Sign in again, then retry.";
  if (status === 404) return "This revision or comment is no longer available to you.";
  return "Something went wrong on our side. Nothing was changed; try again.";
}

async function call<T>(url: string, init: RequestInit = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers: { accept: "application/json", ...(init.body ? { "content-type": "application/json" } : {}), ...(init.headers ?? {}) } });
  } catch {
    throw new CommentApiError("The connection was lost. Check the connection and try again; your words are still here.", 0);
  }
  let json: unknown = null;
  try { json = await res.json(); } catch { /* not JSON: fall back to the status */ }
  if (!res.ok) {
    const b = (json ?? {}) as { error?: unknown; fields?: Record<string, string> };
    throw new CommentApiError(typeof b.error === "string" && b.error ? b.error : plainMessage(res.status), res.status, b.fields ?? {});
  }
  return json as T;
}

export const commentsKey = (revisionId: number) => ["comments", revisionId] as const;

export const fetchComments = (revisionId: number) => call<CommentsDto>(`/api/revisions/${revisionId}/comments`);

export const postThread = (revisionId: number, body: string, target: unknown) =>
  call<{ id: number }>(`/api/revisions/${revisionId}/comments`, { method: "POST", body: JSON.stringify({ body, target }) });

export const postReply = (commentId: number, body: string) =>
  call<{ id: number; threadId: number }>(`/api/comments/${commentId}/replies`, { method: "POST", body: JSON.stringify({ body }) });

export const patchComment = (commentId: number, body: string) =>
  call<{ id: number; changed: boolean }>(`/api/comments/${commentId}`, { method: "PATCH", body: JSON.stringify({ body }) });

export const setThreadResolved = (commentId: number, resolved: boolean) =>
  call<{ id: number; changed: boolean }>(`/api/comments/${commentId}/${resolved ? "resolve" : "reopen"}`, { method: "POST" });

export const patchNotices = (notices: "immediate" | "digest") =>
  call<{ notices: "immediate" | "digest" }>("/api/me/notices", { method: "PATCH", body: JSON.stringify({ notices }) });
