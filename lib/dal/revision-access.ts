import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { revisions } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { visibleToCommittee } from "@/models/revision";
import { NotFoundError } from "../errors";
import { loadAccess, type Access } from "./access";
import type { Viewer } from "./viewer";

export type RevisionRow = typeof revisions.$inferSelect;

/** The revision if the viewer may see it: drafts are the studio's alone; anyone else gets "not found". */
export async function loadRevision(db: Db, viewer: Viewer, commissionId: number, number: number): Promise<{ access: Access; revision: RevisionRow }> {
  if (!Number.isSafeInteger(number) || number <= 0) throw new NotFoundError();
  const access = await loadAccess(db, viewer, commissionId);
  const [revision] = await db.select().from(revisions).where(and(eq(revisions.commissionId, commissionId), eq(revisions.number, number))).limit(1);
  if (!revision) throw new NotFoundError();
  guard(access, revision);
  return { access, revision };
}

export async function loadRevisionById(db: Db, viewer: Viewer, revisionId: number): Promise<{ access: Access; revision: RevisionRow }> {
  if (!Number.isSafeInteger(revisionId) || revisionId <= 0) throw new NotFoundError();
  const [revision] = await db.select().from(revisions).where(eq(revisions.id, revisionId)).limit(1);
  if (!revision) throw new NotFoundError();
  const access = await loadAccess(db, viewer, revision.commissionId);
  guard(access, revision);
  return { access, revision };
}

function guard(access: Access, revision: RevisionRow) {
  const ok = visibleToCommittee(revision.state) ? can(access.actor, "revision.viewCirculated") : can(access.actor, "revision.viewDraft");
  if (!ok) throw new NotFoundError();
}
