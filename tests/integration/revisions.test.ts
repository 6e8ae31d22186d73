import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
vi.hoisted(() => { process.env.SMTP_PORT = "1225"; });
import { spawn, type ChildProcess } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import canonicalize from "canonicalize";
import { eq, sql } from "drizzle-orm";
import { closeDb, getDb } from "@/db/client";
import { outbox, revisions } from "@/db/schema";
import { circulate, createDraft, updateDraft } from "@/lib/dal/revisions-write";
import { getRevision, getRevisionByNumber, listRevisions } from "@/lib/dal/revisions-read";
import { deliverOutbox } from "@/lib/outbox";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { freshDemo, viewer } from "./db";

let ids: Awaited<ReturnType<typeof freshDemo>>;
beforeAll(async () => { ids = await freshDemo(); });
afterAll(async () => { await closeDb(); });

const designer = () => viewer("elias@hollowmere.test");

describe("drafting and freezing", () => {
  it("a draft is the studio's alone until circulated", async () => {
    const d = await createDraft(await designer(), ids.commissionId, { note: "First thoughts" });
    const david = await viewer("david@stwenna.test");
    await expect(getRevision(david, d.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getRevisionByNumber(david, ids.commissionId, d.number)).rejects.toBeInstanceOf(NotFoundError);
    expect((await getRevisionByNumber(await designer(), ids.commissionId, d.number)).id).toBe(d.id);
    expect(await listRevisions(david, ids.commissionId)).toEqual([]);
    const hazel = await viewer("hazel@thrennick.test");
    await expect(getRevision(hazel, d.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(createDraft(await designer(), ids.commissionId)).rejects.toBeInstanceOf(ConflictError);
  });

  it("bad parameters are refused naming the field; the draft keeps its last good values", async () => {
    const err = await updateDraft(await designer(), ids.commissionId, 1, { params: { rimRadius: -4 } }).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(Object.keys(err.fields)).toContain("rimRadius");
    const rev = await getRevision(await designer(), (await listRevisions(await designer(), ids.commissionId))[0].id);
    expect((rev.params as { rimRadius: number }).rimRadius).toBeGreaterThan(0);
  });

  it("circulating needs a note, then freezes everything: the data-access layer refuses any change", async () => {
    const v = await designer();
    await updateDraft(v, ids.commissionId, 1, { note: "" });
    await expect(circulate(v, ids.commissionId, 1)).rejects.toBeInstanceOf(ValidationError);
    await updateDraft(v, ids.commissionId, 1, { note: "A shallower bowl, as discussed." });
    const { contentHash } = await circulate(v, ids.commissionId, 1);
    expect(contentHash).toMatch(/^[0-9a-f]{64}$/);
    await expect(updateDraft(v, ids.commissionId, 1, { note: "sneaky edit" })).rejects.toBeInstanceOf(ConflictError);
    await expect(updateDraft(v, ids.commissionId, 1, { params: { rimRadius: 300 } })).rejects.toBeInstanceOf(ConflictError);
    await expect(circulate(v, ids.commissionId, 1)).rejects.toBeInstanceOf(ConflictError);
    const [row] = await getDb().select().from(revisions).where(eq(revisions.number, 1));
    expect(row.note).toBe("A shallower bowl, as discussed.");
    expect(row.contentHash).toBe(contentHash);
  });

  it("the content hash recomputed independently from the API's data matches the stored one", async () => {
    const david = await viewer("david@stwenna.test");
    const [summary] = await listRevisions(david, ids.commissionId);
    const api = JSON.parse(JSON.stringify(await getRevision(david, summary.id)));
    // Independent recomputation: SHA-256 (node:crypto) over RFC 8785 JSON (canonicalize) of the frozen content.
    const content = {
      commissionId: api.commissionId, number: api.number, kind: "font", params: api.params, figures: api.figures, note: api.note,
      attachments: api.attachments.map((a: { name: string; caption: string; kind: string; sha256: string; position: number }) => ({ name: a.name, caption: a.caption, kind: a.kind, sha256: a.sha256, position: a.position })),
    };
    const hash = createHash("sha256").update(canonicalize(content)!, "utf8").digest("hex");
    expect(hash).toBe(api.contentHash);
  });

  it("a newer circulated revision supersedes the older one", async () => {
    const v = await designer();
    await createDraft(v, ids.commissionId, { note: "Deeper bowl" });
    await updateDraft(v, ids.commissionId, 2, { params: { ...(await getRevision(v, (await listRevisions(v, ids.commissionId))[0].id)).params, depth: 170 } });
    await circulate(v, ids.commissionId, 2);
    const list = await listRevisions(v, ids.commissionId);
    expect(list.map((r) => [r.number, r.state])).toEqual([[2, "circulated"], [1, "superseded"]]);
  });
});

describe("circulation mail goes through the outbox", () => {
  let catcher: ChildProcess | null = null;
  const startCatcher = async () => {
    const dir = mkdtempSync(path.join(tmpdir(), "placet-mail-"));
    catcher = spawn(path.resolve("node_modules/.bin/maildev"), ["--smtp", "1225", "--web", "1280", "--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "--mail-directory", dir], { stdio: "ignore" });
    for (let i = 0; i < 50; i++) {
      try { if ((await fetch("http://127.0.0.1:1280/api/email")).ok) return; } catch { /* not yet */ }
      await new Promise((r) => setTimeout(r, 200));
    }
    throw new Error("mail catcher did not start");
  };
  afterAll(() => { catcher?.kill(); });

  it("with the mail server down circulation succeeds; when it returns each person gets exactly one message", async () => {
    const v = await designer();
    await createDraft(v, ids.commissionId, { note: "Revision for the outbox test" });
    await circulate(v, ids.commissionId, 3); // no mail server is listening on 1225
    const first = await deliverOutbox();
    expect(first.sent).toBe(0);
    expect(first.failed).toBe(1);
    const pending = await getDb().select().from(outbox).where(sql`subject LIKE 'Revision 3 %'`);
    expect(pending.length).toBe(5); // chair, three members, adviser
    await startCatcher();
    await getDb().execute(sql`UPDATE outbox SET next_attempt_at = NOW(3) WHERE status = 'pending'`);
    await deliverOutbox(100);
    await deliverOutbox(100); // a second round sends nothing twice
    const mails = (await (await fetch("http://127.0.0.1:1280/api/email")).json()) as { subject: string; to: { address: string }[] }[];
    const rev3 = mails.filter((m) => m.subject.startsWith("Revision 3 "));
    const to = rev3.map((m) => m.to[0].address).sort();
    expect(to).toEqual(["colin@stwenna.test", "david@stwenna.test", "margaret@stwenna.test", "priya@stwenna.test", "ruth@stwenna.test"]);
  }, 60_000);
});

describe("the trail keeps a draft's contents from the committee", () => {
  it("a member's record holds no draft note, values, file names or captions", async () => {
    const v = await designer();
    const { createCommission } = await import("@/lib/dal/commissions");
    const { invitePerson } = await import("@/lib/dal/people");
    const { addAttachment } = await import("@/lib/dal/attachments");
    const { exportRecord } = await import("@/lib/dal/trail");
    const sharp = (await import("sharp")).default;
    const { id } = await createCommission(v, { title: "Secret draft font", clientBody: "Test body", site: "Test site" });
    await invitePerson(v, id, { email: "david@stwenna.test", name: "David Osei", role: "member" });
    const d = await createDraft(v, id, { note: "UNSEEN-NOTE" });
    await updateDraft(v, id, d.number, { params: { depth: 171 }, note: "UNSEEN-NOTE-2" });
    const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#abcdef" } }).png().toBuffer();
    await addAttachment(v, d.id, { name: "UNSEEN-FILE.png", bytes: png, caption: "UNSEEN-CAPTION" });
    const exported = await exportRecord(await viewer("david@stwenna.test"), id);
    const record = JSON.stringify(exported);
    expect(record).not.toContain("UNSEEN");
    // The new depth (171 mm) must not appear as a value in any payload (hashes are hex runs, so \b never splits them).
    expect(JSON.stringify(exported.events.map((e) => e.payload))).not.toMatch(/\b171\b/);
    expect(record).toContain("revision updated");
  });
});
