import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb, withRetry } from "@/db/client";
import { sessions, studioMembers, studios, users } from "@/db/schema";
import type { StudioRole } from "@/models/permissions/policy";
import { ForbiddenError } from "../errors";

/** The person asking, with their studio roles read from the database on every request. */
export interface Viewer {
  id: string;
  email: string;
  name: string;
  units: "mm" | "in";
  notices: "immediate" | "digest";
  studios: { studioId: number; studioName: string; role: StudioRole }[];
  /** The stored id of the session this request came with (from its cookie), when known. */
  sessionId?: string;
}

export async function loadViewer(userId: string, sessionId?: string): Promise<Viewer | null> {
  return withRetry(async () => {
    const db = getDb();
    const [u] = await db.select().from(users).where(eq(users.id, userId)).limit(1);
    if (!u) return null;
    const rows = await db
      .select({ studioId: studioMembers.studioId, role: studioMembers.role, studioName: studios.name })
      .from(studioMembers)
      .innerJoin(studios, eq(studios.id, studioMembers.studioId))
      .where(eq(studioMembers.userId, userId));
    return { id: u.id, email: u.email, name: u.name ?? u.email, units: u.units, notices: u.notices, studios: rows, sessionId };
  });
}

/**
 * When the viewer's current session began (for the chair's fresh sign-in before signing a decision).
 * Only this request's own session counts (OWASP ASVS 4.0.3 V3.7.1): a viewer with no known or an
 * unknown session id is never fresh, and a newer session on another device never helps.
 */
export async function sessionStartedAt(viewer: Pick<Viewer, "id" | "sessionId">): Promise<Date | null> {
  if (!viewer.sessionId) return null;
  const [row] = await getDb()
    .select({ createdAt: sessions.createdAt })
    .from(sessions)
    .where(and(eq(sessions.userId, viewer.id), eq(sessions.sessionToken, viewer.sessionId)))
    .limit(1);
  return row?.createdAt ?? null;
}

export function requireStudio(viewer: Viewer, studioId?: number) {
  const s = studioId === undefined ? viewer.studios[0] : viewer.studios.find((x) => x.studioId === studioId);
  if (!s) throw new ForbiddenError("This is for studio staff.");
  return s;
}
