// The synchronous server path: SHA-256 through node:crypto. Never import this from
// client components; they use verifyChainAsync from "@/models/trail".
import { createHash } from "node:crypto";
import { eventBody, hashInput, type TrailEvent, type TrailEventBody } from "./event";
import type { TrailHead } from "./head";
import { recordOptions, type TrailRecord } from "./record";
import { planChain, settleChain, type VerifyOptions, type VerifyResult } from "./verify-core";

/** Lowercase hex SHA-256 of the UTF-8 bytes of `text`. */
export function sha256Hex(text: string): string {
  return createHash("sha256").update(text, "utf8").digest("hex");
}

/** SHA-256 hex of UTF-8(prevHash ‖ canonical JSON of body); body includes prevHash too. */
export function hashEvent(prevHash: string, body: TrailEventBody): string {
  return sha256Hex(hashInput(prevHash, body));
}

/** The same as hashEvent, under the name the server code uses. */
export const hashEventSync = hashEvent;

/** The body with its hash added (the body's own prevHash is the one chained to). */
export function sealEvent(body: TrailEventBody): TrailEvent {
  const clean = eventBody(body);
  return { ...clean, hash: hashEvent(clean.prevHash, clean) };
}

/** Checks a whole chain: order, links, commission and every event's hash. */
export function verifyChain(events: readonly unknown[], opts: VerifyOptions = {}): VerifyResult {
  const plan = planChain(events, opts);
  for (let i = 0; i < plan.inputs.length; i++) {
    const h = sha256Hex(plan.inputs[i]);
    if (h !== plan.stated[i]) return settleChain(plan, i, h, opts);
  }
  return settleChain(plan, -1, "", opts);
}

/** Verifies a parsed record against its commission id, final hash, stored head and optionally a quoted head. */
export function verifyRecord(record: TrailRecord, quoted?: TrailHead): VerifyResult {
  return verifyChain(record.events, recordOptions(record, quoted));
}
