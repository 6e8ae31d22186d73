import "server-only";
import { cache } from "react";
import { notFound } from "next/navigation";
import { getCommission } from "./dal/commissions";
import { NotFoundError } from "./errors";
import { idParam } from "./route-ids";
import { viewerOrSignIn } from "./session";

/** A DAL answer for a page: "not found" from the data-access layer becomes the page's not-found. */
export async function orNotFound<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
}

/** Parses a route id; anything that is not a positive whole number is simply not found. */
export function routeId(raw: string): number {
  try {
    return idParam(raw);
  } catch {
    notFound();
  }
}

/** The commission for a page, through the data-access layer; no standing → the same not-found as no commission. */
export const commissionForPage = cache(async (raw: string, path: string) => {
  const viewer = await viewerOrSignIn(path);
  return { viewer, commission: await orNotFound(getCommission(viewer, routeId(raw))) };
});
