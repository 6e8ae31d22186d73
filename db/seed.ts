import { eq } from "drizzle-orm";
import { getDb } from "./client";
import { outbox, studioMembers, studios, users } from "./schema";
import { DEMO_COMMISSION, DEMO_COMMITTEE, DEMO_RULES, DEMO_STAFF, DEMO_STUDIO, OTHER_COMMISSION, OTHER_COMMITTEE } from "./demo";
import { demoStudioSettings } from "@/models/font";
import { loadViewer } from "@/lib/dal/viewer";
import { createCommission, updateRules } from "@/lib/dal/commissions";
import { invitePerson } from "@/lib/dal/people";
import { changeStage } from "@/lib/dal/stage";

/**
 * Loads the demo into an empty, migrated database, through the data-access layer so the trail is real.
 * Returns the ids the tests and the start script print.
 */
export async function seedDemo() {
  const db = getDb();
  const [s] = await db.insert(studios).values({ ...DEMO_STUDIO, settings: demoStudioSettings }).$returningId();
  for (const p of DEMO_STAFF) {
    const id = crypto.randomUUID();
    await db.insert(users).values({ id, email: p.email, name: p.name });
    await db.insert(studioMembers).values({ studioId: s.id, userId: id, role: p.role });
  }
  const [designerRow] = await db.select().from(users).where(eq(users.email, DEMO_STAFF[1].email));
  const designer = (await loadViewer(designerRow.id))!;

  const main = await createCommission(designer, DEMO_COMMISSION);
  for (const p of DEMO_COMMITTEE) await invitePerson(designer, main.id, p);
  await updateRules(designer, main.id, DEMO_RULES);
  await changeStage(designer, main.id, "concept", "Brief agreed at the committee's meeting");
  await changeStage(designer, main.id, "design-development", "Concept sketches accepted");

  const other = await createCommission(designer, OTHER_COMMISSION);
  for (const p of OTHER_COMMITTEE) await invitePerson(designer, other.id, p);

  // The demo's invitation mails are history, not news: mark them sent so the inbox starts empty.
  await db.update(outbox).set({ status: "sent", sentAt: new Date() });
  return { studioId: s.id, commissionId: main.id, otherCommissionId: other.id };
}
