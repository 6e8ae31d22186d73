import "server-only";
import { and, asc, desc, eq, gt, inArray, or } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { ballots, commissionMembers, commissions, revisions, studioMembers, studios, users } from "@/db/schema";
import { can, ACTIONS, invitableRoles, type Action, type CommitteeRole } from "@/models/permissions/policy";
import { commissionSchema, fieldErrors } from "@/models/schemas/people";
import { ballotRulesSchema, type BallotRules } from "@/models/ballot";
import { appendTrail } from "../trail";
import { ValidationError } from "../errors";
import { loadAccess } from "./access";
import { requireStudio, type Viewer } from "./viewer";
import { STAGE_LABELS } from "@/models/stages";

export interface CommissionSummary {
  id: number;
  title: string;
  clientBody: string;
  site: string;
  stage: string;
  stageLabel: string;
  studioName: string;
  yourRole: string;
}

export interface PersonDto {
  userId: string;
  name: string;
  email: string;
  role: CommitteeRole | "owner" | "designer";
  side: "studio" | "committee";
  treasurer: boolean;
}

export interface CommissionDto extends CommissionSummary {
  studioId: number;
  rules: BallotRules;
  /** The chair may change the rules now (no ballot is open). */
  rulesEditable: boolean;
  /** The chair has confirmed the rules (the studio only proposes them); no ballot before that. */
  rulesConfirmed: boolean;
  /** The ballot open now on any revision: while it is, who may vote cannot change. */
  openBallot: { number: number; closesAt: string | null } | null;
  people: PersonDto[];
  you: { studioRole: string | null; committeeRole: string | null; treasurer: boolean; can: Partial<Record<Action, boolean>>; invitable: CommitteeRole[] };
  createdAt: string;
}

export function rulesOf(c: typeof commissions.$inferSelect): BallotRules {
  return {
    quorum: c.quorum === "majority" ? "majority" : Number(c.quorum),
    threshold: c.threshold,
    chairVotes: c.chairVotes,
    electronicAuthority: c.electronicAuthority ?? null,
  };
}

/** Commissions the viewer may see: their studio's, and those whose committee they sit on. */
export async function listCommissions(viewer: Viewer): Promise<CommissionSummary[]> {
  const db = getDb();
  const studioIds = viewer.studios.map((s) => s.studioId);
  const memberRows = await db
    .select({ commissionId: commissionMembers.commissionId, role: commissionMembers.role })
    .from(commissionMembers)
    .where(eq(commissionMembers.userId, viewer.id));
  const memberIds = memberRows.map((r) => r.commissionId);
  if (!studioIds.length && !memberIds.length) return [];
  const conds = [];
  if (studioIds.length) conds.push(inArray(commissions.studioId, studioIds));
  if (memberIds.length) conds.push(inArray(commissions.id, memberIds));
  const rows = await db
    .select({ c: commissions, studioName: studios.name })
    .from(commissions)
    .innerJoin(studios, eq(studios.id, commissions.studioId))
    .where(or(...conds))
    .orderBy(desc(commissions.updatedAt));
  return rows.map(({ c, studioName }) => {
    const committee = memberRows.find((r) => r.commissionId === c.id)?.role;
    const studio = viewer.studios.find((s) => s.studioId === c.studioId)?.role;
    return {
      id: c.id, title: c.title, clientBody: c.clientBody, site: c.site, stage: c.stage,
      stageLabel: STAGE_LABELS[c.stage], studioName, yourRole: committee ?? studio ?? "",
    };
  });
}

export async function getCommission(viewer: Viewer, commissionId: number): Promise<CommissionDto> {
  const db = getDb();
  const { commission: c, actor } = await loadAccess(db, viewer, commissionId);
  const [studio] = await db.select().from(studios).where(eq(studios.id, c.studioId));
  const people = await listPeopleRows(commissionId, c.studioId);
  const open = await openBallotNow(db, commissionId);
  const canMap: Partial<Record<Action, boolean>> = {};
  for (const a of ACTIONS) canMap[a] = can(actor, a);
  return {
    id: c.id, title: c.title, clientBody: c.clientBody, site: c.site, stage: c.stage,
    stageLabel: STAGE_LABELS[c.stage], studioName: studio.name, studioId: c.studioId,
    yourRole: actor.committeeRole ?? actor.studioRole ?? "",
    rules: rulesOf(c),
    rulesEditable: can(actor, "rules.edit") && !open,
    rulesConfirmed: c.rulesConfirmedAt !== null,
    openBallot: open ? { number: open.number, closesAt: open.closesAt?.toISOString() ?? null } : null,
    people,
    you: { studioRole: actor.studioRole, committeeRole: actor.committeeRole, treasurer: actor.treasurer, can: canMap, invitable: invitableRoles(actor) },
    createdAt: c.createdAt.toISOString(),
  };
}

/** The ballot open on the commission now, if any (one past its closing time does not count). */
async function openBallotNow(db: Db, commissionId: number) {
  const [b] = await db.select({ number: revisions.number, closesAt: ballots.closesAt }).from(ballots)
    .innerJoin(revisions, eq(revisions.id, ballots.revisionId))
    .where(and(eq(ballots.commissionId, commissionId), eq(ballots.status, "open"), gt(ballots.closesAt, new Date()))).limit(1);
  return b ?? null;
}

async function listPeopleRows(commissionId: number, studioId: number): Promise<PersonDto[]> {
  const db = getDb();
  const committee = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: commissionMembers.role, treasurer: commissionMembers.treasurer })
    .from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId))
    .where(eq(commissionMembers.commissionId, commissionId))
    .orderBy(asc(commissionMembers.id));
  const staff = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: studioMembers.role })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId))
    .orderBy(asc(studioMembers.id));
  const order = { chair: 0, member: 1, adviser: 2 } as const;
  return [
    ...staff.map((s) => ({ ...s, name: s.name ?? s.email, side: "studio" as const, treasurer: false })),
    ...committee
      .sort((a, b) => order[a.role] - order[b.role])
      .map((m) => ({ ...m, name: m.name ?? m.email, side: "committee" as const })),
  ];
}

/**
 * The studio creates a commission and may propose the committee's rules with it; they stand as proposed
 * until the chair confirms or changes them (lib/dal/rules.ts), and no ballot is held before that.
 */
export async function createCommission(viewer: Viewer, input: unknown, rulesInput?: unknown): Promise<{ id: number }> {
  const studio = requireStudio(viewer);
  const parsed = commissionSchema.safeParse(input);
  if (!parsed.success) throw new ValidationError(fieldErrors(parsed.error));
  const rules = ballotRulesSchema.safeParse(rulesInput ?? {});
  if (!rules.success) throw new ValidationError(fieldErrors(rules.error));
  const r = rules.data;
  const db = getDb();
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(commissions).values({
      studioId: studio.studioId, ...parsed.data, stage: "brief",
      quorum: String(r.quorum), threshold: r.threshold, chairVotes: r.chairVotes, electronicAuthority: r.electronicAuthority || null,
    }).$returningId();
    await appendTrail(tx, {
      commissionId: res.id, actorId: viewer.id, actorRole: studio.role, action: "commission created",
      subjectType: "commission", subjectId: res.id, payload: { ...parsed.data, rules: r, rulesStatus: "proposed by the studio" },
    });
    return { id: res.id };
  });
}
