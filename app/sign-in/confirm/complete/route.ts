import { completeSignIn } from "@/lib/auth";
import { env } from "@/lib/env";
import { readSmallForm } from "@/lib/request-guard";
import { fromOurPages } from "@/lib/request-info";
import { safeNext } from "@/lib/safe-next";
import { endSession, sessionCookie, setCookieHeader } from "@/lib/session-store";

export const dynamic = "force-dynamic";

const FORM_LIMIT = 8 * 1024;

const seeOther = (location: string, cookie?: string) => {
  const headers = new Headers({ location, "cache-control": "no-store" });
  if (cookie) headers.append("set-cookie", cookie);
  return new Response(null, { status: 303, headers });
};

function cookieFrom(req: Request, name: string): string | undefined {
  const pair = (req.headers.get("cookie") ?? "").split(/;\s*/).find((c) => c.startsWith(`${name}=`));
  return pair?.slice(name.length + 1);
}

/**
 * The confirm page's button posts here; the one-time link is used up and a new session begins. Any
 * session this browser had is ended first, so a sign-in always gets a new token (OWASP ASVS 4.0.3 V3.2.1).
 */
export async function POST(req: Request) {
  if (!fromOurPages(req)) return new Response("This form only works from Placet's own pages.", { status: 403 });
  const form = await readSmallForm(req, FORM_LIMIT);
  if (!form) return new Response("That form is too large.", { status: 413 });
  const token = String(form.get("token") ?? "");
  const email = String(form.get("email") ?? "");
  const next = safeNext(String(form.get("next") ?? ""));
  const done = await completeSignIn({ token, email, userAgent: req.headers.get("user-agent") ?? "" });
  if (!done) return seeOther("/sign-in?error=Verification");
  await endSession(cookieFrom(req, sessionCookie().name));
  return seeOther(next, setCookieHeader(done.cookie, env.sessionAbsoluteSeconds));
}
