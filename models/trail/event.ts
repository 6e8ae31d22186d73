import canonicalize from "canonicalize";
import * as z from "zod";
import { TRAIL_ACTIONS, type TrailAction } from "./actions";

/** One entry in a commission's decision trail. */
export type TrailEvent = {
  commissionId: number;
  /** 1, 2, 3 … within the commission, without gaps. */
  seq: number;
  /** UTC, ISO 8601 with milliseconds: "2026-12-01T10:00:00.000Z". */
  at: string;
  /** The person who acted (their user id); null for the system (e.g. a ballot closing at its time). */
  actorId: string | null;
  /** The role the actor acted in ("chair", "designer", "system" …). */
  actorRole: string;
  action: TrailAction;
  subjectType: string;
  subjectId: string;
  /** The facts of the change, as plain JSON values. */
  payload: Record<string, unknown>;
  /** The previous event's hash; GENESIS_HASH for seq 1. */
  prevHash: string;
  hash: string;
};

/** Everything that is hashed: the event without its own hash. */
export type TrailEventBody = Omit<TrailEvent, "hash">;

/** The prevHash of a chain's first event: 64 zeros. */
export const GENESIS_HASH = "0".repeat(64);

const HEX64 = /^[0-9a-f]{64}$/;
const ISO_MS_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

/** A type error that says "is missing" when the field is absent. */
export const need = (what: string) => ({
  error: (iss: { input?: unknown }) => (iss.input === undefined ? "is missing" : `must be ${what}`),
});

const hex64 = z.string(need("text")).regex(HEX64, { error: "must be 64 lowercase hexadecimal characters" });
const positiveId = z.number(need("a number")).int({ error: "must be a whole number" }).positive({ error: "must be 1 or more" });
const label = z.string(need("text")).min(1, { error: "must not be empty" }).max(200, { error: "is too long" });

const eventShape = {
  commissionId: positiveId,
  seq: positiveId,
  at: z.string(need("text")).refine((s) => ISO_MS_UTC.test(s) && new Date(s).toISOString() === s, {
    error: 'must be a UTC time like "2026-12-01T10:00:00.000Z"',
  }),
  actorId: z.string(need("text or null")).min(1, { error: "must not be empty" }).max(255, { error: "is too long" }).nullable(),
  actorRole: label,
  action: z.enum(TRAIL_ACTIONS, need("one of the trail's actions")),
  subjectType: label,
  subjectId: label,
  payload: z.record(z.string(), z.unknown(), need("a JSON object")),
  prevHash: hex64,
  hash: hex64,
};

export const trailEventSchema = z.strictObject(eventShape, {
  error: (iss) =>
    iss.code === "unrecognized_keys" ? `has fields a trail event does not have: ${iss.keys.join(", ")}` : "must be a JSON object",
}) satisfies z.ZodType<TrailEvent>;

/** The event without `hash`, with exactly the fields that are hashed. */
export function eventBody(e: TrailEventBody): TrailEventBody {
  return {
    commissionId: e.commissionId,
    seq: e.seq,
    at: e.at,
    actorId: e.actorId,
    actorRole: e.actorRole,
    action: e.action,
    subjectType: e.subjectType,
    subjectId: e.subjectId,
    payload: e.payload,
    prevHash: e.prevHash,
  };
}

/**
 * The exact text whose UTF-8 bytes are hashed for an event:
 * the previous hash as 64 lowercase hex characters, immediately followed by the
 * RFC 8785 canonical JSON of the event body (which itself contains prevHash).
 * No separator, no trailing newline. Throws if the body cannot be canonicalised
 * (NaN, Infinity, a lone surrogate, a cycle).
 */
export function hashInput(prevHash: string, body: TrailEventBody): string {
  const json = canonicalize(eventBody(body));
  if (json === undefined) throw new Error("the event cannot be written as JSON");
  return prevHash + json;
}

/** "event 4, payload.tally: …" — issue paths in words people can follow. */
export function formatIssues(error: z.ZodError, max = 3): string {
  const lines = error.issues.slice(0, max).map((issue) => {
    const parts: string[] = [];
    let path = issue.path;
    if (path[0] === "events" && typeof path[1] === "number") {
      parts.push(`event ${path[1] + 1}`);
      path = path.slice(2);
    }
    if (path.length > 0) parts.push(path.map(String).join("."));
    return parts.length > 0 ? `${parts.join(", ")}: ${issue.message}` : issue.message;
  });
  const more = error.issues.length - max;
  return lines.join("; ") + (more > 0 ? `; and ${more} more` : "");
}
