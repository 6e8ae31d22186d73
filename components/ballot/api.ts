"use client";
import { useQuery } from "@tanstack/react-query";
import type { BallotStateDto } from "@/models/ballot/state";
import type { DecisionStateDto } from "@/models/decision";

/** An answer from the API that is not a success: its status, message, field messages and code. */
export class ApiError extends Error {
  constructor(message: string, readonly status: number, readonly fields: Record<string, string> = {}, readonly code?: string) {
    super(message);
    this.name = "ApiError";
  }
}

export async function api<T>(url: string, body?: unknown): Promise<T> {
  const res = await fetch(url, {
    method: body === undefined ? "GET" : "POST",
    headers: { accept: "application/json", ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const json = await res.json().catch(() => ({}));
  if (!res.ok) {
    const fallback = res.status === 401 ? "Your sign-in has ended; sign in again." : res.status === 404 ? "This is not available to you." : "That did not work. Nothing was changed.";
    throw new ApiError(json.error ?? fallback, res.status, json.fields ?? {}, json.code);
  }
  return json as T;
}

export const ballotKey = (revisionId: number) => ["ballot", revisionId] as const;
export const decisionKey = (revisionId: number) => ["decision", revisionId] as const;

/** The ballot panel's state, polled so the tally moves while people vote. */
export function useBallotState(revisionId: number) {
  return useQuery({ queryKey: ballotKey(revisionId), queryFn: () => api<BallotStateDto>(`/api/revisions/${revisionId}/ballot`), refetchInterval: 4_000 });
}

export function useDecisionState(revisionId: number) {
  return useQuery({ queryKey: decisionKey(revisionId), queryFn: () => api<DecisionStateDto>(`/api/revisions/${revisionId}/decision`), refetchInterval: 8_000 });
}

const full = new Intl.DateTimeFormat(undefined, { weekday: "short", day: "numeric", month: "long", year: "numeric", hour: "2-digit", minute: "2-digit", timeZoneName: "short" });
export const showTime = (iso: string) => full.format(new Date(iso));
export const showDate = (ymd: string) => new Intl.DateTimeFormat(undefined, { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" }).format(new Date(`${ymd}T12:00:00Z`));
