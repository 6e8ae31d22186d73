import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { attachments, ballots, commissionMembers, commissions, revisions, users } from "@/db/schema";
import { defaultFontParameters, evaluateFont } from "@/models/font";
import { editRefusal, NOTE_MAX, revisionContent } from "@/models/revision";
import { revisionContentHash } from "@/models/revision/hash-node";
import { env } from "../env";
import { ConflictError, ForbiddenError, ValidationError } from "../errors";
import { can } from "@/models/permissions/policy";
import { closeBallotTx } from "./ballot-core";
import { enqueueMail } from "../outbox";
import { appendTrail, type Tx } from "../trail";
import { authorize } from "./access";
import { draftChanged } from "./draft-trail";
import { lockedFor } from "./locked";
import { loadRevision } from "./revision-access";
import type { Viewer } from "./viewer";

const STUDIO_EDITS = "Only the studio edits revisions.";
const STUDIO_CIRCULATES = "Only the studio circulates revisions.";

function fontErrors(fieldErrors: Record<string, string[] | undefined>, formErrors: string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(fieldErrors)) if (v?.length) out[k] = v[0];
  if (formErrors.length) out._form = formErrors[0];
  return out;
}

function checkNote(note: unknown): string {
  if (note === undefined || note === null) return "";
  if (typeof note !== "string") throw new ValidationError({ note: "The note must be text." });
  if (note.length > NOTE_MAX) throw new ValidationError({ note: `Keep the note under ${NOTE_MAX} characters.` });
  return note.trim();
}

/** Starts the next numbered revision as a draft, from the latest revision's parameters (or the defaults). */
export async function createDraft(viewer: Viewer, commissionId: number, input: { note?: unknown } = {}): Promise<{ id: number; number: number }> {
  const db = getDb();
  await authorize(db, viewer, commissionId, "revision.draft");
  const note = checkNote(input.note);
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: "revision.draft", refusal: STUDIO_EDITS });
    const [latest] = await tx.select().from(revisions).where(eq(revisions.commissionId, commissionId)).orderBy(desc(revisions.number)).limit(1);
    if (latest?.state === "draft") throw new ConflictError(`Revision ${latest.number} is still a draft; finish and circulate it first.`);
    const number = (latest?.number ?? 0) + 1;
    const params = (latest?.params ?? defaultFontParameters) as Record<string, unknown>;
    const [res] = await tx.insert(revisions).values({ commissionId, number, state: "draft", params, note, createdBy: viewer.id }).$returningId();
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "revision drafted",
      subjectType: "revision", subjectId: res.id, payload: { number, basedOn: latest?.number ?? null },
    });
    return { id: res.id, number };
  });
}

/** Changes a draft's parameters and note. A circulated revision is frozen: refused. */
export async function updateDraft(viewer: Viewer, commissionId: number, number: number, input: { params?: unknown; note?: unknown }) {
  const db = getDb();
  const { access, revision } = await loadRevision(db, viewer, commissionId, number);
  if (!can(access.actor, "revision.draft")) throw new ForbiddenError(STUDIO_EDITS);
  const frozen = editRefusal(revision.state, revision.number);
  if (frozen) throw new ConflictError(frozen);
  const noteInput = input.note === undefined ? undefined : checkNote(input.note);
  if (input.params !== undefined && (!input.params || typeof input.params !== "object" || Array.isArray(input.params))) {
    throw new ValidationError({ params: "The model's parameters must be an object." });
  }
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: "revision.draft", refusal: STUDIO_EDITS });
    const [fresh] = await tx.select().from(revisions).where(eq(revisions.id, revision.id));
    const refusal = editRefusal(fresh.state, fresh.number);
    if (refusal) throw new ConflictError(refusal);
    const note = noteInput ?? fresh.note;
    let params = fresh.params;
    if (input.params !== undefined) {
      const ev = evaluateFont({ ...fresh.params, ...(input.params as Record<string, unknown>) });
      if (!ev.ok) throw new ValidationError(fontErrors(ev.fieldErrors, ev.formErrors));
      params = ev.params as unknown as Record<string, unknown>;
    }
    const changed = Object.keys(params).filter((k) => JSON.stringify(params[k]) !== JSON.stringify(fresh.params[k]));
    if (!changed.length && note === fresh.note) return { changed: [] as string[] };
    await tx.update(revisions).set({ params, note, updatedAt: new Date() }).where(eq(revisions.id, revision.id));
    await draftChanged(tx, { commissionId, actorId: viewer.id, actorRole: locked.actingRole, revisionId: revision.id, number });
    return { changed };
  });
}

/**
 * Circulates a draft: freezes parameters, figures, note and attachments under a content hash, supersedes
 * the previously circulated revision (withdrawing its open ballot) and mails the committee through the
 * outbox — all in one transaction.
 */
export async function circulate(viewer: Viewer, commissionId: number, number: number): Promise<{ contentHash: string }> {
  const db = getDb();
  const { access, revision } = await loadRevision(db, viewer, commissionId, number);
  if (!can(access.actor, "revision.circulate")) throw new ForbiddenError(STUDIO_CIRCULATES);
  return db.transaction(async (tx) => {
    const locked = await lockedFor(tx, viewer, commissionId, { action: "revision.circulate", refusal: STUDIO_CIRCULATES });
    const [fresh] = await tx.select().from(revisions).where(eq(revisions.id, revision.id));
    const refusal = editRefusal(fresh.state, fresh.number);
    if (refusal) throw new ConflictError(refusal);
    const ev = evaluateFont(fresh.params);
    if (!ev.ok) throw new ValidationError(fontErrors(ev.fieldErrors, ev.formErrors), "Fix the model's parameters before circulating.");
    if (!fresh.note.trim()) throw new ValidationError({ note: "Say what changed and why before circulating." });
    const files = await tx.select().from(attachments).where(eq(attachments.revisionId, fresh.id));
    const figures = JSON.parse(JSON.stringify(ev.figures)) as Record<string, unknown>;
    const content = revisionContent({
      commissionId, number, kind: "font", params: fresh.params, figures, note: fresh.note,
      attachments: files.map((f) => ({ name: f.name, caption: f.caption, kind: f.kind, sha256: f.sha256, position: f.position })),
    });
    const contentHash = revisionContentHash(content);
    const now = new Date();
    await supersedePrevious(tx, viewer, locked.actingRole, commissionId, number, now);
    await tx.update(revisions).set({ state: "circulated", figures, contentHash, circulatedBy: viewer.id, circulatedAt: now, updatedAt: now }).where(eq(revisions.id, fresh.id));
    // What the draft held enters the trail now, when the committee may see it: the hash and the files.
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: locked.actingRole, action: "revision circulated",
      subjectType: "revision", subjectId: fresh.id,
      payload: { number, contentHash, attachments: files.length, files: files.map((f) => ({ name: f.name, kind: f.kind, sha256: f.sha256 })) },
    });
    await mailCommittee(tx, commissionId, fresh.id, number, fresh.note);
    return { contentHash };
  });
}

async function supersedePrevious(tx: Tx, viewer: Viewer, role: string, commissionId: number, number: number, now: Date) {
  const older = await tx.select().from(revisions).where(and(eq(revisions.commissionId, commissionId), eq(revisions.state, "circulated")));
  for (const o of older) {
    const open = await tx.select().from(ballots).where(and(eq(ballots.revisionId, o.id), eq(ballots.status, "open")));
    for (const b of open) {
      if (b.closesAt && b.closesAt <= now) {
        // Its time had come before this circulation: it closes with its result, it is not withdrawn.
        await closeBallotTx(tx, b, o.number, { id: null, role: "system" }, "closing time");
        continue;
      }
      await tx.update(ballots).set({ status: "withdrawn", closedAt: now }).where(eq(ballots.id, b.id));
      await appendTrail(tx, {
        commissionId, actorId: viewer.id, actorRole: role, action: "ballot withdrawn", subjectType: "ballot", subjectId: b.id,
        payload: { number: o.number, reason: `Revision ${number} was circulated` },
      });
    }
    await tx.update(revisions).set({ state: "superseded", supersededAt: now, updatedAt: now }).where(eq(revisions.id, o.id));
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: role, action: "revision superseded", subjectType: "revision", subjectId: o.id,
      payload: { number: o.number, by: number },
    });
  }
}

async function mailCommittee(tx: Tx, commissionId: number, revisionId: number, number: number, note: string) {
  const [c] = await tx.select({ title: commissions.title }).from(commissions).where(eq(commissions.id, commissionId));
  const people = await tx.select({ id: users.id, email: users.email, name: users.name }).from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId))
    .where(and(eq(commissionMembers.commissionId, commissionId), inArray(commissionMembers.role, ["chair", "member", "adviser"])));
  const link = `${env.appUrl}/commissions/${commissionId}/revisions/${number}`;
  await enqueueMail(tx, people.map((p) => ({
    dedupeKey: `circulated:${revisionId}:${p.id}`,
    to: p.email,
    subject: `Revision ${number} of "${c.title}" is ready for you`,
    text: `Dear ${p.name ?? p.email},\n\nRevision ${number} of "${c.title}" has been circulated to the committee.\n\nWhat changed and why:\n${note}\n\nRead it, see the drawings and the model, and comment here:\n${link}\n`,
  })));
}
