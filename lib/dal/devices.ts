import "server-only";
import { and, desc, eq, ne } from "drizzle-orm";
import { getDb } from "@/db/client";
import { sessions } from "@/db/schema";
import { describeBrowser } from "@/models/session/browser";
import { logSecurity } from "../security-log";
import type { Viewer } from "./viewer";

export interface DeviceDto { createdAt: string; lastSeenAt: string; browser: string; thisDevice: boolean }

/** The viewer's own signed-in devices, newest activity first (OWASP ASVS 4.0.3 V3.3.4). */
export async function listDevices(viewer: Viewer): Promise<DeviceDto[]> {
  const rows = await getDb()
    .select({ id: sessions.sessionToken, createdAt: sessions.createdAt, lastSeenAt: sessions.lastSeenAt, userAgent: sessions.userAgent })
    .from(sessions)
    .where(eq(sessions.userId, viewer.id))
    .orderBy(desc(sessions.lastSeenAt));
  return rows.map((r) => ({
    createdAt: r.createdAt.toISOString(), lastSeenAt: r.lastSeenAt.toISOString(),
    browser: describeBrowser(r.userAgent), thisDevice: r.id === viewer.sessionId,
  }));
}

/**
 * Ends every session of the viewer's except the one this request came with (OWASP ASVS 4.0.3 V3.3.3,
 * V3.3.4). Without a known session of this request nothing is ended, so nobody is signed out by mistake.
 */
export async function signOutEverywhereElse(viewer: Viewer): Promise<number> {
  if (!viewer.sessionId) return 0;
  const [res] = await getDb().delete(sessions).where(and(eq(sessions.userId, viewer.id), ne(sessions.sessionToken, viewer.sessionId)));
  await logSecurity({ userId: viewer.id, email: viewer.email, action: "signed out everywhere else", detail: { ended: res.affectedRows } });
  return res.affectedRows;
}
