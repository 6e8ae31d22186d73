import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, count, eq, max } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { attachments, revisions } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { editRefusal } from "@/models/revision";
import { countCheck, inspectUpload, safeDisplayName } from "../uploads";
import { getStorage } from "../storage";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import type { Tx } from "../trail";
import { draftChanged } from "./draft-trail";
import { lockedFor } from "./locked";
import { loadRevisionById, type RevisionRow } from "./revision-access";
import { attachmentDto, type AttachmentDto } from "./revisions-read";
import type { Access } from "./access";
import type { Viewer } from "./viewer";

export const CAPTION_MAX = 500;
type AttachmentRow = typeof attachments.$inferSelect;

/** Which extension each stored kind is served under; the uploaded name never reaches a header. */
const EXT: Record<AttachmentRow["kind"], string> = { png: "png", jpeg: "jpg", webp: "webp", pdf: "pdf" };
const SERVED_MIME: Record<AttachmentRow["kind"], string> = { png: "image/png", jpeg: "image/jpeg", webp: "image/webp", pdf: "application/pdf" };

function checkCaption(raw: unknown): string {
  if (raw === undefined || raw === null) return "";
  if (typeof raw !== "string") throw new ValidationError({ caption: "The caption must be text." });
  const caption = raw.replace(/\s+/gu, " ").trim();
  if (caption.length > CAPTION_MAX) {
    throw new ValidationError({ caption: `Keep the caption to ${CAPTION_MAX} characters or fewer (this one has ${caption.length}).` });
  }
  return caption;
}

const STUDIO_FILES = "Only the studio adds, changes or removes a revision's files.";

/** The studio, on a draft: anyone else is refused; a circulated revision is frozen. */
function requireEditable(access: Access, revision: Pick<RevisionRow, "state" | "number">) {
  if (!can(access.actor, "attachment.upload")) throw new ForbiddenError(STUDIO_FILES);
  const refusal = editRefusal(revision.state, revision.number);
  if (refusal) throw new ConflictError(refusal);
}

async function freshRevision(tx: Tx, revisionId: number) {
  const [fresh] = await tx.select().from(revisions).where(eq(revisions.id, revisionId));
  const refusal = fresh ? editRefusal(fresh.state, fresh.number) : "The revision no longer exists.";
  if (refusal) throw new ConflictError(refusal);
  return fresh;
}

const fileCount = async (db: Db | Tx, revisionId: number) =>
  (await db.select({ n: count() }).from(attachments).where(eq(attachments.revisionId, revisionId)))[0]?.n ?? 0;

/** An attachment the viewer may see, with its revision; "not found" for anyone without standing. */
async function loadAttachment(db: Db, viewer: Viewer, attachmentId: number) {
  if (!Number.isSafeInteger(attachmentId) || attachmentId <= 0) throw new NotFoundError();
  const [row] = await db.select().from(attachments).where(eq(attachments.id, attachmentId)).limit(1);
  if (!row) throw new NotFoundError();
  const { access, revision } = await loadRevisionById(db, viewer, row.revisionId);
  if (revision.commissionId !== row.commissionId) throw new NotFoundError();
  return { access, revision, row };
}

async function deleteQuietly(keys: (string | null | undefined)[]) {
  const storage = getStorage();
  for (const key of keys) {
    if (!key) continue;
    await storage.delete(key).catch((err) => console.error(`could not delete stored file ${key}`, err));
  }
}

/**
 * May this viewer add a file to this revision now? Lets the upload route refuse before it reads a body
 * of up to 25 MB; addAttachment checks all of it again.
 */
export async function checkCanAttach(viewer: Viewer, revisionId: number): Promise<void> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  requireEditable(access, revision);
  const room = countCheck(await fileCount(db, revision.id), 1);
  if (!room.ok) throw new ValidationError({ file: room.message });
}

/**
 * Adds one file to a draft revision. The file is checked by its content, stored under keys the server
 * chooses, and recorded with its trail event in one transaction; if that fails, the stored bytes go too.
 */
export async function addAttachment(viewer: Viewer, revisionId: number, input: { name: unknown; bytes: Uint8Array | ArrayBuffer; caption?: unknown }): Promise<AttachmentDto> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  requireEditable(access, revision);
  const caption = checkCaption(input.caption);
  const full = (message: string) => new ValidationError({ file: `“${safeDisplayName(input.name)}” cannot be added: ${message}` });
  const room = countCheck(await fileCount(db, revision.id), 1);
  if (!room.ok) throw full(room.message);
  const result = await inspectUpload({ name: typeof input.name === "string" ? input.name : "", bytes: input.bytes });
  if (!result.ok) throw new ValidationError({ file: result.message });

  const key = `c${revision.commissionId}/r${revision.id}/${randomUUID()}`;
  const thumbKey = result.thumbnail ? `${key}-thumb` : null;
  const storage = getStorage();
  try {
    await storage.put(key, result.normalized, result.mime);
    if (thumbKey && result.thumbnail) await storage.put(thumbKey, result.thumbnail, "image/webp");
    const id = await db.transaction(async (tx) => {
      const locked = await lockedFor(tx, viewer, revision.commissionId, { action: "attachment.upload", refusal: STUDIO_FILES });
      const fresh = await freshRevision(tx, revision.id);
      const again = countCheck(await fileCount(tx, fresh.id), 1);
      if (!again.ok) throw full(again.message);
      const [{ last }] = await tx.select({ last: max(attachments.position) }).from(attachments).where(eq(attachments.revisionId, fresh.id));
      const [res] = await tx.insert(attachments).values({
        revisionId: fresh.id, commissionId: fresh.commissionId, storageKey: key, thumbKey, kind: result.kind, mime: result.mime,
        name: result.safeName, caption, sha256: result.sha256, sizeBytes: result.normalized.byteLength,
        width: result.width ?? null, height: result.height ?? null, pages: result.pages ?? null,
        position: last === null || last === undefined ? 0 : Number(last) + 1, uploadedBy: viewer.id,
      }).$returningId();
      await tx.update(revisions).set({ updatedAt: new Date() }).where(eq(revisions.id, fresh.id));
      await draftChanged(tx, { commissionId: fresh.commissionId, actorId: viewer.id, actorRole: locked.actingRole, revisionId: fresh.id, number: fresh.number });
      return res.id;
    });
    const [row] = await db.select().from(attachments).where(eq(attachments.id, id));
    return attachmentDto(row);
  } catch (err) {
    await deleteQuietly([key, thumbKey]);
    throw err;
  }
}

/** Takes a file off a draft revision; its stored bytes are deleted once the removal is committed. */
export async function removeAttachment(viewer: Viewer, attachmentId: number): Promise<{ id: number }> {
  const db = getDb();
  const { access, revision, row } = await loadAttachment(db, viewer, attachmentId);
  requireEditable(access, revision);
  await db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, row.commissionId, { action: "attachment.upload", refusal: STUDIO_FILES });
    const fresh = await freshRevision(tx, revision.id);
    const [still] = await tx.select({ id: attachments.id }).from(attachments).where(eq(attachments.id, row.id));
    if (!still) throw new NotFoundError();
    await tx.delete(attachments).where(and(eq(attachments.id, row.id), eq(attachments.revisionId, fresh.id)));
    await tx.update(revisions).set({ updatedAt: new Date() }).where(eq(revisions.id, fresh.id));
    await draftChanged(tx, { commissionId: row.commissionId, actorId: viewer.id, actorRole: locked.actingRole, revisionId: fresh.id, number: fresh.number });
  });
  await deleteQuietly([row.storageKey, row.thumbKey]);
  return { id: row.id };
}

/** Changes a file's caption on a draft revision (trailed as an update of the draft). */
export async function updateCaption(viewer: Viewer, attachmentId: number, rawCaption: unknown): Promise<AttachmentDto> {
  const db = getDb();
  const { access, revision, row } = await loadAttachment(db, viewer, attachmentId);
  requireEditable(access, revision);
  const caption = checkCaption(rawCaption);
  await db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, row.commissionId, { action: "attachment.upload", refusal: STUDIO_FILES });
    const fresh = await freshRevision(tx, revision.id);
    const [current] = await tx.select().from(attachments).where(eq(attachments.id, row.id));
    if (!current) throw new NotFoundError();
    if (current.caption === caption) return;
    await tx.update(attachments).set({ caption }).where(eq(attachments.id, row.id));
    await tx.update(revisions).set({ updatedAt: new Date() }).where(eq(revisions.id, fresh.id));
    await draftChanged(tx, { commissionId: row.commissionId, actorId: viewer.id, actorRole: locked.actingRole, revisionId: fresh.id, number: fresh.number });
  });
  const [updated] = await db.select().from(attachments).where(eq(attachments.id, row.id));
  return attachmentDto(updated);
}

/** A revision's files in order, for whoever may see the revision. */
export async function listAttachments(viewer: Viewer, revisionId: number): Promise<AttachmentDto[]> {
  const db = getDb();
  const { revision } = await loadRevisionById(db, viewer, revisionId);
  const rows = await db.select().from(attachments).where(eq(attachments.revisionId, revision.id)).orderBy(asc(attachments.position), asc(attachments.id));
  return rows.map(attachmentDto);
}

export interface StoredFile {
  bytes: Uint8Array;
  mime: string;
  downloadName: string;
  sha256: string | null;
}

/** The stored bytes of a file or its thumbnail, after the same visibility check as its revision. */
export async function readAttachment(viewer: Viewer, attachmentId: number, variant: "file" | "thumb"): Promise<StoredFile> {
  const db = getDb();
  const { row } = await loadAttachment(db, viewer, attachmentId);
  const key = variant === "thumb" ? row.thumbKey : row.storageKey;
  if (!key) throw new NotFoundError();
  const bytes = await getStorage().get(key);
  if (!bytes) {
    console.error(`attachment ${row.id}: nothing stored under ${key}`);
    throw new NotFoundError();
  }
  return variant === "thumb"
    ? { bytes, mime: "image/webp", downloadName: `revision-attachment-${row.id}-thumb.webp`, sha256: null }
    : { bytes, mime: SERVED_MIME[row.kind], downloadName: `revision-attachment-${row.id}.${EXT[row.kind]}`, sha256: row.sha256 };
}
