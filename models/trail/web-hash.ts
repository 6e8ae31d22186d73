// SHA-256 through WebCrypto (globalThis.crypto.subtle): runs in browsers and in Node.
import { eventBody, hashInput, type TrailEvent, type TrailEventBody } from "./event";
import { planChain, settleChain, type VerifyOptions, type VerifyResult } from "./verify-core";

export class WebCryptoUnavailableError extends Error {
  constructor() {
    super("This browser does not offer WebCrypto here. It needs a secure page (https, or localhost) and a current browser.");
    this.name = "WebCryptoUnavailableError";
  }
}

const encoder = new TextEncoder();
const HEX = Array.from({ length: 256 }, (_, i) => i.toString(16).padStart(2, "0"));

function subtle(): SubtleCrypto {
  const s = globalThis.crypto?.subtle;
  if (!s) throw new WebCryptoUnavailableError();
  return s;
}

/** Lowercase hex SHA-256 of the UTF-8 bytes of `text`. */
export async function sha256HexAsync(text: string): Promise<string> {
  const digest = new Uint8Array(await subtle().digest("SHA-256", encoder.encode(text)));
  let out = "";
  for (const byte of digest) out += HEX[byte];
  return out;
}

/** SHA-256 hex of UTF-8(prevHash ‖ canonical JSON of body). */
export function hashEventAsync(prevHash: string, body: TrailEventBody): Promise<string> {
  return sha256HexAsync(hashInput(prevHash, body));
}

/** The body with its hash added (the body's own prevHash is the one chained to). */
export async function sealEventAsync(body: TrailEventBody): Promise<TrailEvent> {
  const clean = eventBody(body);
  return { ...clean, hash: await hashEventAsync(clean.prevHash, clean) };
}

const BATCH = 512;

/** verifyChain computed with WebCrypto; gives the same result as the Node verifier. */
export async function verifyChainAsync(events: readonly unknown[], opts: VerifyOptions = {}): Promise<VerifyResult> {
  const plan = planChain(events, opts);
  for (let start = 0; start < plan.inputs.length; start += BATCH) {
    const batch = plan.inputs.slice(start, start + BATCH);
    const hashes = await Promise.all(batch.map(sha256HexAsync));
    const miss = hashes.findIndex((h, k) => h !== plan.stated[start + k]);
    if (miss >= 0) return settleChain(plan, start + miss, hashes[miss], opts);
  }
  return settleChain(plan, -1, "", opts);
}
