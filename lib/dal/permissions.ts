import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { permissionPlans, releases, requiredPermissions, users } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { permissionRecorded } from "@/models/release/facts";
import { neededPermissionSchema, noneRequiredSchema, parseWith } from "@/models/release/inputs";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import { appendTrail, lockCommission, type Tx } from "../trail";
import { authorize, loadAccess, type Access } from "./access";
import { mailCommission } from "./release-mail";
import type { Viewer } from "./viewer";
import type { PermissionDto, PermissionsDto } from "@/models/release/dto";

export type { PermissionDto, PermissionsDto };

export type PermissionRow = typeof requiredPermissions.$inferSelect;



const ONLY_CHAIR = "Only the chair keeps the list of permissions and records them.";

/** Changes stop once the commission is released: the release was made on what was recorded. */
export async function assertNotReleased(tx: Tx | Db, commissionId: number): Promise<void> {
  const [r] = await tx.select({ id: releases.id }).from(releases).where(eq(releases.commissionId, commissionId));
  if (r) throw new ConflictError("The commission has been released to fabrication; what it was released on can no longer change.");
}

export function permissionDto(p: PermissionRow, recordedByName: string | null): PermissionDto {
  return {
    id: p.id, name: p.name, authority: p.authority, reference: p.reference, grantedOn: p.grantedOn, conditions: p.conditions,
    recorded: permissionRecorded(p), recordedByName, recordedAt: p.recordedAt?.toISOString() ?? null,
    document: p.documentKey && p.documentName && p.documentSha256 ? { name: p.documentName, sha256: p.documentSha256, url: `/api/permissions/${p.id}/document` } : null,
  };
}

/** The permissions the commission needs and what is recorded of each, for everyone on it. */
export async function getPermissions(viewer: Viewer, commissionId: number): Promise<PermissionsDto> {
  const db = getDb();
  const access = await loadAccess(db, viewer, commissionId);
  const [plan] = await db.select().from(permissionPlans).where(eq(permissionPlans.commissionId, commissionId));
  const rows = await db.select({ p: requiredPermissions, by: users.name }).from(requiredPermissions)
    .leftJoin(users, eq(users.id, requiredPermissions.recordedBy))
    .where(eq(requiredPermissions.commissionId, commissionId)).orderBy(asc(requiredPermissions.id));
  return {
    plan: plan ? { noneRequired: plan.noneRequired, reason: plan.reason } : null,
    permissions: rows.map((r) => permissionDto(r.p, r.by)),
    you: { mayRecord: can(access.actor, "permission.record") },
  };
}

async function setPlan(tx: Tx, commissionId: number, viewer: Viewer, noneRequired: boolean, reason: string) {
  await tx.insert(permissionPlans).values({ commissionId, noneRequired, reason, setBy: viewer.id, setAt: new Date() })
    .onDuplicateKeyUpdate({ set: { noneRequired, reason, setBy: viewer.id, setAt: new Date() } });
}

/** The chair adds a permission the commission needs (or says none is needed, with the reason). */
export async function setPermissionsNeeded(viewer: Viewer, commissionId: number, input: unknown): Promise<PermissionsDto> {
  const db = getDb();
  const access = await authorize(db, viewer, commissionId, "permission.record").catch(refuse);
  const none = (input as { noneRequired?: unknown } | null)?.noneRequired === true;
  const parsed = none ? parseWith(noneRequiredSchema, input) : parseWith(neededPermissionSchema, input);
  if (!parsed.ok) throw new ValidationError(parsed.errors);
  await db.transaction(async (tx) => {
    await lockCommission(tx, commissionId);
    await assertNotReleased(tx, commissionId);
    const listed = await tx.select({ id: requiredPermissions.id }).from(requiredPermissions).where(eq(requiredPermissions.commissionId, commissionId));
    if ("reason" in parsed.data) {
      if (listed.length) throw new ValidationError({ reason: "Take the permissions off the list first: the list says some are needed." });
      await setPlan(tx, commissionId, viewer, true, parsed.data.reason);
      await trail(tx, access, viewer, "no permission required", "commission", commissionId, { reason: parsed.data.reason });
      await mailCommission(tx, access.commission, {
        key: `no-permission:${commissionId}:${Date.now()}`, subject: "No outside permission needed", path: `/commissions/${commissionId}/release`,
        lines: [`${viewer.name}, as chair, recorded that the commission needs no outside permission.`, `The reason given:\n${parsed.data.reason}`],
      });
      return;
    }
    const { name, authority } = parsed.data;
    await setPlan(tx, commissionId, viewer, false, "");
    const [res] = await tx.insert(requiredPermissions).values({ commissionId, name, authority }).$returningId();
    await trail(tx, access, viewer, "permission required", "permission", res.id, { name, authority });
  });
  return getPermissions(viewer, commissionId);
}

/** The chair takes a permission that has not been recorded off the list. */
export async function dropPermission(viewer: Viewer, permissionId: number): Promise<PermissionsDto> {
  const db = getDb();
  const { access, row } = await loadPermission(db, viewer, permissionId);
  await db.transaction(async (tx) => {
    await lockCommission(tx, row.commissionId);
    await assertNotReleased(tx, row.commissionId);
    const [fresh] = await tx.select().from(requiredPermissions).where(eq(requiredPermissions.id, permissionId));
    if (!fresh) throw new NotFoundError();
    if (fresh.recordedAt) throw new ConflictError(`“${fresh.name}” has been recorded; a recorded permission stays on the record.`);
    await tx.delete(requiredPermissions).where(eq(requiredPermissions.id, permissionId));
    await trail(tx, access, viewer, "permission dropped", "permission", permissionId, { name: fresh.name });
  });
  return getPermissions(viewer, row.commissionId);
}

/** A permission and the chair's standing on its commission; anyone who cannot see the commission gets not found. */
export async function loadPermission(db: Db, viewer: Viewer, permissionId: number, action: "view" | "record" = "record") {
  if (!Number.isSafeInteger(permissionId) || permissionId <= 0) throw new NotFoundError();
  const [row] = await db.select().from(requiredPermissions).where(eq(requiredPermissions.id, permissionId));
  if (!row) throw new NotFoundError();
  const access = await loadAccess(db, viewer, row.commissionId);
  if (action === "record" && !can(access.actor, "permission.record")) throw new ForbiddenError(ONLY_CHAIR);
  return { access, row };
}

export async function trail(tx: Tx, access: Access, viewer: Viewer, action: Parameters<typeof appendTrail>[1]["action"], subjectType: string, subjectId: number, payload: Record<string, unknown>) {
  await appendTrail(tx, { commissionId: access.commission.id, actorId: viewer.id, actorRole: access.actingRole, action, subjectType, subjectId, payload });
}

function refuse(err: unknown): never {
  if (err instanceof ForbiddenError) throw new ForbiddenError(ONLY_CHAIR);
  throw err;
}
