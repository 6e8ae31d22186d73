import * as z from "zod";
import { GENESIS_HASH, formatIssues, need, trailEventSchema, type TrailEvent } from "./event";
import type { TrailHead } from "./head";
import type { HeadCheck, VerifyOptions, VerifyResult } from "./verify-core";
import { verifyChainAsync } from "./web-hash";

export const RECORD_FORMAT_ID = "placet-trail/1";

/** Written into every JSON record so that anyone can check it without Placet. */
export const RECORD_FORMAT = [
  `Placet decision trail, format ${RECORD_FORMAT_ID}.`,
  "`events` is one commission's chain in order: seq 1, 2, 3 … without gaps.",
  "Each event's `hash` is the lowercase hexadecimal SHA-256 (FIPS 180-4) of the UTF-8 bytes of the text",
  "prevHash + C, with no separator: prevHash is the event's own `prevHash` field (64 lowercase hex characters;",
  "64 zeros for event 1) and C is the RFC 8785 (JSON Canonicalization Scheme) serialisation of the event",
  "with its `hash` field removed, so C contains prevHash as well.",
  "Each event's `prevHash` equals the previous event's `hash`.",
  "`finalHash` is the last event's hash (64 zeros if there are none): compare it with the final hash printed",
  "on the decision record. `head` is the head the commission held when the file was exported (the seq and",
  "hash of its last event); the events must end exactly there. Mails and the decision record quote the head",
  "at their moment as \"event N, hash H\": the file reaches such a head if its event N has the hash H.",
  "Times are UTC, ISO 8601 with milliseconds.",
].join(" ");

export type TrailRecord = {
  format: typeof RECORD_FORMAT_ID;
  description: string;
  commission: { id: number; title: string };
  exportedAt: string;
  events: TrailEvent[];
  finalHash: string;
  /** The commission's stored head at export; files exported before heads were stored have none. */
  head?: TrailHead;
};

const hex64 = () => z.string(need("text")).regex(/^[0-9a-f]{64}$/, { error: "must be 64 lowercase hexadecimal characters" });

export const trailRecordSchema = z.object({
  format: z.literal(RECORD_FORMAT_ID, need(`"${RECORD_FORMAT_ID}"`)),
  description: z.string(need("text")),
  commission: z.object({
    id: z.number(need("a number")).int({ error: "must be a whole number" }).positive({ error: "must be 1 or more" }),
    title: z.string(need("text")),
  }, need("an object with id and title")),
  exportedAt: z.iso.datetime(need("a UTC time like 2026-12-01T10:00:00.000Z")),
  events: z.array(trailEventSchema, need("a list of events")),
  finalHash: hex64(),
  head: z.object({
    seq: z.number(need("a number")).int({ error: "must be a whole number" }).nonnegative({ error: "must be 0 or more" }),
    hash: hex64(),
  }, need("an object with seq and hash")).optional(),
}, { error: "the file must hold one JSON object" });

export function buildRecord(
  commission: { id: number; title: string },
  events: readonly TrailEvent[],
  opts: { exportedAt?: Date | string; head?: TrailHead } = {},
): TrailRecord {
  const at = opts.exportedAt ?? new Date();
  return {
    ...(opts.head ? { head: { seq: opts.head.seq, hash: opts.head.hash } } : {}),
    format: RECORD_FORMAT_ID,
    description: RECORD_FORMAT,
    commission: { id: commission.id, title: commission.title },
    exportedAt: typeof at === "string" ? at : at.toISOString(),
    events: [...events],
    finalHash: events.length > 0 ? events[events.length - 1].hash : GENESIS_HASH,
  };
}

export type RecordErrors = { formErrors: string[]; fieldErrors: Record<string, string[] | undefined> };

export type ParseRecordResult =
  | { ok: true; record: TrailRecord }
  | { ok: false; message: string; errors: RecordErrors };

/** Checks the shape of a record (not its hashes: that is verifyRecord's job). */
export function parseRecord(input: unknown): ParseRecordResult {
  const parsed = trailRecordSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      message: `This is not a Placet trail record: ${formatIssues(parsed.error)}.`,
      errors: z.flattenError(parsed.error),
    };
  }
  // Keep the events exactly as given (the schema's copies drop keys such as "__proto__").
  const events = (input as { events: TrailEvent[] }).events;
  return { ok: true, record: { ...parsed.data, events } };
}

/** parseRecord for the text of a file. */
export function parseRecordText(text: string): ParseRecordResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    const message = `The file is not valid JSON (${(err as Error).message}).`;
    return { ok: false, message, errors: { formErrors: [message], fieldErrors: {} } };
  }
  return parseRecord(value);
}

/**
 * What a record is checked against: its commission id, its stated final hash, the head stored with
 * it (exactly), and optionally a head quoted elsewhere (a mail, the PDF) that it must reach.
 */
export function recordOptions(record: TrailRecord, quoted?: TrailHead): VerifyOptions {
  const heads: HeadCheck[] = [];
  if (record.head) heads.push({ ...record.head, exact: true, source: "the commission's head" });
  if (quoted) heads.push({ ...quoted, source: "the head you gave" });
  return { expectedCommissionId: record.commission.id, expectedFinalHash: record.finalHash, expectedHead: heads };
}

/** Verifies a parsed record in the browser (see recordOptions). */
export function verifyRecordAsync(record: TrailRecord, quoted?: TrailHead): Promise<VerifyResult> {
  return verifyChainAsync(record.events, recordOptions(record, quoted));
}
