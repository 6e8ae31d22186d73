import "server-only";

/**
 * Where uploaded files live. Keys are chosen by the server (never from a file name), for example
 * `commissions/12/attachments/4f0c…`, and checked by `assertKey` before any adapter touches them.
 */
export interface Storage {
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Uint8Array | null>;
  /** Removes the object; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
}

/** Lower-case letters, digits, `/`, `_` and `-` only: no dots, so no `..`, and no absolute paths. */
export const KEY_PATTERN = /^[a-z0-9][a-z0-9/_-]{0,200}$/;
const CONTENT_TYPE_PATTERN = /^[a-z]+\/[a-z0-9][a-z0-9.+-]{0,100}$/;

/** A key or content type the storage layer refuses; a programming error, not a user's mistake. */
export class StorageKeyError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "StorageKeyError";
  }
}

/** True when the key matches KEY_PATTERN and has no empty segment (`a//b`, trailing `/`). */
export function isValidKey(key: unknown): key is string {
  return typeof key === "string" && KEY_PATTERN.test(key) && !key.includes("//") && !key.endsWith("/");
}

export function assertKey(key: unknown): asserts key is string {
  if (!isValidKey(key)) {
    const shown = typeof key === "string" ? JSON.stringify(key.slice(0, 60)) : typeof key;
    throw new StorageKeyError(`Refused storage key ${shown}: keys use a-z, 0-9, "/", "_" and "-" only.`);
  }
}

export function assertContentType(contentType: unknown): asserts contentType is string {
  if (typeof contentType !== "string" || !CONTENT_TYPE_PATTERN.test(contentType)) {
    throw new StorageKeyError(`Refused content type ${JSON.stringify(String(contentType).slice(0, 60))}.`);
  }
}

export function assertBytes(bytes: unknown): asserts bytes is Uint8Array {
  if (!(bytes instanceof Uint8Array)) throw new StorageKeyError("File contents must be a Uint8Array.");
}
