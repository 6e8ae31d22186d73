import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, HSTS, newNonce } from "@/lib/security-headers";

const appUrl = process.env.AUTH_URL ?? "http://localhost:3000";
const https = appUrl.startsWith("https:");
const dev = process.env.NODE_ENV === "development";

/**
 * Every page gets a Content-Security-Policy with a nonce of its own. Next.js reads the nonce from the
 * request's CSP header and puts it on its own scripts; pages render per request (the root layout reads it).
 */
export function proxy(request: NextRequest) {
  const nonce = newNonce();
  const csp = contentSecurityPolicy(nonce, { https, dev });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", csp);
  if (https) response.headers.set("Strict-Transport-Security", HSTS);
  return response;
}

export const config = {
  // API routes answer JSON and files; their bodies (uploads up to 25 MB) are not buffered through here.
  // Static files carry no inline script. The other security headers come from next.config.ts, for all paths.
  matcher: [{ source: "/((?!api/|_next/static/|_next/image|favicon.ico).*)" }],
};
