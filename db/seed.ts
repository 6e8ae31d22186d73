import { eq } from "drizzle-orm";
import { getDb } from "./client";
import { outbox, studioMembers, studios, users } from "./schema";
import { DEMO_COMMISSION, DEMO_COMMITTEE, DEMO_RULES, DEMO_STAFF, DEMO_STUDIO, OTHER_COMMISSION, OTHER_COMMITTEE } from "./demo";
import { demoStudioSettings } from "@/models/font";
import { loadViewer } from "@/lib/dal/viewer";
import { createCommission } from "@/lib/dal/commissions";
import { confirmRules } from "@/lib/dal/rules";
import { invitePerson } from "@/lib/dal/people";
import { changeStage } from "@/lib/dal/stage";
import { circulate, createDraft, updateDraft } from "@/lib/dal/revisions-write";
import { addAttachment } from "@/lib/dal/attachments";
import { postComment, replyToComment } from "@/lib/dal/comments";
import { defaultFontParameters, type FontParameters } from "@/models/font";
import { demoImages } from "./demo-images";
import type { Viewer } from "@/lib/dal/viewer";

/**
 * Loads the demo into an empty, migrated database, through the data-access layer so the trail is real.
 * Returns the ids the tests and the start script print.
 */
export async function seedDemo(opts: { revisions?: boolean } = {}) {
  const db = getDb();
  const [s] = await db.insert(studios).values({ ...DEMO_STUDIO, settings: demoStudioSettings }).$returningId();
  for (const p of DEMO_STAFF) {
    const id = crypto.randomUUID();
    await db.insert(users).values({ id, email: p.email, name: p.name });
    await db.insert(studioMembers).values({ studioId: s.id, userId: id, role: p.role });
  }
  const designer = (await viewerByEmail(DEMO_STAFF[1].email))!;

  // The studio proposes the committee's rules with the commission; each chair confirms them.
  const main = await createCommission(designer, DEMO_COMMISSION, DEMO_RULES);
  for (const p of DEMO_COMMITTEE) await invitePerson(designer, main.id, p);
  await confirmRules((await viewerByEmail(DEMO_COMMITTEE[0].email))!, main.id);
  await changeStage(designer, main.id, "concept", "Brief agreed at the committee's meeting");
  await changeStage(designer, main.id, "design-development", "Concept sketches accepted");

  if (opts.revisions !== false) await seedRevisions(designer, main.id);

  const other = await createCommission(designer, OTHER_COMMISSION);
  for (const p of OTHER_COMMITTEE) await invitePerson(designer, other.id, p);
  await confirmRules((await viewerByEmail(OTHER_COMMITTEE[0].email))!, other.id);

  // The demo's invitation mails are history, not news: mark them sent so the inbox starts empty.
  await db.update(outbox).set({ status: "sent", sentAt: new Date() });
  return { studioId: s.id, commissionId: main.id, otherCommissionId: other.id };
}

async function viewerByEmail(email: string) {
  const [row] = await getDb().select().from(users).where(eq(users.email, email));
  return row ? loadViewer(row.id) : null;
}

/** Revision 1 (a shallower bowl, two engravings) superseded by Revision 2 (deeper, three engravings). */
export const DEMO_REVISION_1: FontParameters = { ...defaultFontParameters, depth: 130, wallThickness: 26, engravingCount: 2, engravingStartAngle: 0, pedestalHeight: 520 };
export const DEMO_REVISION_2: FontParameters = { ...defaultFontParameters };

async function seedRevisions(designer: Viewer, commissionId: number) {
  const steps = [
    { params: DEMO_REVISION_1, note: "First design after the site visit: a shallow bowl on a low foot, with two engravings facing the door and the altar." },
    {
      params: DEMO_REVISION_2,
      note: "As the committee asked at its meeting: a deeper bowl (150 mm, about 20 litres to the brim), three engravings spaced evenly, one for each of the three villages the parish serves, and the pedestal raised by 30 mm so the rim sits at a comfortable height for the priest.",
    },
  ];
  for (const step of steps) {
    const draft = await createDraft(designer, commissionId, { note: step.note });
    await updateDraft(designer, commissionId, draft.number, { params: step.params });
    for (const img of await demoImages(step.params)) {
      await addAttachment(designer, draft.id, { name: img.name, bytes: img.bytes, caption: img.caption });
    }
    await circulate(designer, commissionId, draft.number);
    if (draft.number === 2) await seedComments(draft.id);
  }
}

async function seedComments(revisionId: number) {
  const ruth = (await viewerByEmail("ruth@stwenna.test"))!;
  const priya = (await viewerByEmail("priya@stwenna.test"))!;
  const elias = (await viewerByEmail(DEMO_STAFF[1].email))!;
  const first = await postComment(ruth, revisionId, { body: "Could the rim be a little lower for children being brought up to the font?", target: { kind: "model", part: "bowl", point: [0, -281.5, 916] } });
  await replyToComment(elias, first.id, { body: "We can take 30 mm off the pedestal; I will show it in the next revision." });
  await postComment(priya, revisionId, { body: "The diocesan adviser will want the fixing of the foot to the pedestal shown on the drawing.", target: { kind: "revision" } });
}
