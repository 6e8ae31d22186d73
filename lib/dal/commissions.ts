import "server-only";
import { and, asc, desc, eq, inArray, or } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { commissionMembers, commissions, studioMembers, studios, trailEvents, users } from "@/db/schema";
import { can, ACTIONS, invitableRoles, type Action, type CommitteeRole } from "@/models/permissions/policy";
import { commissionSchema, fieldErrors } from "@/models/schemas/people";
import { ballotRulesSchema, type BallotRules } from "@/models/ballot";
import { appendTrail, lockCommission, type Tx } from "../trail";
import { ConflictError, ValidationError } from "../errors";
import { authorize, loadAccess } from "./access";
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
  rulesEditable: boolean;
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
  const canMap: Partial<Record<Action, boolean>> = {};
  for (const a of ACTIONS) canMap[a] = can(actor, a);
  return {
    id: c.id, title: c.title, clientBody: c.clientBody, site: c.site, stage: c.stage,
    stageLabel: STAGE_LABELS[c.stage], studioName: studio.name, studioId: c.studioId,
    yourRole: actor.committeeRole ?? actor.studioRole ?? "",
    rules: rulesOf(c),
    rulesEditable: can(actor, "rules.edit") && !(await rulesLocked(commissionId)),
    people,
    you: { studioRole: actor.studioRole, committeeRole: actor.committeeRole, treasurer: actor.treasurer, can: canMap, invitable: invitableRoles(actor) },
    createdAt: c.createdAt.toISOString(),
  };
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

/** Rules are fixed once the first ballot (electronic or at a meeting) has been opened or recorded. */
export async function rulesLocked(commissionId: number, db: Db | Tx = getDb()): Promise<boolean> {
  const rows = await db
    .select({ id: trailEvents.id })
    .from(trailEvents)
    .where(and(eq(trailEvents.commissionId, commissionId), inArray(trailEvents.action, ["ballot opened", "meeting vote recorded"])))
    .limit(1);
  return rows.length > 0;
}

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
      subjectType: "commission", subjectId: res.id, payload: { ...parsed.data, rules: r },
    });
    return { id: res.id };
  });
}

export async function updateRules(viewer: Viewer, commissionId: number, input: unknown): Promise<BallotRules> {
  const db = getDb();
  const access = await authorize(db, viewer, commissionId, "rules.edit");
  const parsed = ballotRulesSchema.safeParse(input);
  if (!parsed.success) throw new ValidationError(fieldErrors(parsed.error));
  const next = { ...parsed.data, electronicAuthority: parsed.data.electronicAuthority?.trim() || null };
  if (typeof next.quorum === "number") {
    const voters = await db.select({ id: commissionMembers.id }).from(commissionMembers)
      .where(and(eq(commissionMembers.commissionId, commissionId), inArray(commissionMembers.role, next.chairVotes ? ["member", "chair"] : ["member"])));
    if (next.quorum > voters.length) throw new ValidationError({ quorum: `The quorum cannot be more than the ${voters.length} voting members.` });
  }
  return updateRulesTx(viewer, access, next);
}

async function updateRulesTx(viewer: Viewer, access: Awaited<ReturnType<typeof authorize>>, next: BallotRules) {
  const db = getDb();
  const commissionId = access.commission.id;
  return db.transaction(async (tx) => {
    await lockCommission(tx, commissionId);
    if (await rulesLocked(commissionId, tx)) throw new ConflictError("The ballot rules are fixed once a ballot has been opened.");
    const [fresh] = await tx.select().from(commissions).where(eq(commissions.id, commissionId));
    const before = rulesOf(fresh);
    await tx.update(commissions).set({
      quorum: String(next.quorum), threshold: next.threshold, chairVotes: next.chairVotes,
      electronicAuthority: next.electronicAuthority, updatedAt: new Date(),
    }).where(eq(commissions.id, commissionId));
    await appendTrail(tx, {
      commissionId, actorId: viewer.id, actorRole: access.actingRole, action: "ballot rules changed",
      subjectType: "commission", subjectId: commissionId, payload: { before, after: next },
    });
    return next;
  });
}
