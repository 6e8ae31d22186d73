import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/client";
import { listRevisions, getRevision } from "@/lib/dal/revisions-read";
import { verifyChain } from "@/models/trail/node-hash";
import { loadChain } from "@/lib/dal/trail";
import { freshDemo, viewer } from "./db";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => { ids = await freshDemo({ revisions: true }); }, 120_000);
afterAll(async () => { await closeDb(); });

describe("the demo scenario", () => {
  it("has Revision 1 superseded and Revision 2 circulated, each with drawings, and a chain that verifies", async () => {
    const david = await viewer("david@stwenna.test");
    const revs = await listRevisions(david, ids.commissionId);
    expect(revs.map((r) => [r.number, r.state])).toEqual([[2, "circulated"], [1, "superseded"]]);
    const r2 = await getRevision(david, revs[0].id);
    expect(r2.attachments.length).toBeGreaterThanOrEqual(3);
    expect(r2.contentHash).toMatch(/^[0-9a-f]{64}$/);
    const r = verifyChain(await loadChain(ids.commissionId), { expectedCommissionId: ids.commissionId });
    expect(r.ok).toBe(true);
  });
});
