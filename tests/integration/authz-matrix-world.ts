/**
 * The objects the matrix tries: the demo's commission ("own": the one the seven signed-in roles stand on)
 * and a commission of a second studio ("foreign": nobody in the matrix stands on it). Each object kind has
 * a factory; mutating rows ask for a fresh object per attempt, so an allowed attempt never spoils the next.
 * Fixtures are made through the data-access layer as the people entitled to make them, so the trail is real.
 */
import sharp from "sharp";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { attachments, ballots, comments, revisions, studioMembers, studios, users } from "@/db/schema";
import { DEMO_RULES } from "@/db/demo";
import { demoStudioSettings } from "@/models/font";
import { addAttachment } from "@/lib/dal/attachments";
import { openBallot } from "@/lib/dal/ballots";
import { createCommission } from "@/lib/dal/commissions";
import { updateRules } from "@/lib/dal/rules";
import { setPermissionsNeeded } from "@/lib/dal/permissions";
import { postComment, resolveThread } from "@/lib/dal/comments";
import { invitePerson } from "@/lib/dal/people";
import { circulate, createDraft, updateDraft } from "@/lib/dal/revisions-write";
import type { Viewer } from "@/lib/dal/viewer";
import { freshDemo, getDb, viewer } from "./db";

/** The eight people the matrix signs in as (null: nobody signed in). Roles are on the demo's commission. */
export const ROLES = {
  anonymous: null,
  outsider: "owen@thrennick.test", // chair of the demo's other commission, nothing on this one
  adviser: "priya@stwenna.test",
  member: "david@stwenna.test",
  treasurer: "colin@stwenna.test",
  chair: "margaret@stwenna.test",
  designer: "elias@hollowmere.test",
  owner: "tamsin@hollowmere.test",
} as const;
export type Role = keyof typeof ROLES;
export const ROLE_NAMES = Object.keys(ROLES) as Role[];

/** An invented second studio with a commission and committee of its own. */
const FOREIGN_STAFF = [
  { email: "wren@fernbrook.test", name: "Wren Alcott", role: "owner" as const },
  { email: "joss@fernbrook.test", name: "Joss Kemble", role: "designer" as const },
];
const FOREIGN_COMMITTEE = [
  { email: "isla@quarrylane.test", name: "Isla Trevithick", role: "chair" as const, treasurer: false },
  { email: "ben@quarrylane.test", name: "Ben Carrow", role: "member" as const, treasurer: true },
  { email: "maud@quarrylane.test", name: "Maud Penrose", role: "member" as const, treasurer: false },
];

interface Side {
  commissionId: number;
  designer: Viewer;
  chair: Viewer;
  member: Viewer;
  committee: { email: string; name: string; role: "chair" | "member" | "adviser"; treasurer: boolean }[];
  /** A circulated revision with a file and a comment thread, for reading (superseded later; still readable). */
  readable: { revisionId: number; attachmentId: number; commentId: number };
  /** A picture on the other side's commission, to name in a body where this side's id belongs. */
  elsewhereAttachmentId: number;
}
export type Sides = { own: Side; foreign: Side };
export type SideName = keyof Sides;

let pngCount = 0;
async function png(): Promise<Buffer> {
  pngCount += 1; // each a little different, so no two uploads share a hash
  return sharp({ create: { width: 320, height: 240, channels: 3, background: { r: 200, g: 220, b: (pngCount * 7) % 255 } } }).png().toBuffer();
}

export async function buildWorld(): Promise<Sides> {
  const demo = await freshDemo({ revisions: true });
  const db = getDb();
  const [rev2] = await db.select().from(revisions).where(and(eq(revisions.commissionId, demo.commissionId), eq(revisions.state, "circulated")));
  const [att] = await db.select().from(attachments).where(eq(attachments.revisionId, rev2.id)).orderBy(asc(attachments.id)).limit(1);
  const [com] = await db.select().from(comments).where(and(eq(comments.revisionId, rev2.id), isNull(comments.parentId))).limit(1);
  const own: Side = {
    commissionId: demo.commissionId, designer: await viewer(ROLES.designer), chair: await viewer(ROLES.chair), member: await viewer(ROLES.member),
    committee: [
      { email: ROLES.chair, name: "Margaret Ellery", role: "chair", treasurer: false },
      { email: ROLES.member, name: "David Osei", role: "member", treasurer: false },
      { email: ROLES.treasurer, name: "Colin Marsh", role: "member", treasurer: true },
      { email: ROLES.adviser, name: "Dr Priya Nandakumar", role: "adviser", treasurer: false },
    ],
    readable: { revisionId: rev2.id, attachmentId: att.id, commentId: com.id }, elsewhereAttachmentId: 0,
  };
  const foreign = await buildForeign();
  own.elsewhereAttachmentId = foreign.readable.attachmentId;
  foreign.elsewhereAttachmentId = own.readable.attachmentId;
  return { own, foreign };
}

async function buildForeign(): Promise<Side> {
  const db = getDb();
  const [s] = await db.insert(studios).values({ name: "Fernbrook Glassworks", town: "Millbrook Cross", settings: demoStudioSettings }).$returningId();
  for (const p of FOREIGN_STAFF) {
    const id = crypto.randomUUID();
    await db.insert(users).values({ id, email: p.email, name: p.name });
    await db.insert(studioMembers).values({ studioId: s.id, userId: id, role: p.role });
  }
  const designer = await viewer(FOREIGN_STAFF[1].email);
  const { id: commissionId } = await createCommission(designer, { title: "Font for the meeting house", clientBody: "Quarry Lane Meeting House — Elders", site: "Quarry Lane, Millbrook Cross" });
  for (const p of FOREIGN_COMMITTEE) await invitePerson(designer, commissionId, p);
  await updateRules(await viewer(FOREIGN_COMMITTEE[0].email), commissionId, DEMO_RULES);
  const side: Side = {
    commissionId, designer, chair: await viewer(FOREIGN_COMMITTEE[0].email), member: await viewer(FOREIGN_COMMITTEE[1].email),
    committee: FOREIGN_COMMITTEE, readable: { revisionId: 0, attachmentId: 0, commentId: 0 }, elsewhereAttachmentId: 0,
  };
  const revisionId = await draftId(side);
  const attachmentId = (await addAttachment(designer, revisionId, { name: "elevation.png", bytes: await png(), caption: "Elevation" })).id;
  await circulateDraft(side);
  const commentId = (await postComment(side.member, revisionId, { body: "Could the bowl be a little wider?" })).id;
  side.readable = { revisionId, attachmentId, commentId };
  return side;
}

async function latestRevision(side: Side) {
  const [r] = await getDb().select().from(revisions).where(eq(revisions.commissionId, side.commissionId)).orderBy(desc(revisions.number)).limit(1);
  return r;
}

/** The current draft (started if there is none). */
async function draftId(side: Side): Promise<number> {
  const r = await latestRevision(side);
  if (r?.state === "draft") return r.id;
  const d = await createDraft(side.designer, side.commissionId);
  await updateDraft(side.designer, side.commissionId, d.number, { note: "Foot widened for the stone floor." });
  return d.id;
}

async function circulateDraft(side: Side): Promise<number> {
  const id = await draftId(side);
  const [r] = await getDb().select().from(revisions).where(eq(revisions.id, id));
  await circulate(side.designer, side.commissionId, r.number);
  return id;
}

/** The current circulated revision, undecided (a new one is circulated when the latest is not). */
async function currentId(side: Side): Promise<number> {
  const r = await latestRevision(side);
  return r?.state === "circulated" ? r.id : circulateDraft(side);
}

async function openBallotOn(side: Side, revisionId: number): Promise<number> {
  const [open] = await getDb().select().from(ballots).where(and(eq(ballots.revisionId, revisionId), eq(ballots.status, "open"))).limit(1);
  if (open) return open.id;
  return (await openBallot(side.chair, revisionId, { closesAt: new Date(Date.now() + 48 * 3600_000).toISOString() })).id;
}

/** What a factory hands a row: the ids its URL or arguments need. */
export interface Obj { commissionId: number; revisionId: number; number: number; attachmentId: number; commentId: number; ballotId: number; elsewhereAttachmentId: number; permissionId: number }

async function numberOf(revisionId: number) {
  const [r] = await getDb().select({ number: revisions.number }).from(revisions).where(eq(revisions.id, revisionId));
  return r.number;
}
const obj = async (side: Side, o: Partial<Obj>): Promise<Obj> => ({
  commissionId: side.commissionId, revisionId: 0, attachmentId: 0, commentId: 0, ballotId: 0, permissionId: 0, elsewhereAttachmentId: side.elsewhereAttachmentId, ...o,
  number: o.revisionId ? await numberOf(o.revisionId) : 0,
});

export const FACTORIES = {
  /** Nothing: the row needs no object (a list, one's own settings, sign-in). */
  none: async (side: Side) => obj(side, {}),
  commission: async (side: Side) => obj(side, {}),
  /** A commission made just now, with the side's committee on it and no ballot yet (rules still open). */
  freshCommission: async (side: Side) => {
    const { id } = await createCommission(side.designer, { title: "Cover for the font", clientBody: "The same committee", site: "The west end" });
    for (const p of side.committee) await invitePerson(side.designer, id, p);
    return obj({ ...side, commissionId: id }, {});
  },
  readable: async (side: Side) => obj(side, side.readable),
  draft: async (side: Side) => obj(side, { revisionId: await draftId(side) }),
  /** No draft open (one is circulated if there is), so a new draft may start. */
  noDraft: async (side: Side) => { await currentId(side); return obj(side, {}); },
  draftAttachment: async (side: Side) => {
    const revisionId = await draftId(side);
    const a = await addAttachment(side.designer, revisionId, { name: "detail.png", bytes: await png(), caption: "Detail" });
    return obj(side, { revisionId, attachmentId: a.id });
  },
  current: async (side: Side) => obj(side, { revisionId: await currentId(side) }),
  freshCirculated: async (side: Side) => obj(side, { revisionId: await circulateDraft(side) }),
  comment: async (side: Side) => {
    const revisionId = await currentId(side);
    const c = await postComment(side.member, revisionId, { body: "The engraving depth looks right to me." });
    return obj(side, { revisionId, commentId: c.id });
  },
  resolvedComment: async (side: Side) => {
    const revisionId = await currentId(side);
    const c = await postComment(side.member, revisionId, { body: "Is the foot wide enough?" });
    await resolveThread(side.designer, c.id);
    return obj(side, { revisionId, commentId: c.id });
  },
  openBallot: async (side: Side) => {
    const revisionId = await currentId(side);
    return obj(side, { revisionId, ballotId: await openBallotOn(side, revisionId) });
  },
  /** A permission the chair has just put on the commission's list, not yet recorded. */
  permission: async (side: Side) => {
    const list = await setPermissionsNeeded(side.chair, side.commissionId, { name: `Faculty ${Date.now()}${Math.random()}`.slice(0, 60), authority: "The diocese" });
    return obj(side, { permissionId: list.permissions.at(-1)!.id });
  },
  freshOpenBallot: async (side: Side) => {
    const revisionId = await circulateDraft(side);
    return obj(side, { revisionId, ballotId: await openBallotOn(side, revisionId) });
  },
} satisfies Record<string, (side: Side) => Promise<Obj>>;
export type ObjectKind = keyof typeof FACTORIES;
