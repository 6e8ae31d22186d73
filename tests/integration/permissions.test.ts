import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, like, sql } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import { outbox, requiredPermissions, trailEvents } from "@/db/schema";
import { castVote, closeBallot, openBallot } from "@/lib/dal/ballots";
import { recordDecision } from "@/lib/dal/decisions";
import { answerCondition, getConditions } from "@/lib/dal/condition-answers";
import { dropPermission, getPermissions, setPermissionsNeeded } from "@/lib/dal/permissions";
import { readPermissionDocument, recordPermission } from "@/lib/dal/permission-record";
import { getReleaseStatus } from "@/lib/dal/release";
import { rowToEvent } from "@/lib/dal/trail";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { describeEvent } from "@/models/trail/plain";
import { closeDb, freshDemo, getDb, viewer } from "./db";
import { PEOPLE, circulateNext, inHours, signedIn, type Who } from "./ballot-helpers";

let ids: Awaited<ReturnType<typeof freshDemo>>;
const as = (who: Who | string) => viewer(who in PEOPLE ? PEOPLE[who as Who] : who);
const trailCount = async () => Number((await getDb().select({ n: sql<number>`count(*)` }).from(trailEvents))[0].n);
let pdf: Uint8Array;

beforeAll(async () => {
  ids = await freshDemo();
  await signedIn(PEOPLE.chair, 1);
  const doc = await PDFDocument.create();
  doc.addPage([595, 842]).drawText("Faculty granted — invented test document");
  pdf = await doc.save();
});
afterAll(async () => { await closeDb(); });

const record = (fields: Record<string, string>, bytes = pdf, name = "faculty.pdf") => ({ name, bytes, fields });
const good = { authority: "Diocese of Wrenfield, Consistory Court", reference: "WRE/2026/114", grantedOn: "2026-11-20", conditions: "Install before Easter." };

describe("the permissions a commission needs (kept by the chair)", () => {
  it("only the chair keeps the list; members and the studio are refused, outsiders told not found", async () => {
    for (const who of ["owner", "designer", "member", "adviser", "colin@stwenna.test"]) {
      await expect(setPermissionsNeeded(await as(who), ids.commissionId, { name: "Faculty" })).rejects.toBeInstanceOf(ForbiddenError);
    }
    await expect(setPermissionsNeeded(await as("outsider"), ids.commissionId, { name: "Faculty" })).rejects.toBeInstanceOf(NotFoundError);
    await expect(getPermissions(await as("outsider"), ids.commissionId)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("names the field for bad input (never a 500)", async () => {
    const chair = await as("chair");
    const cases: [unknown, string][] = [[{}, "name"], [{ name: " " }, "name"], [{ name: "x".repeat(201) }, "name"], [{ noneRequired: true }, "reason"], [{ noneRequired: true, reason: "  " }, "reason"], [null, "name"]];
    for (const [input, field] of cases) {
      const err = await setPermissionsNeeded(chair, ids.commissionId, input).catch((e) => e);
      expect(err).toBeInstanceOf(ValidationError);
      expect(Object.keys(err.fields)).toContain(field);
    }
  });

  it("the chair lists two permissions; unrecorded ones can be dropped; each step is in the trail", async () => {
    const chair = await as("chair");
    await setPermissionsNeeded(chair, ids.commissionId, { name: "Faculty", authority: "Diocese of Wrenfield" });
    const list = await setPermissionsNeeded(chair, ids.commissionId, { name: "Listed building consent" });
    expect(list.permissions.map((p) => p.name)).toEqual(["Faculty", "Listed building consent"]);
    expect(list.plan).toEqual({ noneRequired: false, reason: "" });
    const err = await setPermissionsNeeded(chair, ids.commissionId, { noneRequired: true, reason: "No faculty needed" }).catch((e) => e);
    expect(err.fields.reason).toMatch(/Take the permissions off the list first/);
    const after = await dropPermission(chair, list.permissions[1].id);
    expect(after.permissions.map((p) => p.name)).toEqual(["Faculty"]);
    const actions = (await getDb().select().from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId))).map((e) => e.action);
    expect(actions.filter((a) => a === "permission required")).toHaveLength(2);
    expect(actions.filter((a) => a === "permission dropped")).toHaveLength(1);
  });

  it("recording needs authority, reference, a real past date and a document the upload checks accept", async () => {
    const chair = await as("chair");
    const [faculty] = (await getPermissions(chair, ids.commissionId)).permissions;
    const before = await trailCount();
    const bad: [Record<string, string>, string][] = [
      [{ ...good, reference: "" }, "reference"], [{ ...good, authority: " " }, "authority"],
      [{ ...good, grantedOn: "2026-02-30" }, "grantedOn"], [{ ...good, grantedOn: "2999-01-01" }, "grantedOn"], [{ ...good, grantedOn: "20/11/2026" }, "grantedOn"],
    ];
    for (const [fields, field] of bad) {
      const err = await recordPermission(chair, faculty.id, record(fields)).catch((e) => e);
      expect(err).toBeInstanceOf(ValidationError);
      expect(Object.keys(err.fields)).toEqual([field]);
    }
    const html = await recordPermission(chair, faculty.id, record(good, new TextEncoder().encode("<html><script>1</script></html>"), "faculty.pdf")).catch((e) => e);
    expect(html).toBeInstanceOf(ValidationError);
    expect(html.fields.file).toMatch(/faculty\.pdf/);
    await expect(recordPermission(await as("member"), faculty.id, record(good))).rejects.toBeInstanceOf(ForbiddenError);
    await expect(recordPermission(await as("outsider"), faculty.id, record(good))).rejects.toBeInstanceOf(NotFoundError);
    expect(await trailCount()).toBe(before);
  });

  it("the chair records the faculty; everyone on the commission reads it and its document; mail goes out", async () => {
    const chair = await as("chair");
    const [faculty] = (await getPermissions(chair, ids.commissionId)).permissions;
    const res = await recordPermission(chair, faculty.id, record(good));
    expect(res.permissions[0]).toMatchObject({ name: "Faculty", reference: "WRE/2026/114", grantedOn: "2026-11-20", recorded: true, recordedByName: "Margaret Ellery" });
    const doc = await readPermissionDocument(await as("adviser"), faculty.id);
    expect(Buffer.from(doc.bytes).equals(Buffer.from(pdf))).toBe(true);
    expect(doc.mime).toBe("application/pdf");
    await expect(readPermissionDocument(await as("outsider"), faculty.id)).rejects.toBeInstanceOf(NotFoundError);
    const [ev] = (await getDb().select().from(trailEvents).where(eq(trailEvents.action, "permission recorded")));
    expect(describeEvent(rowToEvent(ev))).toBe("Recorded Faculty: granted by Diocese of Wrenfield, Consistory Court on 2026-11-20, reference WRE/2026/114.");
    expect((ev.payload as { document: { sha256: string } }).document.sha256).toBe(res.permissions[0].document!.sha256);
    expect(await getDb().select().from(outbox).where(like(outbox.dedupeKey, `permission:${faculty.id}:%`))).toHaveLength(7);
    await expect(dropPermission(chair, faculty.id)).rejects.toBeInstanceOf(ConflictError);
    const status = await getReleaseStatus(await as("member"), ids.commissionId);
    expect(status.missing).not.toContain("Every permission the commission needs, recorded by the chair");
    const [row] = await getDb().select().from(requiredPermissions).where(eq(requiredPermissions.id, faculty.id));
    expect(row.documentKey).toMatch(new RegExp(`^c${ids.commissionId}/permissions/`));
  });
});

describe("the studio's answers to the conditions of an approval as noted", () => {
  it("nothing to answer before such an approval", async () => {
    expect((await getConditions(await as("member"), ids.commissionId)).conditions).toEqual([]);
    await expect(answerCondition(await as("designer"), ids.commissionId, 1, { answer: "x" })).rejects.toBeInstanceOf(ConflictError);
  });

  it("the studio answers each condition; committee refused; bad numbers and empty answers named", async () => {
    const rev = await circulateNext(ids.commissionId);
    const chair = await as("chair");
    const { id } = await openBallot(chair, rev.id, { closesAt: inHours(24) });
    for (const m of ["david@stwenna.test", "ruth@stwenna.test"]) await castVote(await viewer(m), id, "in-favour");
    await closeBallot(chair, id);
    await recordDecision(chair, rev.id, { outcome: "approved-as-noted", conditions: "Lower the rim by 20 mm" });
    for (const who of ["chair", "member", "adviser"]) {
      await expect(answerCondition(await as(who), ids.commissionId, 1, { answer: "x" })).rejects.toBeInstanceOf(ForbiddenError);
    }
    await expect(answerCondition(await as("outsider"), ids.commissionId, 1, { answer: "x" })).rejects.toBeInstanceOf(NotFoundError);
    await expect(answerCondition(await as("designer"), ids.commissionId, 2, { answer: "x" })).rejects.toBeInstanceOf(NotFoundError);
    const empty = await answerCondition(await as("designer"), ids.commissionId, 1, { answer: "   " }).catch((e) => e);
    expect(empty.fields.answer).toMatch(/how the condition will be met/);
    const got = await answerCondition(await as("designer"), ids.commissionId, 1, { answer: "Rim lowered to 880 mm in Revision 1's drawings <b>now</b>." });
    expect(got.conditions[0]).toMatchObject({ index: 0, text: "Lower the rim by 20 mm", answer: "Rim lowered to 880 mm in Revision 1's drawings <b>now</b>.", answeredByName: "Elias Brandt" });
    const [ev] = await getDb().select().from(trailEvents).where(eq(trailEvents.action, "condition answered"));
    expect(describeEvent(rowToEvent(ev))).toMatch(/^Answered condition 1 of the approval of Revision 1: “Rim lowered/);
    const mails = await getDb().select().from(outbox).where(like(outbox.dedupeKey, "condition:%"));
    expect(mails.map((m) => m.toEmail).sort()).toEqual(["colin@stwenna.test", "david@stwenna.test", "margaret@stwenna.test", "priya@stwenna.test", "ruth@stwenna.test"]);
  });
});
