import { env } from "@/lib/env";
import { safeNext } from "@/lib/safe-next";

/** The confirm button posts here; we hand the one-time token to Auth.js, which checks and uses it up. */
export async function POST(req: Request) {
  const form = await req.formData().catch(() => null);
  const token = String(form?.get("token") ?? "");
  const email = String(form?.get("email") ?? "");
  if (!token || !email) return Response.redirect(new URL("/sign-in?error=Verification", env.appUrl), 303);
  const cb = String(form?.get("callbackUrl") ?? "");
  let next = "/commissions";
  try {
    next = safeNext(cb.startsWith("http") ? new URL(cb).pathname + new URL(cb).search : cb);
  } catch { /* keep the default */ }
  const target = new URL("/api/auth/callback/nodemailer", env.appUrl);
  target.searchParams.set("token", token);
  target.searchParams.set("email", email);
  target.searchParams.set("callbackUrl", new URL(next, env.appUrl).toString());
  return Response.redirect(target, 303);
}
