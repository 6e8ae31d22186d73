import "server-only";
import { eq } from "drizzle-orm";
import { getDb, withRetry } from "@/db/client";
import { sessions, studioMembers, studios, users } from "@/db/schema";
import type { StudioRole } from "@/models/permissions/policy";
import { UnauthenticatedError } from "../errors";

/** The person asking, with their studio roles read from the database on every request. */
export interface Viewer {
  id: string;
  email: string;
  name: string;
  units: "mm" | "in";
  notices: "immediate" | "digest";
  studios: { studioId: number; studioName: string; role: StudioRole }[];
}

export async function loadViewer(userId: string): Promise<Viewer | null> {
  return withRetry(async () => {
    const db = getDb();
    const [u] = await db.select().from(users).where(eq(users.id, userId)).limit(1);
    if (!u) return null;
    const rows = await db
      .select({ studioId: studioMembers.studioId, role: studioMembers.role, studioName: studios.name })
      .from(studioMembers)
      .innerJoin(studios, eq(studios.id, studioMembers.studioId))
      .where(eq(studioMembers.userId, userId));
    return { id: u.id, email: u.email, name: u.name ?? u.email, units: u.units, notices: u.notices, studios: rows };
  });
}

/** When the current session began (for the chair's fresh sign-in before signing a decision). */
export async function sessionStartedAt(userId: string): Promise<Date | null> {
  const db = getDb();
  const rows = await db.select({ createdAt: sessions.createdAt }).from(sessions).where(eq(sessions.userId, userId));
  if (!rows.length) return null;
  return rows.reduce((a, b) => (a.createdAt > b.createdAt ? a : b)).createdAt;
}

export function requireStudio(viewer: Viewer, studioId?: number) {
  const s = studioId === undefined ? viewer.studios[0] : viewer.studios.find((x) => x.studioId === studioId);
  if (!s) throw new UnauthenticatedError("This is for studio staff.");
  return s;
}
