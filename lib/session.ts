import "server-only";
import { cache } from "react";
import { redirect } from "next/navigation";
import { cookies } from "next/headers";
import { auth } from "./auth";
import { loadViewer, type Viewer } from "./dal/viewer";
import { UnauthenticatedError } from "./errors";

/** The signed-in person for this request, or null. Roles come from the database, not the session. */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const session = await auth();
  const id = session?.user?.id;
  if (!id) return null;
  const jar = await cookies();
  const token = jar.get("__Secure-authjs.session-token")?.value ?? jar.get("authjs.session-token")?.value;
  return loadViewer(id, token);
});

/** For route handlers and actions: the viewer, or a 401. */
export async function requireViewer(): Promise<Viewer> {
  const v = await getViewer();
  if (!v) throw new UnauthenticatedError();
  return v;
}

/** For pages: the viewer, or off to sign in. */
export async function viewerOrSignIn(next?: string): Promise<Viewer> {
  const v = await getViewer();
  if (!v) redirect(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  return v;
}
