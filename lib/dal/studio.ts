import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { studioMembers, studios, users } from "@/db/schema";
import { demoStudioSettings, studioSettingsSchema, type StudioSettings } from "@/models/font";
import { ForbiddenError, ValidationError } from "../errors";
import { logSecurity } from "../security-log";
import { loadAccess } from "./access";
import { requireStudio, type Viewer } from "./viewer";

function parseSettings(raw: unknown): StudioSettings {
  const r = studioSettingsSchema.safeParse(raw);
  return r.success ? r.data : demoStudioSettings;
}

/** The settings of the studio making this commission (for its cold-working plan). */
export async function settingsForCommission(viewer: Viewer, commissionId: number): Promise<StudioSettings> {
  const db = getDb();
  const { commission } = await loadAccess(db, viewer, commissionId);
  const [s] = await db.select({ settings: studios.settings }).from(studios).where(eq(studios.id, commission.studioId));
  return parseSettings(s?.settings);
}

export async function getStudio(viewer: Viewer) {
  const mine = requireStudio(viewer);
  const db = getDb();
  const [s] = await db.select().from(studios).where(eq(studios.id, mine.studioId));
  const staff = await db
    .select({ name: users.name, email: users.email, role: studioMembers.role })
    .from(studioMembers).innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, mine.studioId)).orderBy(asc(studioMembers.role), asc(users.name));
  return { id: s.id, name: s.name, town: s.town, role: mine.role, settings: parseSettings(s.settings), staff };
}

/** The owner changes the studio's machines, abrasive sets and default stock. */
export async function updateStudioSettings(viewer: Viewer, input: unknown): Promise<StudioSettings> {
  const mine = requireStudio(viewer);
  if (mine.role !== "owner") throw new ForbiddenError("Only the studio's owner changes its machines and abrasives.");
  const r = studioSettingsSchema.safeParse(input);
  if (!r.success) {
    const fields: Record<string, string> = {};
    for (const issue of r.error.issues) fields[issue.path.join(".") || "_form"] ??= issue.message;
    throw new ValidationError(fields);
  }
  const db = getDb();
  const before = await db.transaction(async (tx) => {
    const [row] = await tx.select({ settings: studios.settings }).from(studios).where(eq(studios.id, mine.studioId)).for("update");
    await tx.update(studios).set({ settings: r.data }).where(eq(studios.id, mine.studioId));
    return row?.settings;
  });
  await logSecurity({ userId: viewer.id, email: viewer.email, action: "studio settings changed", detail: { studioId: mine.studioId, before, after: r.data } });
  return r.data;
}
