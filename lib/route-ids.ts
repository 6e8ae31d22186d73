import { NotFoundError } from "./errors";

/** A route's numeric id; anything else is "not found" (never a 500). */
export function idParam(raw: string): number {
  if (!/^\d{1,15}$/.test(raw)) throw new NotFoundError();
  const n = Number(raw);
  if (!Number.isSafeInteger(n) || n <= 0) throw new NotFoundError();
  return n;
}
