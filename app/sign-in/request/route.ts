import { after } from "next/server";
import { requestSignInLink } from "@/lib/auth";
import { readSmallForm } from "@/lib/request-guard";
import { clientIp, fromOurPages } from "@/lib/request-info";
import { safeNext } from "@/lib/safe-next";
import { signInSchema } from "@/models/schemas/people";

export const dynamic = "force-dynamic";

const FORM_LIMIT = 8 * 1024;
const seeOther = (location: string) => new Response(null, { status: 303, headers: { location, "cache-control": "no-store" } });

/**
 * The sign-in form posts here (the only way to ask for a link). Invited, unknown and rate-limited
 * addresses all get the same 303 to the check-your-inbox page, at the same speed; only a malformed address comes back to
 * the form, with its message beside the field.
 */
export async function POST(req: Request) {
  if (!fromOurPages(req)) return new Response("This form only works from Placet's own sign-in page.", { status: 403 });
  const form = await readSmallForm(req, FORM_LIMIT);
  if (!form) return new Response("That form is too large.", { status: 413 });
  const raw = String(form.get("email") ?? "");
  const next = safeNext(String(form.get("next") ?? ""));
  const parsed = signInSchema.safeParse({ email: raw });
  if (!parsed.success) {
    const back = new URLSearchParams({ email: raw.slice(0, 300) });
    if (next !== "/commissions") back.set("next", next);
    return seeOther(`/sign-in?${back}`);
  }
  // The answer goes out before any lookup, so how long it takes says nothing about the address; the
  // limits, the lookup and the queued mail happen just after it.
  const request = { email: parsed.data.email, ip: clientIp(req.headers), next };
  after(async () => {
    try {
      await requestSignInLink(request);
    } catch (err) {
      console.error("sign-in link could not be queued", err);
    }
  });
  return seeOther("/sign-in/check-inbox");
}
