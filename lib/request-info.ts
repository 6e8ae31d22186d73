import "server-only";
import { env } from "./env";

/**
 * The client's IP for rate limits: the last X-Forwarded-For entry (the one the nearest proxy added;
 * Next's own server fills the header with the socket address when no proxy sent one).
 */
export function clientIp(headers: Headers): string {
  const xff = headers.get("x-forwarded-for");
  const last = xff?.split(",").map((s) => s.trim()).filter(Boolean).pop();
  return (last ?? headers.get("x-real-ip") ?? "unknown").slice(0, 64);
}

/**
 * A form post to our sign-in routes must come from our own pages (OWASP ASVS 4.0.3 V4.2.2: login CSRF).
 * Browsers send Origin on every POST; a missing or foreign one, or Sec-Fetch-Site cross-site, is refused.
 */
export function fromOurPages(req: Request): boolean {
  if (req.headers.get("sec-fetch-site") === "cross-site") return false;
  const origin = req.headers.get("origin");
  if (!origin) return false;
  const own = new Set([new URL(env.appUrl).origin, new URL(req.url).origin]);
  return own.has(origin);
}
