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
  if (text.trim() === "") return { ok: false, message: "Paste the trail head: its event number and its 64-character hash." };
  const found = findHash(text);
  if (!found) return { ok: false, message: "The head needs exactly one hash of 64 hexadecimal characters (0–9, a–f)." };
  const seq = found.rest.match(/(?:event|entry|seq|#)\s*(\d+)/i)?.[1] ?? found.rest.match(/\d+/)?.[0];
  if (!seq) return { ok: false, message: "The head needs its event number as well as its hash, e.g. \"event 28, hash 3f5a…\"." };
  const n = Number(seq);
  if (!Number.isSafeInteger(n)) return { ok: false, message: "The head's event number is too large." };
  return { ok: true, head: { seq: n, hash: found.hash.toLowerCase() } };
}

/**
 * The first run of hexadecimal words (split only by spaces or line breaks) that holds words adding up to
 * exactly 64 characters; `rest` is the text with those words taken out (it still holds the number).
 */
function findHash(text: string): { hash: string; rest: string } | null {
  for (const m of text.matchAll(/[0-9a-f]+(?:\s+[0-9a-f]+)*/gi)) {
    const pieces = m[0].split(/\s+/);
    for (let i = 0; i < pieces.length; i++) {
      let length = 0;
      for (let j = i; j < pieces.length && length < 64; j++) {
        length += pieces[j].length;
        if (length !== 64) continue;
        const kept = [...pieces.slice(0, i), "|", ...pieces.slice(j + 1)].join(" ");
        const at = m.index ?? 0;
        return { hash: pieces.slice(i, j + 1).join(""), rest: `${text.slice(0, at)} ${kept} ${text.slice(at + m[0].length)}` };
      }
    }
  }
  return null;
}
