import "server-only";
import { createHash, createHmac } from "node:crypto";

/** The server's secret (AUTH_SECRET); a fixed local value only outside production. */
export function serverSecret(): string {
  const s = process.env.AUTH_SECRET;
  if (s) return s;
  if (process.env.NODE_ENV === "production" && process.env.PLACET_DEMO !== "1") throw new Error("AUTH_SECRET is not set");
  return "placet-local-development-secret";
}

/** A keyed hash, so a stored or logged value cannot be turned back into an address by guessing. */
export function keyedHash(kind: string, value: string): string {
  return createHmac("sha256", serverSecret()).update(`${kind}:${value}`).digest("hex");
}

export const sha256 = (value: string) => createHash("sha256").update(value).digest("hex");
