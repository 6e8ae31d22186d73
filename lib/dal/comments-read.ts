import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { attachments, comments, users } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import {
  describeTarget, editableUntil, mayEdit, readTarget, toAnnotationCollection,
  type AnnotationCollection, type CommentAuthorDto, type CommentDto, type CommentsDto, type ThreadDto,
} from "@/models/comments";
import { env } from "../env";
import { peopleOnCommission } from "./commission-people";
import { loadRevisionById, type RevisionRow } from "./revision-access";
import type { Access } from "./access";
import type { Viewer } from "./viewer";

type CommentRow = typeof comments.$inferSelect;

/** Every thread on a revision, oldest first, with its replies, authors, pin and resolved state. */
export async function loadThreads(db: Db, access: Access, revision: RevisionRow, viewer: Viewer, now = new Date()): Promise<ThreadDto[]> {
  const rows = await db.select().from(comments).where(eq(comments.revisionId, revision.id)).orderBy(asc(comments.id));
  if (!rows.length) return [];
  const people = new Map((await peopleOnCommission(db, access.commission)).map((p) => [p.id, p]));
  const missing = [...new Set(rows.flatMap((r) => [r.authorId, r.resolvedBy ?? ""]))].filter((id) => id && !people.has(id));
  const former = new Map<string, string>();
  if (missing.length) {
    for (const u of await db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, missing))) former.set(u.id, u.name ?? u.email);
  }
  const author = (id: string): CommentAuthorDto => {
    const p = people.get(id);
    return p ? { id, name: p.name, role: p.role, roleLabel: p.roleLabel } : { id, name: former.get(id) ?? "Someone", role: "former", roleLabel: "No longer on the commission" };
  };
  const files = new Map((await db.select({ id: attachments.id, name: attachments.name, caption: attachments.caption }).from(attachments)
    .where(eq(attachments.revisionId, revision.id))).map((a) => [a.id, a.caption || a.name]));

  const dto = (r: CommentRow): CommentDto => ({
    id: r.id, body: r.body, author: author(r.authorId), createdAt: r.createdAt.toISOString(), editedAt: r.editedAt?.toISOString() ?? null,
    editableUntil: mayEdit(r, viewer.id, now) ? editableUntil(r.createdAt).toISOString() : null,
  });
  const replies = new Map<number, CommentDto[]>();
  for (const r of rows) if (r.parentId !== null) replies.set(r.parentId, [...(replies.get(r.parentId) ?? []), dto(r)]);
  return rows.filter((r) => r.parentId === null).map((r, i) => {
    const target = readTarget(r.target);
    return {
      ...dto(r), number: i + 1, target,
      targetLabel: describeTarget(target, { attachmentName: (id) => files.get(id), units: viewer.units }),
      resolved: r.resolvedAt !== null,
      resolvedAt: r.resolvedAt?.toISOString() ?? null,
      resolvedBy: r.resolvedAt ? author(r.resolvedBy ?? "").name : null,
      replies: replies.get(r.id) ?? [],
    };
  });
}

/** The comments on a revision the viewer may see (drafts: studio only, and they have none). */
export async function listComments(viewer: Viewer, revisionId: number): Promise<CommentsDto> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  const now = new Date();
  return {
    revisionId: revision.id,
    threads: await loadThreads(db, access, revision, viewer, now),
    you: {
      canComment: revision.state !== "draft" && can(access.actor, "comment.post"),
      canResolve: revision.state !== "draft" && can(access.actor, "comment.resolve"),
      notices: viewer.notices,
    },
    serverTime: now.toISOString(),
  };
}

/** The revision's comments as a W3C Web Annotation collection. */
export async function annotationsFor(viewer: Viewer, revisionId: number): Promise<AnnotationCollection> {
  const db = getDb();
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  const threads = await loadThreads(db, access, revision, viewer);
  return toAnnotationCollection({ id: revision.id, commissionId: revision.commissionId, number: revision.number }, threads, env.appUrl);
}
