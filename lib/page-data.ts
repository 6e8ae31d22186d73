import "server-only";
import { cache } from "react";
import { notFound } from "next/navigation";
import { getCommission } from "./dal/commissions";
import { NotFoundError } from "./errors";
import { viewerOrSignIn } from "./session";

/** Parses a route id; anything that is not a positive whole number is simply not found. */
export function routeId(raw: string): number {
  const n = /^\d{1,15}$/.test(raw) ? Number(raw) : NaN;
  if (!Number.isSafeInteger(n) || n <= 0) notFound();
  return n;
}

/** The commission for a page, through the data-access layer; no standing → the same not-found as no commission. */
export const commissionForPage = cache(async (raw: string, path: string) => {
  const viewer = await viewerOrSignIn(path);
  try {
    return { viewer, commission: await getCommission(viewer, routeId(raw)) };
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
});
