import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { and, count, eq, isNull, like, sql } from "drizzle-orm";
import { comments, digestItems, outbox, trailEvents } from "@/db/schema";
import { addAttachment } from "@/lib/dal/attachments";
import {
  annotationsFor, editComment, listComments, postComment, reopenThread, replyToComment, resolveThread, setNoticePreference,
} from "@/lib/dal/comments";
import { sendCommentNotices } from "@/lib/dal/comment-notices";
import { peopleOnCommission } from "@/lib/dal/commission-people";
import { createDraft, circulate, updateDraft } from "@/lib/dal/revisions-write";
import { sendDigests } from "@/lib/digest";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { resetStorage } from "@/lib/storage";
import { tapTarget } from "@/models/comments";
import * as f from "../unit/uploads/fixtures";
import { PEOPLE, ROLES, type Who } from "./ballot-helpers";
import { closeDb, freshDemo, getDb, viewer } from "./db";

let dir: string;
let ids: Awaited<ReturnType<typeof freshDemo>>;
let rev: { id: number; number: number };
let drawing: number;
let pdf: number;
let draft: { id: number; number: number };
let otherDrawing: number;

const as = (who: Who | string) => viewer(who in PEOPLE ? PEOPLE[who as Who] : who);
const RUTH = "ruth@stwenna.test";

async function counts() {
  const db = getDb();
  const n = async (q: Promise<{ n: number }[]>) => Number((await q)[0].n);
  return {
    comments: await n(db.select({ n: count() }).from(comments)),
    trail: await n(db.select({ n: count() }).from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId))),
    outbox: await n(db.select({ n: count() }).from(outbox)),
    digest: await n(db.select({ n: count() }).from(digestItems)),
    state: JSON.stringify(await db.select({ id: comments.id, body: comments.body, resolvedAt: comments.resolvedAt, editedAt: comments.editedAt }).from(comments)),
  };
}
/** Refused with this error, and nothing changed. The call starts before `counts()`, so its outcome is caught at once. */
async function expectRefused(p: Promise<unknown>, kind: new (...a: never[]) => Error) {
  const outcome = p.then(() => null, (e: unknown) => e);
  const before = await counts();
  expect(await outcome).toBeInstanceOf(kind);
  expect(await counts()).toEqual(before);
}
const mailsTo = (email: string, key: string) =>
  getDb().select().from(outbox).where(and(eq(outbox.toEmail, email), like(outbox.dedupeKey, key)));
const trailFor = async (action: string, commentId: number) =>
  (await getDb().select().from(trailEvents).where(and(eq(trailEvents.commissionId, ids.commissionId), eq(trailEvents.action, action))))
    .filter((e) => e.subjectId === String(commentId));

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "placet-comments-"));
  process.env.STORAGE_DRIVER = "local";
  process.env.STORAGE_DIR = dir;
  resetStorage();
  ids = await freshDemo();
  const elias = await as("designer");
  const d = await createDraft(elias, ids.commissionId);
  await updateDraft(elias, ids.commissionId, d.number, { note: "Rim thickened; three engravings." });
  drawing = (await addAttachment(elias, d.id, { name: "west-elevation.png", bytes: await f.png(), caption: "West elevation" })).id;
  pdf = (await addAttachment(elias, d.id, { name: "section.pdf", bytes: await f.libPdf() })).id;
  await circulate(elias, ids.commissionId, d.number);
  rev = d;
  draft = await createDraft(elias, ids.commissionId);
  otherDrawing = (await addAttachment(elias, draft.id, { name: "next.png", bytes: await f.png(32, 32) })).id;
});
afterAll(async () => {
  await closeDb();
  resetStorage();
  await rm(dir, { recursive: true, force: true });
});

describe("who may comment and see comments", () => {
  it.each(ROLES.filter((r) => r !== "outsider"))("%s may post and read on a circulated revision", async (who) => {
    const v = await as(who);
    const { id } = await postComment(v, rev.id, { body: `A thought from the ${who}.` });
    const list = await listComments(v, rev.id);
    const t = list.threads.find((x) => x.id === id)!;
    expect(t).toMatchObject({ body: `A thought from the ${who}.`, target: { kind: "revision" }, targetLabel: "on the whole revision", resolved: false, resolvedBy: null });
    expect(t.author.name).toBe(v.name);
    expect(list.you.canComment).toBe(true);
    expect(list.you.canResolve).toBe(who === "owner" || who === "designer");
    const [ev] = await trailFor("comment posted", id);
    expect(ev.payload).toMatchObject({ number: rev.number, commentId: id, parentId: null, targetKind: "revision", body: `A thought from the ${who}.` });
  });

  it("someone from another commission gets 'not found' for reading, posting, replying, exporting and resolving", async () => {
    const owen = await as("outsider");
    const { id } = await postComment(await as("member"), rev.id, { body: "Mine" });
    await expectRefused(postComment(owen, rev.id, { body: "Hello" }), NotFoundError);
    await expect(listComments(owen, rev.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(annotationsFor(owen, rev.id)).rejects.toBeInstanceOf(NotFoundError);
    await expectRefused(replyToComment(owen, id, { body: "Hi" }), NotFoundError);
    await expectRefused(editComment(owen, id, { body: "Changed" }), NotFoundError);
    await expectRefused(resolveThread(owen, id), NotFoundError);
    await expectRefused(reopenThread(owen, id), NotFoundError);
    await expectRefused(postComment(owen, 987654, { body: "Hello" }), NotFoundError);
  });

  it("a draft is the studio's alone and takes no comments", async () => {
    await expectRefused(postComment(await as("designer"), draft.id, { body: "Note to self" }), ConflictError);
    await expectRefused(postComment(await as("member"), draft.id, { body: "Peek" }), NotFoundError);
    await expect(listComments(await as("chair"), draft.id)).rejects.toBeInstanceOf(NotFoundError);
    expect((await listComments(await as("designer"), draft.id)).you.canComment).toBe(false);
  });
});

describe("where a comment is pinned", () => {
  it("on a drawing of the revision, as a Media Fragments box, described in words", async () => {
    const david = await as("member");
    const { id } = await postComment(david, rev.id, { body: "The rim looks thin here.", target: tapTarget(drawing, 25, 40) });
    const t = (await listComments(david, rev.id)).threads.find((x) => x.id === id)!;
    expect(t.target).toEqual({ kind: "attachment", attachmentId: drawing, selector: "xywh=percent:24,39,2,2" });
    expect(t.targetLabel).toBe("on drawing “West elevation” at 25% across, 40% down");
  });
  it("a device's fractional, zero-size box is stored as the canonical tap", async () => {
    const { id } = await postComment(await as("member"), rev.id, { body: "Here", target: { kind: "attachment", attachmentId: drawing, selector: "xywh=percent:25.00,40.00,0,0" } });
    const [row] = await getDb().select().from(comments).where(eq(comments.id, id));
    expect(row.target).toEqual({ kind: "attachment", attachmentId: drawing, selector: "xywh=percent:24,39,2,2" });
  });
  it("on a point of the model", async () => {
    const { id } = await postComment(await as("adviser"), rev.id, { body: "Edge here?", target: { kind: "model", part: "bowl", point: [210, 0, 830.04] } });
    const t = (await listComments(await as("adviser"), rev.id)).threads.find((x) => x.id === id)!;
    expect(t.target).toEqual({ kind: "model", part: "bowl", point: [210, 0, 830] });
    expect(t.targetLabel).toBe("on the bowl, 830 mm up and 210 mm out from the centre");
  });
  it("refuses a drawing of another revision, a PDF, and bad places, naming the field", async () => {
    const david = await as("member");
    for (const target of [tapTarget(otherDrawing, 5, 5), tapTarget(pdf, 5, 5), tapTarget(999999, 5, 5),
      { kind: "attachment", attachmentId: drawing, selector: "xywh=percent:90,0,20,5" }, { kind: "model", part: "lid", point: [0, 0, 0] }, { kind: "somewhere" }]) {
      const before = await counts();
      const err = await postComment(david, rev.id, { body: "Here", target }).catch((e) => e);
      expect(err).toBeInstanceOf(ValidationError);
      expect(Object.keys((err as ValidationError).fields)).toEqual(["target"]);
      expect(await counts()).toEqual(before);
    }
  });
  it("refuses empty, over-long and non-text bodies with a message on the body field", async () => {
    for (const body of ["", "   ", "x".repeat(4001), 42, null]) {
      const err = await postComment(await as("member"), rev.id, { body }).catch((e) => e);
      expect(err).toBeInstanceOf(ValidationError);
      expect((err as ValidationError).fields.body).toBeTruthy();
    }
    const err = await postComment(await as("member"), rev.id, "not an object").catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
  });
});

describe("threads, edits and resolving", () => {
  it("replies join the thread, a reply to a reply too; the trail records them", async () => {
    const { id } = await postComment(await as("chair"), rev.id, { body: "Is 12 mm enough at the rim?" });
    const r1 = await replyToComment(await as("designer"), id, { body: "We can go to 15 mm." });
    const r2 = await replyToComment(await as("chair"), r1.id, { body: "Please do." });
    expect(r2.threadId).toBe(id);
    const t = (await listComments(await as("member"), rev.id)).threads.find((x) => x.id === id)!;
    expect(t.replies.map((r) => [r.body, r.author.roleLabel])).toEqual([["We can go to 15 mm.", "Designer"], ["Please do.", "Chair"]]);
    const [ev] = await trailFor("comment posted", r2.id);
    expect(ev.payload).toMatchObject({ parentId: id, targetKind: "reply", body: "Please do." });
  });

  it("only the author edits, within ten minutes; the trail keeps the old and the new words", async () => {
    const ruth = await as(RUTH);
    const { id } = await postComment(ruth, rev.id, { body: "Too tall for the children." });
    expect((await listComments(ruth, rev.id)).threads.find((x) => x.id === id)!.editableUntil).not.toBeNull();
    expect((await listComments(await as("member"), rev.id)).threads.find((x) => x.id === id)!.editableUntil).toBeNull();
    await expectRefused(editComment(await as("member"), id, { body: "Hijacked" }), ForbiddenError);
    await expectRefused(editComment(await as("designer"), id, { body: "Hijacked" }), ForbiddenError);
    expect(await editComment(ruth, id, { body: "Too tall for the younger children." })).toEqual({ id, changed: true });
    expect(await editComment(ruth, id, { body: "Too tall for the younger children." })).toEqual({ id, changed: false });
    const [ev] = await trailFor("comment edited", id);
    expect(ev.payload).toMatchObject({ commentId: id, from: "Too tall for the children.", to: "Too tall for the younger children." });
    expect(await trailFor("comment edited", id)).toHaveLength(1);
    const t = (await listComments(ruth, rev.id)).threads.find((x) => x.id === id)!;
    expect(t.body).toBe("Too tall for the younger children.");
    expect(t.editedAt).not.toBeNull();

    await getDb().update(comments).set({ createdAt: sql`created_at - INTERVAL 11 MINUTE` }).where(eq(comments.id, id));
    await expectRefused(editComment(ruth, id, { body: "Too late" }), ConflictError);
    expect((await listComments(ruth, rev.id)).threads.find((x) => x.id === id)!.editableUntil).toBeNull();
    const err = await editComment(ruth, id, { body: "" }).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
  });

  it("only the studio resolves and reopens; a resolved thread stays, marked", async () => {
    const { id } = await postComment(await as("member"), rev.id, { body: "Could the foot be wider?" });
    const reply = await replyToComment(await as("designer"), id, { body: "Widened by 20 mm." });
    for (const who of ["chair", "member", "adviser"] as Who[]) await expectRefused(resolveThread(await as(who), id), ForbiddenError);
    expect(await resolveThread(await as("designer"), reply.id)).toEqual({ id, changed: true }); // via a reply: the thread
    expect(await resolveThread(await as("owner"), id)).toEqual({ id, changed: false });
    const t = (await listComments(await as("member"), rev.id)).threads.find((x) => x.id === id)!;
    expect(t).toMatchObject({ resolved: true, resolvedBy: "Elias Brandt" });
    expect(t.resolvedAt).not.toBeNull();
    expect(t.replies).toHaveLength(1);
    for (const who of ["chair", "member", "adviser"] as Who[]) await expectRefused(reopenThread(await as(who), id), ForbiddenError);
    expect(await reopenThread(await as("owner"), id)).toEqual({ id, changed: true });
    expect((await listComments(await as("member"), rev.id)).threads.find((x) => x.id === id)!.resolved).toBe(false);
    expect(await trailFor("comment resolved", id)).toHaveLength(1);
    expect(await trailFor("comment reopened", id)).toHaveLength(1);
  });
});

describe("notices", () => {
  it("a reply mails the thread's author once through the outbox, even when they are also mentioned and the reply is edited", async () => {
    const david = await as("member");
    const { id } = await postComment(david, rev.id, { body: "Should the engravings face the door?" });
    const r = await replyToComment(await as("designer"), id, { body: "Yes, @David Osei — and @david@stwenna.test, the first one." });
    await editComment(await as("designer"), r.id, { body: "Yes, @David — the first one faces the door." });
    const mails = await mailsTo("david@stwenna.test", `comment:${r.id}:%`);
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toBe(`Elias Brandt replied to your comment on Revision ${rev.number} of "Baptismal font for the west end"`);
    expect(mails[0].bodyText).toContain("> Yes, @David Osei");
    expect(mails[0].bodyText).toContain(`/revisions/${rev.number}#comment-${id}`);
  });

  it("sending the same notice twice still leaves one outbox row per person", async () => {
    const elias = await as("designer");
    const { id } = await postComment(elias, rev.id, { body: "@Margaret and @Colin, please look at the foot." });
    const [c] = await getDb().select().from(comments).where(eq(comments.id, id));
    await getDb().transaction(async (tx) => {
      const people = await peopleOnCommission(tx, { id: ids.commissionId, studioId: ids.studioId });
      const n = {
        commission: { id: ids.commissionId, title: "Baptismal font for the west end" }, revisionNumber: rev.number, threadId: id, commentId: id,
        body: c.body, author: { id: elias.id, name: elias.name, roleLabel: "Designer" }, people,
        reasons: new Map(people.filter((p) => p.email !== elias.email).map((p) => [p.id, "mention" as const])),
      };
      await sendCommentNotices(tx, n);
      await sendCommentNotices(tx, n);
    });
    for (const email of ["margaret@stwenna.test", "colin@stwenna.test", "priya@stwenna.test"]) expect(await mailsTo(email, `comment:${id}:%`)).toHaveLength(1);
    expect(await mailsTo(elias.email, `comment:${id}:%`)).toHaveLength(0);
  });

  it("nobody is told about their own comment; a name not on the commission mentions nobody", async () => {
    const colin = await as("colin@stwenna.test");
    const { id } = await postComment(colin, rev.id, { body: "Note to @Colin: measure the doorway. Also ask @Bartholomew." });
    expect(await getDb().select().from(outbox).where(like(outbox.dedupeKey, `comment:${id}:%`))).toHaveLength(0);
    const { id: own } = await postComment(colin, rev.id, { body: "Mine" });
    const mine = await replyToComment(colin, own, { body: "Replying to myself" });
    for (const key of [`comment:${own}:%`, `comment:${mine.id}:%`]) expect(await mailsTo(colin.email, key)).toHaveLength(0);
  });

  it("someone who chose the digest gets a line, then one digest mail a day, not before the digest hour", async () => {
    await setNoticePreference(await as(RUTH), { notices: "digest" });
    await expect(setNoticePreference(await as(RUTH), { notices: "weekly" })).rejects.toBeInstanceOf(ValidationError);
    const ruth = await as(RUTH);
    expect(ruth.notices).toBe("digest");
    const { id } = await postComment(await as("chair"), rev.id, { body: "@Ruth Penhallow, could you check the step height?" });
    expect(await mailsTo(RUTH, `comment:${id}:%`)).toHaveLength(0);
    const lines = await getDb().select().from(digestItems).where(and(eq(digestItems.userId, ruth.id), isNull(digestItems.digestedAt)));
    expect(lines.map((l) => l.line)).toEqual([`Margaret Ellery mentioned you in a comment on Revision ${rev.number} of "Baptismal font for the west end"`]);

    expect(await sendDigests(new Date("2026-12-03T16:59:00Z"))).toEqual({ sent: 0 });
    expect(await sendDigests(new Date("2026-12-03T18:00:00Z"))).toEqual({ sent: 1 });
    const digests = await mailsTo(RUTH, "digest:%");
    expect(digests).toHaveLength(1);
    expect(digests[0].bodyText).toContain("Margaret Ellery mentioned you");
    expect(digests[0].bodyText).toContain(`#comment-${id}`);
    expect(await sendDigests(new Date("2026-12-03T19:00:00Z"))).toEqual({ sent: 0 });

    await replyToComment(await as("designer"), (await postComment(ruth, rev.id, { body: "Steps are 150 mm." })).id, { body: "Thank you." });
    expect(await sendDigests(new Date("2026-12-03T22:00:00Z"))).toEqual({ sent: 0 }); // once a day
    expect(await mailsTo(RUTH, "digest:%")).toHaveLength(1);
    expect(await sendDigests(new Date("2026-12-04T17:30:00Z"))).toEqual({ sent: 1 });
    const next = await mailsTo(RUTH, "digest:%");
    expect(next).toHaveLength(2);
    expect(next.map((m) => m.bodyText).join("\n")).toContain("Elias Brandt replied to your comment");
    expect(await getDb().select().from(digestItems).where(and(eq(digestItems.userId, ruth.id), isNull(digestItems.digestedAt)))).toHaveLength(0);
    await setNoticePreference(await as(RUTH), "immediate");
    expect((await as(RUTH)).notices).toBe("immediate");
  });
});

describe("people's words are plain text", () => {
  it("HTML is stored, listed and exported exactly as typed, as text/plain", async () => {
    const body = `<img src=x onerror="alert(1)"> <b>bold</b> & <script>document.cookie</script>`;
    const { id } = await postComment(await as("member"), rev.id, { body, target: tapTarget(drawing, 50, 50) });
    const [row] = await getDb().select().from(comments).where(eq(comments.id, id));
    expect(row.body).toBe(body);
    expect((await listComments(await as("chair"), rev.id)).threads.find((x) => x.id === id)!.body).toBe(body);
    const anno = await annotationsFor(await as("adviser"), rev.id);
    const item = anno.first.items.find((a) => a.id.endsWith(`#comment-${id}`))!;
    expect(item.body).toEqual({ type: "TextualBody", value: body, format: "text/plain", purpose: "commenting" });
    expect(item.target).toMatchObject({ source: expect.stringMatching(new RegExp(`/api/attachments/${drawing}/file$`)), selector: { type: "FragmentSelector", conformsTo: "http://www.w3.org/TR/media-frags/", value: "xywh=percent:49,49,2,2" } });
    expect(anno.total).toBe(anno.first.items.length);
  });
});
