import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { commissions, requiredPermissions } from "@/db/schema";
import { parseWith, permissionRecordSchema } from "@/models/release/inputs";
import { getStorage } from "../storage";
import { inspectUpload, safeDisplayName } from "../uploads";
import { ConflictError, NotFoundError, ValidationError } from "../errors";
import { lockCommission } from "../trail";
import type { StoredFile } from "./attachments";
import { assertNotReleased, getPermissions, loadPermission, trail, type PermissionsDto } from "./permissions";
import { mailCommission } from "./release-mail";
import type { Viewer } from "./viewer";

/** May this viewer record this permission now? Lets the route refuse before it reads an upload body. */
export async function checkCanRecordPermission(viewer: Viewer, permissionId: number): Promise<void> {
  const db = getDb();
  const { row } = await loadPermission(db, viewer, permissionId);
  await assertNotReleased(db, row.commissionId);
}

/**
 * The chair records a permission as granted: authority, reference, date granted, conditions and the
 * document (checked by the same upload pipeline as revision files). Recording again replaces the record (the earlier document stays stored);
 * every recording is its own trail event with the document's SHA-256.
 */
export async function recordPermission(
  viewer: Viewer, permissionId: number, input: { name: unknown; bytes: Uint8Array; fields: Record<string, string> },
): Promise<PermissionsDto> {
  const db = getDb();
  const { access, row } = await loadPermission(db, viewer, permissionId);
  const parsed = parseWith(permissionRecordSchema(new Date().toISOString().slice(0, 10)), input.fields);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  const file = await inspectUpload({ name: typeof input.name === "string" ? input.name : "", bytes: input.bytes });
  if (!file.ok) throw new ValidationError({ file: file.message });
  const key = `c${row.commissionId}/permissions/${randomUUID()}`;
  const storage = getStorage();
  await storage.put(key, file.normalized, file.mime);
  try {
    await db.transaction(async (tx) => {
      await lockCommission(tx, row.commissionId);
      await assertNotReleased(tx, row.commissionId);
      const [fresh] = await tx.select().from(requiredPermissions).where(eq(requiredPermissions.id, permissionId));
      if (!fresh) throw new NotFoundError();
      const d = parsed.data;
      const now = new Date();
      await tx.update(requiredPermissions).set({
        authority: d.authority, reference: d.reference, grantedOn: d.grantedOn, conditions: d.conditions,
        documentKey: key, documentName: file.safeName, documentMime: file.mime, documentSha256: file.sha256,
        documentSize: file.normalized.byteLength, recordedBy: viewer.id, recordedAt: now,
      }).where(eq(requiredPermissions.id, permissionId));
      await trail(tx, access, viewer, "permission recorded", "permission", permissionId, {
        name: fresh.name, authority: d.authority, reference: d.reference, grantedOn: d.grantedOn, conditions: d.conditions,
        document: { name: file.safeName, sha256: file.sha256 }, replaced: fresh.recordedAt !== null,
      });
      const [c] = await tx.select().from(commissions).where(eq(commissions.id, row.commissionId));
      await mailCommission(tx, c, {
        key: `permission:${permissionId}:${file.sha256}`, subject: `Permission recorded: ${fresh.name}`, path: `/commissions/${c.id}/release`,
        lines: [
          `${viewer.name}, as chair, recorded ${fresh.name}: granted by ${d.authority} on ${d.grantedOn}, reference ${d.reference}.`,
          d.conditions ? `Its conditions:\n${d.conditions}` : "It carries no conditions.",
          `The document "${file.safeName}" has SHA-256 ${file.sha256}.`,
        ],
      });
    });
  } catch (err) {
    await storage.delete(key).catch(() => undefined);
    throw err;
  }
  return getPermissions(viewer, row.commissionId);
}

/** The recorded document, for everyone on the commission. */
export async function readPermissionDocument(viewer: Viewer, permissionId: number): Promise<StoredFile> {
  const { row } = await loadPermission(getDb(), viewer, permissionId, "view");
  if (!row.documentKey || !row.documentMime) throw new NotFoundError();
  const bytes = await getStorage().get(row.documentKey);
  if (!bytes) throw new ConflictError("The document is missing from storage.");
  return { bytes, mime: row.documentMime, downloadName: safeDisplayName(row.documentName ?? "permission").replace(/["\\]/g, "_"), sha256: row.documentSha256 };
}
