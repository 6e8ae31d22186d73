import "server-only";
import { and, eq } from "drizzle-orm";
import type { z } from "zod";
import { getDb, type Db } from "@/db/client";
import { attachments, comments } from "@/db/schema";
import { can } from "@/models/permissions/policy";
import { commentTextSchema, findMentions, mayEdit, newCommentSchema, readTarget, EDIT_WINDOW_MS, type CommentTarget } from "@/models/comments";
import { fieldErrors } from "@/models/schemas/people";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../errors";
import { appendTrail, type Tx } from "../trail";
import { lockedFor } from "./locked";
import { peopleOnCommission, type CommissionPerson } from "./commission-people";
import { addReason, sendCommentNotices, type NoticeReason } from "./comment-notices";
import { loadRevisionById, type RevisionRow } from "./revision-access";
import type { Access } from "./access";
import type { Viewer } from "./viewer";

type CommentRow = typeof comments.$inferSelect;
const IMAGE_KINDS = new Set(["png", "jpeg", "webp"]);

function parse<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const r = schema.safeParse(input ?? {});
  if (!r.success) throw new ValidationError(fieldErrors(r.error));
  return r.data;
}

const NO_COMMENTS = "Your role on this commission does not allow comments.";
const STUDIO_RESOLVES = "Only the studio resolves or reopens comment threads.";

/** The revision, if the viewer may comment on it: anyone on the commission, once it has been circulated. */
async function commentable(db: Db, viewer: Viewer, revisionId: number) {
  const { access, revision } = await loadRevisionById(db, viewer, revisionId);
  if (!can(access.actor, "comment.post")) throw new ForbiddenError(NO_COMMENTS);
  if (revision.state === "draft") throw new ConflictError("Comments open once the revision has been circulated.");
  return { access, revision };
}

/** A comment the viewer may see, with its revision and the viewer's standing. */
async function loadComment(db: Db, viewer: Viewer, commentId: number) {
  if (!Number.isSafeInteger(commentId) || commentId <= 0) throw new NotFoundError();
  const [row] = await db.select().from(comments).where(eq(comments.id, commentId)).limit(1);
  if (!row) throw new NotFoundError();
  const { access, revision } = await loadRevisionById(db, viewer, row.revisionId);
  if (revision.commissionId !== row.commissionId) throw new NotFoundError();
  return { access, revision, row };
}

async function checkAttachment(db: Db, revisionId: number, target: CommentTarget) {
  if (target.kind !== "attachment") return;
  const [a] = await db.select({ kind: attachments.kind }).from(attachments)
    .where(and(eq(attachments.id, target.attachmentId), eq(attachments.revisionId, revisionId))).limit(1);
  if (!a) throw new ValidationError({ target: "That drawing is not part of this revision." });
  if (!IMAGE_KINDS.has(a.kind)) throw new ValidationError({ target: "Pins go on pictures; for a PDF, comment on the whole revision and say which page." });
}

interface Posted { access: Access; revision: RevisionRow; viewer: Viewer; threadId: number; commentId: number; body: string; reasons: Map<string, NoticeReason>; people: CommissionPerson[] }

async function notify(tx: Tx, p: Posted) {
  for (const id of findMentions(p.body, p.people)) addReason(p.reasons, id, "mention");
  const me = p.people.find((x) => x.id === p.viewer.id);
  await sendCommentNotices(tx, {
    commission: { id: p.access.commission.id, title: p.access.commission.title }, revisionNumber: p.revision.number,
    threadId: p.threadId, commentId: p.commentId, body: p.body, people: p.people, reasons: p.reasons,
    author: { id: p.viewer.id, name: p.viewer.name, roleLabel: me?.roleLabel ?? p.access.actingRole },
  });
}

/** Starts a thread on a circulated (or superseded, or decided) revision: on the whole of it, a drawing, or the model. */
export async function postComment(viewer: Viewer, revisionId: number, input: unknown): Promise<{ id: number }> {
  const db = getDb();
  const { access, revision } = await commentable(db, viewer, revisionId);
  const { body, target } = parse(newCommentSchema, input);
  await checkAttachment(db, revision.id, target);
  const commissionId = revision.commissionId;
  return db.transaction(async (tx) => {
    await lockedFor(tx, viewer, commissionId, { action: "comment.post", refusal: NO_COMMENTS });
    const [res] = await tx.insert(comments).values({ revisionId: revision.id, commissionId, authorId: viewer.id, body, target }).$returningId();
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "comment posted", subjectType: "comment", subjectId: res.id,
      payload: { number: revision.number, commentId: res.id, parentId: null, targetKind: target.kind, target, body },
    });
    const people = await peopleOnCommission(tx, access.commission);
    await notify(tx, { access, revision, viewer, threadId: res.id, commentId: res.id, body, reasons: new Map(), people });
    return { id: res.id };
  });
}

/** Replies in a thread (a reply to a reply joins the same thread); tells the people being answered. */
export async function replyToComment(viewer: Viewer, commentId: number, input: unknown): Promise<{ id: number; threadId: number }> {
  const db = getDb();
  const { row } = await loadComment(db, viewer, commentId);
  const { access, revision } = await commentable(db, viewer, row.revisionId);
  const { body } = parse(commentTextSchema, input);
  const threadId = row.parentId ?? row.id;
  return db.transaction(async (tx) => {
    await lockedFor(tx, viewer, revision.commissionId, { action: "comment.post", refusal: NO_COMMENTS });
    const [root] = await tx.select().from(comments).where(eq(comments.id, threadId));
    if (!root) throw new NotFoundError();
    const [res] = await tx.insert(comments).values({
      revisionId: revision.id, commissionId: revision.commissionId, parentId: root.id, authorId: viewer.id, body, target: readTarget(root.target),
    }).$returningId();
    await appendTrail(tx, {
      commissionId: revision.commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "comment posted", subjectType: "comment", subjectId: res.id,
      payload: { number: revision.number, commentId: res.id, parentId: root.id, targetKind: "reply", body },
    });
    const reasons = new Map<string, NoticeReason>([[root.authorId, "reply"], [row.authorId, "reply"]]);
    const people = await peopleOnCommission(tx, access.commission);
    await notify(tx, { access, revision, viewer, threadId: root.id, commentId: res.id, body, reasons, people });
    return { id: res.id, threadId: root.id };
  });
}

/** The author changes their words within ten minutes of posting; the trail keeps both versions. */
export async function editComment(viewer: Viewer, commentId: number, input: unknown): Promise<{ id: number; changed: boolean }> {
  const db = getDb();
  const { access, revision, row } = await loadComment(db, viewer, commentId);
  if (row.authorId !== viewer.id) throw new ForbiddenError("Only the person who wrote a comment can edit it.");
  const { body } = parse(commentTextSchema, input);
  return db.transaction(async (tx) => {
    await lockedFor(tx, viewer, revision.commissionId);
    const [fresh] = await tx.select().from(comments).where(eq(comments.id, row.id));
    if (!mayEdit(fresh, viewer.id, new Date())) {
      throw new ConflictError(`A comment can be edited for ${EDIT_WINDOW_MS / 60_000} minutes after it is posted; this one can no longer change. Add a reply instead.`);
    }
    if (fresh.body === body) return { id: row.id, changed: false };
    await tx.update(comments).set({ body, editedAt: new Date() }).where(eq(comments.id, row.id));
    await appendTrail(tx, {
      commissionId: revision.commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "comment edited", subjectType: "comment", subjectId: row.id,
      payload: { number: revision.number, commentId: row.id, from: fresh.body, to: body },
    });
    // Someone newly mentioned is told; anyone told before is not told again (one notice per comment and person).
    const people = await peopleOnCommission(tx, access.commission);
    await notify(tx, { access, revision, viewer, threadId: fresh.parentId ?? fresh.id, commentId: row.id, body, reasons: new Map(), people });
    return { id: row.id, changed: true };
  });
}

async function setResolved(viewer: Viewer, commentId: number, resolve: boolean): Promise<{ id: number; changed: boolean }> {
  const db = getDb();
  const { access, revision, row } = await loadComment(db, viewer, commentId);
  if (!can(access.actor, "comment.resolve")) throw new ForbiddenError(STUDIO_RESOLVES);
  const threadId = row.parentId ?? row.id;
  return db.transaction(async (tx) => {
    await lockedFor(tx, viewer, revision.commissionId, { action: "comment.resolve", refusal: STUDIO_RESOLVES });
    const [root] = await tx.select().from(comments).where(eq(comments.id, threadId));
    if (!root) throw new NotFoundError();
    if ((root.resolvedAt !== null) === resolve) return { id: root.id, changed: false };
    await tx.update(comments).set(resolve ? { resolvedAt: new Date(), resolvedBy: viewer.id } : { resolvedAt: null, resolvedBy: null }).where(eq(comments.id, root.id));
    await appendTrail(tx, {
      commissionId: revision.commissionId, actorId: viewer.id, actorRole: access.actingRole,
      action: resolve ? "comment resolved" : "comment reopened", subjectType: "comment", subjectId: root.id,
      payload: { number: revision.number, commentId: root.id },
    });
    return { id: root.id, changed: true };
  });
}

/** The studio marks a thread resolved; it stays in the record, shown folded away. */
export const resolveThread = (viewer: Viewer, commentId: number) => setResolved(viewer, commentId, true);
/** The studio opens a resolved thread again. */
export const reopenThread = (viewer: Viewer, commentId: number) => setResolved(viewer, commentId, false);

export type { CommentRow };
