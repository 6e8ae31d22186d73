import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { PDFDocument } from "pdf-lib";
import { recordMeetingVote } from "@/lib/dal/ballots";
import { recordDecision } from "@/lib/dal/decisions";
import { decisionRecordFor } from "@/lib/dal/record";
import { listRevisions } from "@/lib/dal/revisions-read";
import { createDraft } from "@/lib/dal/revisions-write";
import { exportRecord } from "@/lib/dal/trail";
import { NotFoundError, UnauthenticatedError } from "@/lib/errors";
import type { Viewer } from "@/lib/dal/viewer";
import { renderDecisionRecordPdf } from "@/lib/record-pdf";
import { verifyRecord } from "@/models/trail/node-hash";
import { pdfPageTexts } from "../pdf-text";
import { MINUTES, PEOPLE, signedIn } from "./ballot-helpers";
import { closeDb, freshDemo, viewer } from "./db";

// The route reads the viewer from the request's session; here the test says who is asking.
const session = vi.hoisted(() => ({ viewer: null as Viewer | null }));
vi.mock("@/lib/session", () => ({
  requireViewer: async () => {
    if (!session.viewer) throw new UnauthenticatedError();
    return session.viewer;
  },
}));

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => {
  ids = await freshDemo({ revisions: true });
  const chair = await viewer(PEOPLE.chair);
  await signedIn(PEOPLE.chair, 1);
  const rev2 = (await listRevisions(chair, ids.commissionId)).find((r) => r.number === 2)!;
  await recordMeetingVote(chair, rev2.id, { meetingDate: new Date().toISOString().slice(0, 10), minutesRef: MINUTES, counts: { inFavour: 3, against: 0, abstain: 0 } });
  await recordDecision(chair, rev2.id, {
    outcome: "approved-as-noted",
    conditions: "Lower the rim so that it stands ≤ 850 mm above the floor\nShow the fixing of the foot to the pedestal on the drawing",
    statement: "Approved with thanks. The engravings stay at θ = 120° apart, as drawn.",
  });
});
afterAll(async () => { await closeDb(); });

describe("the decision record", () => {
  it("gathers the circulated revisions, the decision and the whole trail, with the JSON record's final hash", async () => {
    const member = await viewer(PEOPLE.member);
    const record = await decisionRecordFor(member, ids.commissionId);
    const json = await exportRecord(member, ids.commissionId);
    expect(verifyRecord(json).ok).toBe(true);
    expect(record.finalHash).toBe(json.finalHash);
    expect(record.lastSeq).toBe(json.events.length);
    expect(record.trail.map((e) => e.seq)).toEqual(json.events.map((e) => e.seq));
    expect(record.commission).toMatchObject({ id: ids.commissionId, title: "Baptismal font for the west end", studioName: "Hollowmere Glass", stageLabel: "Approved" });
    expect(record.revisions.map((r) => [r.number, r.stateLabel])).toEqual([[1, "Superseded"], [2, "Decided"]]);
    expect(record.revisions.every((r) => /^[0-9a-f]{64}$/.test(r.contentHash ?? ""))).toBe(true);
    expect(record.decisions).toHaveLength(1);
    expect(record.decisions[0]).toMatchObject({ number: 2, outcomeLabel: "Approved as noted", recordedByName: "Margaret Ellery" });
    expect(record.decisions[0].conditions).toHaveLength(2);
    expect(record.decisions[0].tally).toMatchObject({ kind: "meeting", inFavour: 3, outcome: "carried" });
    expect(record.formatId).toBe(json.format);
  });

  it("renders a PDF that pdf-lib loads, whose text carries the final hash and the decision", async () => {
    const record = await decisionRecordFor(await viewer(PEOPLE.adviser), ids.commissionId);
    const bytes = await renderDecisionRecordPdf(record, { verifyUrl: "http://localhost:3000/verify" });
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBeGreaterThanOrEqual(1);
    const pages = await pdfPageTexts(bytes);
    const all = pages.join(" ").replace(/\n/g, " ");
    expect(pages[pages.length - 1]).toContain(record.finalHash);
    expect(all).toContain(`page ${pages.length} of ${pages.length}`);
    expect(all).toContain("Revision 2: Approved as noted");
    expect(all).toContain("stands <= 850 mm above the floor"); // "≤" as the standard fonts can draw it
    expect(all).toContain("theta = 120°");
    expect(all).toContain("Created the commission");
    expect(all).toContain("Margaret Ellery (chair)");
    // The vote behind the decision: marked as taken from a meeting, with its minutes and its roll.
    expect(all).toContain("recorded by the chair from a meeting; minutes: Minute book 3, page 41");
    expect(all).toMatch(/Roll\s+David Osei, Ruth Penhallow, Colin Marsh \(3 voting members/);
  });

  it("leaves the studio's drafts out", async () => {
    const designer = await viewer(PEOPLE.designer);
    await createDraft(designer, ids.commissionId, { note: "Work in progress" });
    const record = await decisionRecordFor(designer, ids.commissionId);
    expect(record.revisions.map((r) => r.number)).toEqual([1, 2]);
  });

  it("is not found for an outsider, or for a commission that does not exist", async () => {
    const hazel = await viewer("hazel@thrennick.test");
    await expect(decisionRecordFor(hazel, ids.commissionId)).rejects.toBeInstanceOf(NotFoundError);
    await expect(decisionRecordFor(await viewer(PEOPLE.member), 987654)).rejects.toBeInstanceOf(NotFoundError);
    await expect(decisionRecordFor(hazel, ids.otherCommissionId)).resolves.toMatchObject({ commission: { id: ids.otherCommissionId } });
  });
});

describe("GET /api/commissions/{id}/record.pdf", () => {
  const get = async (id: string) => {
    const { GET } = await import("@/app/api/commissions/[commissionId]/record.pdf/route");
    return GET(new Request(`http://localhost/api/commissions/${id}/record.pdf`), { params: Promise.resolve({ commissionId: id }) });
  };

  it("sends a member the PDF as a private download", async () => {
    session.viewer = await viewer(PEOPLE.member);
    const res = await get(String(ids.commissionId));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="placet-decision-record-commission-${ids.commissionId}.pdf"`);
    expect(res.headers.get("cache-control")).toBe("private, no-store");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(Buffer.from(bytes.subarray(0, 5)).toString("latin1")).toBe("%PDF-");
    expect(Number(res.headers.get("content-length"))).toBe(bytes.byteLength);
    const { finalHash } = await exportRecord(session.viewer, ids.commissionId);
    expect((await pdfPageTexts(bytes)).join("\n")).toContain(finalHash);
  });

  it("answers 404 to an outsider and to an id that is not a number, 401 to nobody, never a 500", async () => {
    session.viewer = await viewer("hazel@thrennick.test");
    const outsider = await get(String(ids.commissionId));
    expect(outsider.status).toBe(404);
    expect(await outsider.json()).toEqual({ error: "Not found." });
    for (const bad of ["abc", "0", "-1", "1.5", "99999999999999999999"]) expect((await get(bad)).status).toBe(404);
    session.viewer = null;
    expect((await get(String(ids.commissionId))).status).toBe(401);
  });
});
