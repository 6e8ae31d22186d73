import "server-only";
import { cache } from "react";
import { redirect } from "next/navigation";
import { cookies } from "next/headers";
import { loadViewer, type Viewer } from "./dal/viewer";
import { UnauthenticatedError } from "./errors";
import { auth, signOut } from "./auth";
import { sessionCookie, sessionIdFor } from "./session-store";

/** The signed-in person for this request, or null. Roles come from the database, not the session. */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const session = await auth();
  const userId = session?.user?.id;
  if (!userId) return null;
  const value = (await cookies()).get(sessionCookie().name)?.value;
  return loadViewer(userId, value ? sessionIdFor(value) : undefined);
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

/** Ends this browser's session and removes its cookie (for server actions). */
export async function signOutHere(): Promise<void> {
  await signOut({ redirect: false });
}
