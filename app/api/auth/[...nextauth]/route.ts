import { getViewer } from "@/lib/session";

export const dynamic = "force-dynamic";

const notFound = () => Response.json({ error: "Not found." }, { status: 404 });

/**
 * Only the session summary is served under /api/auth: sign-in links are asked for through Placet's own
 * form (POST /sign-in/request) and used through its confirm page, so Auth.js's sign-in, callback and
 * other endpoints answer 404. The summary carries no session token (OWASP ASVS 4.0.3 V3.1.1, V3.2.3).
 */
export async function GET(_req: Request, ctx: { params: Promise<{ nextauth: string[] }> }) {
  const path = (await ctx.params).nextauth.join("/");
  if (path !== "session") return notFound();
  const v = await getViewer();
  const body = v ? { user: { name: v.name, email: v.email } } : null;
  return Response.json(body, { headers: { "cache-control": "private, no-store" } });
}

export const POST = notFound;
export const PUT = notFound;
export const DELETE = notFound;
export const PATCH = notFound;
