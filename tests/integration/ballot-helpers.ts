import { eq, sql } from "drizzle-orm";
import { ballots, decisions, sessions, trailEvents, users, votes } from "@/db/schema";
import { createDraft, updateDraft, circulate } from "@/lib/dal/revisions-write";
import { getDb, testSessionId, viewer } from "./db";

export const PEOPLE = {
  owner: "tamsin@hollowmere.test",
  designer: "elias@hollowmere.test",
  chair: "margaret@stwenna.test",
  member: "david@stwenna.test",
  adviser: "priya@stwenna.test",
  outsider: "owen@thrennick.test",
} as const;
export type Who = keyof typeof PEOPLE;
export const ROLES = Object.keys(PEOPLE) as Who[];

/** Drafts, notes and circulates the next revision of a commission as the designer; returns its id and number. */
export async function circulateNext(commissionId: number, note = "Engravings spaced evenly; foot widened for the stone floor.") {
  const designer = await viewer(PEOPLE.designer);
  const { id, number } = await createDraft(designer, commissionId);
  await updateDraft(designer, commissionId, number, { note });
  await circulate(designer, commissionId, number);
  return { id, number };
}

/** Rows that any refused call must leave untouched. */
export async function snapshot(commissionId: number) {
  const db = getDb();
  const one = async (q: Promise<{ n: number }[]>) => Number((await q)[0].n);
  return {
    ballots: await one(db.select({ n: sql<number>`count(*)` }).from(ballots).where(eq(ballots.commissionId, commissionId))),
    votes: await one(db.select({ n: sql<number>`count(*)` }).from(votes)),
    decisions: await one(db.select({ n: sql<number>`count(*)` }).from(decisions).where(eq(decisions.commissionId, commissionId))),
    trail: await one(db.select({ n: sql<number>`count(*)` }).from(trailEvents).where(eq(trailEvents.commissionId, commissionId))),
    openBallots: JSON.stringify(await db.select({ id: ballots.id, status: ballots.status }).from(ballots).where(eq(ballots.commissionId, commissionId))),
  };
}

export async function events(commissionId: number, action: string) {
  const rows = await getDb().select().from(trailEvents).where(eq(trailEvents.commissionId, commissionId));
  return rows.filter((r) => r.action === action);
}

/** A session that began `minutesAgo` minutes ago, as a sign-in by e-mail link would leave it. */
export async function signedIn(email: string, minutesAgo: number) {
  const [u] = await getDb().select().from(users).where(eq(users.email, email));
  await getDb().delete(sessions).where(eq(sessions.userId, u.id));
  await getDb().insert(sessions).values({
    sessionToken: testSessionId(u.id), userId: u.id, expires: new Date(Date.now() + 24 * 3600_000),
    createdAt: new Date(Date.now() - minutesAgo * 60_000),
  });
}

export const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();

/** Where a meeting's minutes are, as the chair would give it. */
export const MINUTES = "Minute book 3, page 41";
