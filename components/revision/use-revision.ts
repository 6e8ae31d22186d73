"use client";
import { useQuery } from "@tanstack/react-query";
import type { RevisionDto } from "@/lib/dal/revisions-read";

export async function fetchRevision(id: number): Promise<RevisionDto> {
  const res = await fetch(`/api/revisions/${id}`, { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error(res.status === 404 ? "This revision is not available to you." : "Could not load the revision.");
  return (await res.json()).revision;
}

/** The revision, kept fresh from GET /api/revisions/{id} so the page updates without a reload. */
export function useRevision(id: number, initial?: RevisionDto) {
  return useQuery({ queryKey: ["revision", id], queryFn: () => fetchRevision(id), initialData: initial, refetchInterval: 15_000 });
}
