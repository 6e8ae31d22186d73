import { GENESIS_HASH, formatIssues, hashInput, trailEventSchema, type TrailEvent } from "./event";
import type { TrailHead } from "./head";

export type ChainFailureReason =
  | "hash mismatch" | "gap" | "broken link" | "wrong commission" | "malformed" | "shortened" | "head mismatch";

export type VerifyResult =
  | { ok: true; count: number; finalHash: string }
  /** seq: the position (1-based) where the chain first fails, i.e. the seq that event should carry. */
  | { ok: false; seq: number; reason: ChainFailureReason; message: string };

export type VerifyOptions = {
  /** Every event must belong to this commission (otherwise: to the first event's). */
  expectedCommissionId?: number;
  /**
   * The final hash the chain must end in, e.g. the one printed on the decision record.
   * Without it, events removed from the end or valid-looking events appended at the
   * end cannot be detected: a shorter chain is still a consistent chain.
   */
  expectedFinalHash?: string;
  /**
   * A head the chain must reach: its event `seq` must exist and carry `hash`. The head held by the
   * commission, or one quoted in a mail or the PDF. A chain that stops short of it was shortened;
   * one whose event `seq` hashes differently was rewritten at or before that event.
   */
  expectedHead?: HeadCheck | readonly HeadCheck[];
};

export type HeadCheck = TrailHead & {
  /** Whose head it is, for the messages: "the commission's head" unless told. */
  source?: string;
  /** The chain must end exactly at the head (true for the head stored with the chain). */
  exact?: boolean;
};

type Failure = Extract<VerifyResult, { ok: false }>;

/** Structural checks done before any hashing; hashing itself is left to the caller. */
export type ChainPlan = {
  /** For each event that passed the structural checks: the text to hash … */
  inputs: string[];
  /** … and the hash the event states. */
  stated: string[];
  /** The first structural failure, at position inputs.length + 1; null if none. */
  failure: Failure | null;
};

const short = (h: unknown) => (typeof h === "string" ? `${h.slice(0, 12)}…` : String(h));
const fail = (seq: number, reason: ChainFailureReason, message: string): Failure => ({ ok: false, seq, reason, message });

function checkEvent(raw: unknown, pos: number, prev: TrailEvent | null, commissionId: number | undefined) {
  const parsed = trailEventSchema.safeParse(raw);
  if (!parsed.success) return fail(pos, "malformed", `Event ${pos} is not a valid trail event: ${formatIssues(parsed.error)}.`);
  // Checked by the schema; hash the caller's own object, not the schema's copy.
  const e = raw as TrailEvent;
  const cid = commissionId ?? e.commissionId;
  if (e.commissionId !== cid) {
    return fail(pos, "wrong commission", `Event ${pos} belongs to commission ${e.commissionId}, not commission ${cid}.`);
  }
  if (e.seq !== pos) {
    const what = e.seq < pos ? "repeats an earlier number or is out of order" : `skips ${e.seq - pos === 1 ? `event ${pos}` : `events ${pos}–${e.seq - 1}`}`;
    return fail(pos, "gap", `Event ${pos} is numbered ${e.seq}: the sequence ${what}.`);
  }
  const expectedPrev = prev ? prev.hash : GENESIS_HASH;
  if (e.prevHash !== expectedPrev) {
    const after = prev ? `event ${pos - 1}'s hash ${short(expectedPrev)}` : "the starting hash of 64 zeros";
    return fail(pos, "broken link", `Event ${pos} points back to ${short(e.prevHash)}, not to ${after}.`);
  }
  try {
    return { input: hashInput(e.prevHash, e), stated: e.hash, event: e };
  } catch (err) {
    return fail(pos, "malformed", `Event ${pos} cannot be written as canonical JSON: ${(err as Error).message}.`);
  }
}

export function planChain(events: readonly unknown[], opts: VerifyOptions = {}): ChainPlan {
  const plan: ChainPlan = { inputs: [], stated: [], failure: null };
  if (!Array.isArray(events)) {
    plan.failure = fail(1, "malformed", "The events are not a list.");
    return plan;
  }
  let prev: TrailEvent | null = null;
  let commissionId = opts.expectedCommissionId;
  for (let i = 0; i < events.length; i++) {
    const step = checkEvent(events[i], i + 1, prev, commissionId);
    if ("ok" in step) {
      plan.failure = step;
      break;
    }
    plan.inputs.push(step.input);
    plan.stated.push(step.stated);
    prev = step.event;
    commissionId ??= step.event.commissionId;
  }
  return plan;
}

/**
 * The verdict once the caller has hashed the plan's inputs in order.
 * mismatchAt: index of the first input whose hash differs from the stated one, or -1;
 * computed: the hash computed at that index.
 */
export function settleChain(plan: ChainPlan, mismatchAt: number, computed: string, opts: VerifyOptions = {}): VerifyResult {
  if (mismatchAt >= 0) {
    const seq = mismatchAt + 1;
    return fail(
      seq,
      "hash mismatch",
      `Event ${seq} states the hash ${short(plan.stated[mismatchAt])} but its contents hash to ${short(computed)}: it was changed after it was recorded.`,
    );
  }
  if (plan.failure) return plan.failure;
  const count = plan.inputs.length;
  const finalHash = count > 0 ? plan.stated[count - 1] : GENESIS_HASH;
  const heads = opts.expectedHead === undefined ? [] : Array.isArray(opts.expectedHead) ? opts.expectedHead : [opts.expectedHead];
  for (const head of heads as HeadCheck[]) {
    const headFailure = checkHead(plan.stated, head);
    if (headFailure) return headFailure;
  }
  if (opts.expectedFinalHash !== undefined && opts.expectedFinalHash !== finalHash) {
    return fail(
      count + 1,
      "hash mismatch",
      `The ${count} events hold together but end in ${short(finalHash)}, not in the expected final hash ${short(opts.expectedFinalHash)}: events after ${count} may have been removed, or the chain rewritten.`,
    );
  }
  return { ok: true, count, finalHash };
}

const missing = (from: number, to: number) => (from === to ? `event ${from} is missing` : `events ${from}–${to} are missing`);

/** The chain (its stated hashes, already checked) against a head it must reach. */
function checkHead(stated: readonly string[], head: HeadCheck): Failure | null {
  const source = head.source ?? "the commission's head";
  const count = stated.length;
  const ends = count === 0 ? "The record has no events" : `The record ends at event ${count}`;
  if (count < head.seq) {
    return fail(count + 1, "shortened", `${ends} but ${source} is event ${head.seq}: ${missing(count + 1, head.seq)}.`);
  }
  const at = head.seq > 0 ? stated[head.seq - 1] : GENESIS_HASH;
  if (at !== head.hash) {
    return fail(
      Math.max(head.seq, 1),
      "head mismatch",
      `Event ${head.seq} of the record has the hash ${short(at)} but ${source} (event ${head.seq}) is ${short(head.hash)}: the chain was rewritten at or before event ${head.seq}.`,
    );
  }
  if (head.exact && count > head.seq) {
    return fail(head.seq + 1, "head mismatch", `${ends} but ${source} is event ${head.seq}: events after ${head.seq} were not appended by Placet.`);
  }
  return null;
}
