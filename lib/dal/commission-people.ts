import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { commissionMembers, studioMembers, users } from "@/db/schema";
import { ROLE_LABELS } from "@/models/permissions/policy";
import type { Tx } from "../trail";

export interface CommissionPerson {
  id: string;
  name: string;
  email: string;
  notices: "immediate" | "digest";
  /** Their committee role, else their studio role. */
  role: keyof typeof ROLE_LABELS;
  roleLabel: string;
}

/** Everyone on a commission: its committee and the staff of the studio that owns it. */
export async function peopleOnCommission(db: Db | Tx, commission: { id: number; studioId: number }): Promise<CommissionPerson[]> {
  const cols = { id: users.id, name: users.name, email: users.email, notices: users.notices };
  const committee = await db.select({ ...cols, role: commissionMembers.role }).from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId)).where(eq(commissionMembers.commissionId, commission.id));
  const staff = await db.select({ ...cols, role: studioMembers.role }).from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId)).where(eq(studioMembers.studioId, commission.studioId));
  const byId = new Map<string, CommissionPerson>();
  for (const p of [...committee, ...staff]) {
    if (byId.has(p.id)) continue; // the committee role comes first, as it does for the trail
    byId.set(p.id, { id: p.id, name: p.name ?? p.email, email: p.email, notices: p.notices, role: p.role, roleLabel: ROLE_LABELS[p.role] });
  }
  return [...byId.values()];
}
