// A hash chain detects truncation only against a head kept outside it: RFC 6962 §2.1 (signed tree
// heads) and Crosby & Wallach, "Efficient Data Structures for Tamper-Evident Logging" (USENIX Security
// 2009), §3. Hashes: SHA-256, FIPS 180-4; both verifiers (node:crypto and WebCrypto) must agree.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildRecord, formatHead, parseHead, parseRecord, verifyChainAsync, verifyRecordAsync, type TrailEvent, type VerifyOptions } from "@/models/trail";
import { sealEvent, verifyChain, verifyRecord } from "@/models/trail/node-hash";
import { chainArb, chainOf, draft } from "./fixtures";

const chain28 = () => chainOf(4, Array.from({ length: 28 }, (_, i) => draft({ payload: { step: i + 1 } })));
const headOf = (events: TrailEvent[], seq = events.length) => ({ seq, hash: events[seq - 1].hash });

async function both(events: readonly unknown[], opts: VerifyOptions) {
  const sync = verifyChain(events, opts);
  expect(await verifyChainAsync(events, opts)).toEqual(sync);
  return sync;
}

/** The chain rewritten from event `from` on: each event re-sealed onto the rewritten one before it. */
function rewriteFrom(events: TrailEvent[], from: number): TrailEvent[] {
  const out = events.slice(0, from - 1);
  for (const e of events.slice(from - 1)) {
    const { hash: _h, ...body } = e;
    void _h;
    out.push(sealEvent({ ...body, payload: e.seq === from ? { forged: true } : e.payload, prevHash: out[out.length - 1].hash }));
  }
  return out;
}

describe("checking a chain against its head", () => {
  it("reports a chain cut short, in the words the record uses", async () => {
    const events = chain28();
    const r = await both(events.slice(0, 25), { expectedHead: headOf(events) });
    expect(r).toEqual({
      ok: false, seq: 26, reason: "shortened",
      message: "The record ends at event 25 but the commission's head is event 28: events 26–28 are missing.",
    });
    expect(await both(events.slice(0, 27), { expectedHead: headOf(events) })).toMatchObject({ seq: 28, reason: "shortened", message: expect.stringContaining("event 28 is missing") });
    expect(await both([], { expectedHead: headOf(events) })).toMatchObject({ seq: 1, reason: "shortened", message: expect.stringMatching(/^The record has no events/) });
  });

  it("reports a chain rewritten consistently from event 10 onward as not matching the head", async () => {
    const events = chain28();
    const forged = rewriteFrom(events, 10);
    expect((await both(forged, {})).ok).toBe(true); // the forgery holds together by itself
    const r = await both(forged, { expectedHead: headOf(events) });
    expect(r).toMatchObject({ ok: false, seq: 28, reason: "head mismatch" });
    expect(!r.ok && r.message).toMatch(/rewritten at or before event 28/);
    // An earlier head (say, from the mail of a decision at event 12) pins it down further.
    expect(await both(forged, { expectedHead: { ...headOf(events, 12), source: "the head you gave" } })).toMatchObject({ seq: 12, reason: "head mismatch" });
    expect(await both(forged, { expectedHead: headOf(events, 9) })).toMatchObject({ ok: true });
  });

  it("accepts a longer chain that reaches an earlier head, unless the head must be the end", async () => {
    const events = chain28();
    expect(await both(events, { expectedHead: headOf(events, 20) })).toMatchObject({ ok: true, count: 28 });
    expect(await both(events, { expectedHead: { ...headOf(events, 20), exact: true } })).toMatchObject({ ok: false, seq: 21, reason: "head mismatch" });
    expect(await both([], { expectedHead: { seq: 0, hash: "0".repeat(64), exact: true } })).toMatchObject({ ok: true, count: 0 });
  });

  it("a chain checked against its own head always holds; with any event removed from its end it never does (property)", async () => {
    await fc.assert(fc.asyncProperty(chainArb(1, 10), fc.integer({ min: 1, max: 10 }), async (events, cut) => {
      const head = headOf(events);
      expect((await both(events, { expectedHead: { ...head, exact: true } })).ok).toBe(true);
      const k = Math.min(cut, events.length);
      expect(await both(events.slice(0, events.length - k), { expectedHead: head })).toMatchObject({ ok: false, seq: events.length - k + 1, reason: "shortened" });
    }), { numRuns: 60 });
  });
});

describe("a record file and a head quoted from a mail or the PDF", () => {
  it("the file's own head and the quoted one are both checked", async () => {
    const events = chain28();
    const full = buildRecord({ id: 4, title: "Font" }, events, { head: headOf(events) });
    expect(verifyRecord(full)).toMatchObject({ ok: true, count: 28 });
    expect(await verifyRecordAsync(full, headOf(events, 15))).toMatchObject({ ok: true });
    // Cut to 25 events, finalHash fixed up and the file's head dropped: only the quoted head tells.
    const cut = buildRecord({ id: 4, title: "Font" }, events.slice(0, 25));
    expect(verifyRecord(cut).ok).toBe(true);
    const r = verifyRecord(cut, headOf(events));
    expect(r).toMatchObject({ ok: false, seq: 26, reason: "shortened" });
    expect(!r.ok && r.message).toBe("The record ends at event 25 but the head you gave is event 28: events 26–28 are missing.");
    expect(await verifyRecordAsync(cut, headOf(events))).toEqual(r);
    // Cut but with the commission's head left in the file: caught without any quoted head.
    expect(verifyRecord({ ...cut, head: headOf(events) })).toMatchObject({ ok: false, seq: 26, reason: "shortened" });
  });

  it("a record's head is part of its checked shape", () => {
    const events = chain28();
    const rec = JSON.parse(JSON.stringify(buildRecord({ id: 4, title: "Font" }, events, { head: headOf(events) })));
    expect(parseRecord(rec).ok).toBe(true);
    const bad = parseRecord({ ...rec, head: { seq: -1, hash: "xyz" } });
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.message).toMatch(/head/);
  });
});

describe("the head as quoted text", () => {
  const hash = "3f5a".repeat(16);
  it("round-trips through the line mails and the PDF print", () => {
    const line = `Trail head after this decision: ${formatHead({ seq: 28, hash })}`;
    expect(parseHead(line)).toEqual({ ok: true, head: { seq: 28, hash } });
  });
  it("reads a hash wrapped over lines or in capitals, and a bare number", () => {
    expect(parseHead(`Trail head: entry 7, hash ${hash.slice(0, 30)}\n  ${hash.slice(30).toUpperCase()}`)).toEqual({ ok: true, head: { seq: 7, hash } });
    expect(parseHead(`12 ${hash}`)).toEqual({ ok: true, head: { seq: 12, hash } });
  });
  it("names what is missing", () => {
    expect(parseHead("")).toMatchObject({ ok: false, message: expect.stringMatching(/event number and its 64-character hash/) });
    expect(parseHead(hash)).toMatchObject({ ok: false, message: expect.stringMatching(/event number/) });
    expect(parseHead("event 3, hash abc123")).toMatchObject({ ok: false, message: expect.stringMatching(/64 hexadecimal/) });
    expect(parseHead(`event 3 ${hash}0`)).toMatchObject({ ok: false, message: expect.stringMatching(/64 hexadecimal/) });
  });
});
