import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { attachments, revisions, users } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { REVISION_STATE_LABELS, visibleToCommittee, type RevisionState } from "@/models/revision";
import { evaluateFont, type FontFigures, type FontParameters } from "@/models/font";
import { loadAccess, type Access } from "./access";
import { loadRevision, loadRevisionById, type RevisionRow } from "./revision-access";
import type { Viewer } from "./viewer";

export interface AttachmentDto {
  id: number;
  name: string;
  caption: string;
  kind: string;
  mime: string;
  sha256: string;
  sizeBytes: number;
  width: number | null;
  height: number | null;
  pages: number | null;
  position: number;
  url: string;
  thumbUrl: string | null;
}

export interface RevisionSummaryDto {
  id: number;
  number: number;
  state: RevisionState;
  stateLabel: string;
  contentHash: string | null;
  note: string;
  circulatedAt: string | null;
  updatedAt: string;
}

export interface RevisionDto extends RevisionSummaryDto {
  commissionId: number;
  params: FontParameters | Record<string, unknown>;
  /** Frozen at circulation; computed from the parameters while a draft (null if they are invalid). */
  figures: FontFigures | null;
  attachments: AttachmentDto[];
  circulatedBy: string | null;
  you: { canEdit: boolean; canCirculate: boolean; canComment: boolean; canResolve: boolean; units: "mm" | "in" };
}

export function summary(r: RevisionRow): RevisionSummaryDto {
  return {
    id: r.id, number: r.number, state: r.state, stateLabel: REVISION_STATE_LABELS[r.state], contentHash: r.contentHash,
    note: r.note, circulatedAt: r.circulatedAt?.toISOString() ?? null, updatedAt: r.updatedAt.toISOString(),
  };
}

export function attachmentDto(a: typeof attachments.$inferSelect): AttachmentDto {
  return {
    id: a.id, name: a.name, caption: a.caption, kind: a.kind, mime: a.mime, sha256: a.sha256, sizeBytes: a.sizeBytes,
    width: a.width, height: a.height, pages: a.pages, position: a.position,
    url: `/api/attachments/${a.id}/file`, thumbUrl: a.thumbKey ? `/api/attachments/${a.id}/thumb` : null,
  };
}

/** Every revision the viewer may see, newest first (drafts only for the studio). */
export async function listRevisions(viewer: Viewer, commissionId: number): Promise<RevisionSummaryDto[]> {
  const db = getDb();
  const { actor } = await loadAccess(db, viewer, commissionId);
  const rows = await db.select().from(revisions).where(eq(revisions.commissionId, commissionId)).orderBy(asc(revisions.number));
  return rows.filter((r) => visibleToCommittee(r.state) || can(actor, "revision.viewDraft")).map(summary).reverse();
}

export async function getRevision(viewer: Viewer, revisionId: number): Promise<RevisionDto> {
  const db = getDb();
  return revisionDto(viewer, await loadRevisionById(db, viewer, revisionId));
}

/** The revision a page URL names (commission and number), with the same access check, loaded once. */
export async function getRevisionByNumber(viewer: Viewer, commissionId: number, number: number): Promise<RevisionDto> {
  return revisionDto(viewer, await loadRevision(getDb(), viewer, commissionId, number));
}

async function revisionDto(viewer: Viewer, { access, revision: r }: { access: Access; revision: RevisionRow }): Promise<RevisionDto> {
  const db = getDb();
  const files = await db.select().from(attachments).where(eq(attachments.revisionId, r.id)).orderBy(asc(attachments.position), asc(attachments.id));
  let figures = r.figures as FontFigures | null;
  if (!figures) {
    const ev = evaluateFont(r.params);
    figures = ev.ok ? ev.figures : null;
  }
  let circulatedBy: string | null = null;
  if (r.circulatedBy) {
    const [u] = await db.select({ name: users.name }).from(users).where(inArray(users.id, [r.circulatedBy]));
    circulatedBy = u?.name ?? null;
  }
  const studio = can(access.actor, "revision.draft");
  return {
    ...summary(r), commissionId: r.commissionId, params: r.params, figures, attachments: files.map(attachmentDto), circulatedBy,
    you: {
      canEdit: studio && r.state === "draft", canCirculate: studio && r.state === "draft",
      canComment: r.state !== "draft" && can(access.actor, "comment.post"), canResolve: can(access.actor, "comment.resolve"),
      units: viewer.units,
    },
  };
}
