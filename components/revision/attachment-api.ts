"use client";
import type { AttachmentDto } from "@/lib/dal/revisions-read";

/** The server's own words for a refusal, else a plain one for the status. */
function messageFor(status: number, body: unknown, field: "file" | "caption" = "file"): string {
  const b = (body ?? {}) as { error?: unknown; fields?: Record<string, unknown> };
  const own = b.fields?.[field] ?? b.fields?.file ?? b.error;
  if (typeof own === "string" && own) return own;
  if (status === 401) return "You have been signed out. Sign in again, then retry.";
  if (status === 404) return "This revision or file is no longer available to you.";
  if (status === 413) return "The file is over the limit of 25 MB per file.";
  return "Something went wrong on our side. Nothing was changed; try again.";
}

/** `retry`: the file itself was not refused (lost connection, signed out, a fault of ours), so it may go again. */
export type UploadOutcome = { ok: true; attachment: AttachmentDto } | { ok: false; message: string; aborted?: boolean; retry?: boolean };

/**
 * Sends one file with XMLHttpRequest (fetch cannot report upload progress). `onProgress` gets 0…1.
 * Never rejects: every failure comes back as a message for that file.
 */
export function uploadAttachment(revisionId: number, file: File, caption: string, onProgress: (fraction: number) => void) {
  const xhr = new XMLHttpRequest();
  const promise = new Promise<UploadOutcome>((resolve) => {
    const body = new FormData();
    body.append("file", file, file.name);
    body.append("caption", caption);
    xhr.open("POST", `/api/revisions/${revisionId}/attachments`);
    xhr.setRequestHeader("accept", "application/json");
    xhr.responseType = "text";
    xhr.upload.onprogress = (e) => { if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total); };
    xhr.onload = () => {
      let json: unknown = null;
      try { json = JSON.parse(xhr.responseText); } catch { /* not JSON: fall back to the status */ }
      if (xhr.status === 201 && json) resolve({ ok: true, attachment: json as AttachmentDto });
      else resolve({ ok: false, message: messageFor(xhr.status, json), retry: xhr.status === 401 || xhr.status >= 500 });
    };
    xhr.onerror = () => resolve({ ok: false, message: "The connection was lost before the file arrived. Check the connection and try again.", retry: true });
    xhr.onabort = () => resolve({ ok: false, message: "Upload stopped.", aborted: true });
    xhr.send(body);
  });
  return { promise, abort: () => xhr.abort() };
}

async function send(url: string, init: RequestInit, field: "file" | "caption"): Promise<unknown> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers: { accept: "application/json", ...(init.headers ?? {}) } });
  } catch {
    throw new Error("The connection was lost. Check the connection and try again.");
  }
  if (res.status === 204) return null;
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new Error(messageFor(res.status, json, field));
  return json;
}

export async function saveCaption(attachmentId: number, caption: string): Promise<AttachmentDto> {
  return (await send(`/api/attachments/${attachmentId}`, {
    method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ caption }),
  }, "caption")) as AttachmentDto;
}

export async function deleteAttachment(attachmentId: number): Promise<void> {
  await send(`/api/attachments/${attachmentId}`, { method: "DELETE" }, "file");
}
