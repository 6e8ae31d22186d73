// The chain is anchored by the head its commission row holds and by the head quoted in every decision
// mail. Hash chaining as in RFC 6962 §2.1 / Crosby & Wallach (2009) "Efficient data structures for
// tamper-evident logging": a log is only tamper-evident against truncation if its head is kept or
// published outside the log; privilege names are MariaDB's (GRANT, "command denied", error 1142).
import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { eq, like, sql } from "drizzle-orm";
import { closeDb, databaseUrl, getDb } from "@/db/client";
import { commissions, outbox } from "@/db/schema";
import { recordDecision } from "@/lib/dal/decisions";
import { decisionRecordFor } from "@/lib/dal/record";
import { exportRecord, loadChain } from "@/lib/dal/trail";
import { renderDecisionRecordPdf } from "@/lib/record-pdf";
import { parseHead, type TrailEvent, type TrailHead } from "@/models/trail";
import { sealEvent, verifyChain, verifyRecord } from "@/models/trail/node-hash";
import { pdfPageTexts } from "../pdf-text";
import { PEOPLE, circulateNext, signedIn } from "./ballot-helpers";
import { asMigrator, freshDemo, viewer } from "./db";

const run = promisify(execFile);
let ids: Awaited<ReturnType<typeof freshDemo>>;
let mailHead: TrailHead;

/** The demo, one circulated revision and the chair's decision on it; returns the head quoted in the decision mail. */
async function demoWithDecision(): Promise<TrailHead> {
  ids = await freshDemo();
  await signedIn(PEOPLE.chair, 1);
  const rev = await circulateNext(ids.commissionId, "A shallower bowl, as asked.");
  await recordDecision(await viewer(PEOPLE.chair), rev.id, { outcome: "revise-and-resubmit", statement: "Please widen the foot." });
  const [mail] = await getDb().select().from(outbox).where(like(outbox.dedupeKey, `decision:${rev.id}:%`)).limit(1);
  const line = mail.bodyText.split("\n").find((l) => l.startsWith("Trail head after this decision:"))!;
  const parsed = parseHead(line);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.head;
}

async function storedHead(id: number) {
  const [c] = await getDb().select({ seq: commissions.trailHeadSeq, hash: commissions.trailHeadHash }).from(commissions).where(eq(commissions.id, id));
  return c;
}

const denied = (p: Promise<unknown>) => p.then(() => "accepted", (e) => String(e?.cause?.message ?? e?.message));

async function trailVerify() {
  const env = { ...process.env, DATABASE_URL: databaseUrl() };
  return run("npx", ["tsx", "--conditions=react-server", "scripts/trail-verify.ts"], { env }).then(
    (r) => ({ code: 0, stdout: r.stdout }),
    (e) => ({ code: e.code as number, stdout: String(e.stdout) }),
  );
}

/** Someone with the migrator's (or root's) rights drops the guards, then runs `sqlText`. */
async function tamper(fn: (c: import("mysql2/promise").Connection) => Promise<unknown>) {
  await asMigrator(async (c) => {
    await c.query("DROP TRIGGER IF EXISTS trail_events_no_update");
    await c.query("DROP TRIGGER IF EXISTS trail_events_no_delete");
    await fn(c);
  });
}

beforeEach(async () => { mailHead = await demoWithDecision(); }, 180_000);
afterAll(async () => { await closeDb(); });

describe("the app's database user", () => {
  it("gets 'command denied' for TRUNCATE, DROP TRIGGER, UPDATE, DELETE and ALTER on trail_events (MariaDB GRANT)", async () => {
    const db = getDb();
    expect(await denied(db.execute(sql`TRUNCATE TABLE trail_events`))).toMatch(/DROP command denied/);
    expect(await denied(db.execute(sql`DROP TRIGGER trail_events_no_delete`))).toMatch(/TRIGGER command denied/);
    expect(await denied(db.execute(sql`UPDATE trail_events SET seq = seq WHERE commission_id = ${ids.commissionId}`))).toMatch(/UPDATE command denied/);
    expect(await denied(db.execute(sql`DELETE FROM trail_events WHERE commission_id = ${ids.commissionId}`))).toMatch(/DELETE command denied/);
    expect(await denied(db.execute(sql`ALTER TABLE trail_events ADD note text`))).toMatch(/ALTER command denied/);
    expect(await denied(db.execute(sql`DROP TABLE outbox`))).toMatch(/DROP command denied/);
    expect((await loadChain(ids.commissionId)).length).toBe(mailHead.seq);
  });

  it("cannot wind the stored head back to match a shorter chain", async () => {
    const chain = await loadChain(ids.commissionId);
    const back = chain[chain.length - 4];
    const err = await denied(getDb().update(commissions).set({ trailHeadSeq: back.seq, trailHeadHash: back.hash }).where(eq(commissions.id, ids.commissionId)));
    expect(err).toMatch(/trail_head moves only forward/);
    expect(await storedHead(ids.commissionId)).toEqual(mailHead);
  });
});

describe("the head", () => {
  it("moves with every append, and the decision mail quotes it", async () => {
    const chain = await loadChain(ids.commissionId);
    const last = chain[chain.length - 1];
    expect(await storedHead(ids.commissionId)).toEqual({ seq: last.seq, hash: last.hash });
    expect(mailHead).toEqual({ seq: last.seq, hash: last.hash });
    const rec = await exportRecord(await viewer("david@stwenna.test"), ids.commissionId);
    expect(rec.head).toEqual(mailHead);
    expect(verifyRecord(rec, mailHead)).toMatchObject({ ok: true, count: mailHead.seq });
    expect((await trailVerify()).code).toBe(0);
  }, 180_000);

  it("the PDF record prints the head in full, to be pasted into /verify", async () => {
    const text = await pdfText();
    expect(text).toMatch(new RegExp(`Trail head: event ${mailHead.seq}, hash\\s*${mailHead.hash}`));
    expect(text).not.toContain("Warning: the commission's head");
  });
});

async function pdfText(): Promise<string> {
  const record = await decisionRecordFor(await viewer("david@stwenna.test"), ids.commissionId);
  return (await pdfPageTexts(await renderDecisionRecordPdf(record, {}))).join(" ").replace(/\s+/g, " ");
}

/** What each check says about the commission's chain after an attack. */
async function verdicts() {
  const rec = await exportRecord(await viewer("david@stwenna.test"), ids.commissionId);
  // The file as an attacker would hand it over: its own head dropped, so only the mail's head can catch it.
  const bare = { ...rec, head: undefined };
  return { script: await trailVerify(), withMailHead: verifyRecord(bare, mailHead), withFileHead: verifyRecord(rec) };
}

describe("attacks by someone with the database's own rights, triggers dropped", () => {
  it("removing the last event is caught by trail:verify and by the mail's head", async () => {
    expect(mailHead.seq).toBeGreaterThan(12);
    await tamper((c) => c.query("DELETE FROM trail_events WHERE commission_id = ? AND seq = ?", [ids.commissionId, mailHead.seq]));
    const v = await verdicts();
    expect(v.script.code).toBe(1);
    expect(v.script.stdout).toContain(`FAIL  commission ${ids.commissionId} `);
    expect(v.script.stdout).toContain(`at seq ${mailHead.seq}: shortened — The record ends at event ${mailHead.seq - 1} but the commission's head is event ${mailHead.seq}`);
    expect(v.withMailHead).toMatchObject({ ok: false, seq: mailHead.seq, reason: "shortened" });
    expect(v.withFileHead).toMatchObject({ ok: false, seq: mailHead.seq, reason: "shortened" });
    expect(await pdfText()).toContain(`Warning: the commission's head is event ${mailHead.seq} but the trail above ends at entry ${mailHead.seq - 1}`);
  }, 180_000);

  it("removing the last three events is caught, naming the first missing seq", async () => {
    await tamper((c) => c.query("DELETE FROM trail_events WHERE commission_id = ? AND seq > ?", [ids.commissionId, mailHead.seq - 3]));
    const v = await verdicts();
    const first = mailHead.seq - 2;
    expect(v.script.code).toBe(1);
    expect(v.script.stdout).toContain(`FAIL  commission ${ids.commissionId} `);
    expect(v.script.stdout).toContain(`at seq ${first}: shortened — The record ends at event ${first - 1} but the commission's head is event ${mailHead.seq}: events ${first}–${mailHead.seq} are missing`);
    expect(v.withMailHead).toMatchObject({ ok: false, seq: first, reason: "shortened" });
    expect(v.withMailHead.ok || v.withMailHead.message).toMatch(`but the head you gave is event ${mailHead.seq}`);
  }, 180_000);

  it("rewriting the whole chain consistently from event 10 onward is caught at the head", async () => {
    const chain = await loadChain(ids.commissionId);
    const rewritten: TrailEvent[] = chain.slice(0, 9);
    for (const e of chain.slice(9)) {
      const { hash: _h, ...body } = e;
      void _h;
      const payload = e.seq === 10 ? { ...e.payload, note: "rewritten" } : e.payload;
      rewritten.push(sealEvent({ ...body, payload, prevHash: rewritten[rewritten.length - 1].hash }));
    }
    expect(verifyChain(rewritten, { expectedCommissionId: ids.commissionId }).ok).toBe(true); // consistent in itself
    await tamper(async (c) => {
      await c.query("DELETE FROM trail_events WHERE commission_id = ? AND seq >= 10", [ids.commissionId]);
      for (const e of rewritten.slice(9)) {
        await c.query(
          "INSERT INTO trail_events (commission_id, seq, at, actor_id, actor_role, action, subject_type, subject_id, payload, prev_hash, hash) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
          [e.commissionId, e.seq, new Date(e.at), e.actorId, e.actorRole, e.action, e.subjectType, e.subjectId, JSON.stringify(e.payload), e.prevHash, e.hash],
        );
      }
    });
    const v = await verdicts();
    expect(v.script.code).toBe(1);
    expect(v.script.stdout).toContain(`FAIL  commission ${ids.commissionId} "`);
    expect(v.script.stdout).toContain(`at seq ${mailHead.seq}: head mismatch`);
    expect(v.withMailHead).toMatchObject({ ok: false, seq: mailHead.seq, reason: "head mismatch" });

    // Even if the stored head is rewritten too (its guard dropped as well), the mail's head still catches it.
    const end = rewritten[rewritten.length - 1];
    await asMigrator(async (c) => {
      await c.query("DROP TRIGGER commissions_trail_head_forward");
      await c.query("UPDATE commissions SET trail_head_hash = ? WHERE id = ?", [end.hash, ids.commissionId]);
    });
    const after = await verdicts();
    expect(after.script.code).toBe(0); // the database alone can no longer tell: only an outside copy of the head can
    expect(after.withMailHead).toMatchObject({ ok: false, seq: mailHead.seq, reason: "head mismatch" });
  }, 240_000);
});
