import { GENESIS_HASH } from "./event";

/** A chain's head: the seq and hash of its last event (seq 0 and 64 zeros: no events yet). */
export type TrailHead = { seq: number; hash: string };

export const EMPTY_HEAD: TrailHead = { seq: 0, hash: GENESIS_HASH };

/** How mails, the PDF and the trail page quote a head, so that it can be pasted back into /verify. */
export function formatHead(h: TrailHead): string {
  return `event ${h.seq}, hash ${h.hash}`;
}

export type ParseHeadResult = { ok: true; head: TrailHead } | { ok: false; message: string };

/**
 * Reads a head pasted from a mail or the PDF: an event number and a 64-character hash, in any
 * spacing or line breaks (a printed hash may wrap), e.g. "event 28, hash 3f5a…".
 */
export function parseHead(text: string): ParseHeadResult {
  const compact = text.replace(/\s+/g, "");
  if (compact === "") return { ok: false, message: "Paste the trail head: its event number and its 64-character hash." };
  const hashes = compact.match(/[0-9a-f]{64,}/gi) ?? [];
  if (hashes.length !== 1 || hashes[0].length !== 64) {
    return { ok: false, message: "The head needs exactly one hash of 64 hexadecimal characters (0–9, a–f)." };
  }
  const rest = compact.replace(hashes[0], " ");
  const seq = rest.match(/(?:event|entry|seq|#)(\d+)/i)?.[1] ?? rest.match(/\d+/)?.[0];
  if (!seq) return { ok: false, message: "The head needs its event number as well as its hash, e.g. \"event 28, hash 3f5a…\"." };
  const n = Number(seq);
  if (!Number.isSafeInteger(n)) return { ok: false, message: "The head's event number is too large." };
  return { ok: true, head: { seq: n, hash: hashes[0].toLowerCase() } };
}
