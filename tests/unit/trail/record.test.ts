import { describe, expect, it } from "vitest";
import {
  GENESIS_HASH, RECORD_FORMAT, RECORD_FORMAT_ID, buildRecord, parseRecord, parseRecordText, verifyRecordAsync,
} from "@/models/trail";
import { sha256Hex, verifyRecord } from "@/models/trail/node-hash";
import canonicalize from "canonicalize";
import { chainOf, draft } from "./fixtures";

const commission = { id: 7, title: "Baptismal font, St Aldwyn's" };
const events = chainOf(7, [draft(), draft({ action: "role changed", payload: { before: "member", after: "chair" } })]);
const exportedAt = "2026-12-02T09:30:00.000Z";

describe("buildRecord", () => {
  it("has the export shape, with the final hash of the last event", () => {
    const record = buildRecord(commission, events, { exportedAt });
    expect(record).toEqual({
      format: RECORD_FORMAT_ID,
      description: RECORD_FORMAT,
      commission,
      exportedAt,
      events,
      finalHash: events[1].hash,
    });
    expect(buildRecord(commission, [], { exportedAt }).finalHash).toBe(GENESIS_HASH);
  });

  it("describes a recipe that reproduces every hash without Placet's code", () => {
    expect(RECORD_FORMAT).toMatch(/SHA-256/);
    expect(RECORD_FORMAT).toMatch(/RFC 8785/);
    expect(RECORD_FORMAT).toMatch(/UTF-8/);
    for (const { hash, ...body } of events) expect(sha256Hex(body.prevHash + canonicalize(body))).toBe(hash);
  });

  it("round-trips through JSON text and verifies on both paths", async () => {
    const parsed = parseRecordText(JSON.stringify(buildRecord(commission, events, { exportedAt })));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const expected = { ok: true, count: 2, finalHash: events[1].hash };
    expect(verifyRecord(parsed.record)).toEqual(expected);
    expect(await verifyRecordAsync(parsed.record)).toEqual(expected);
  });

  it("keeps payload keys the schema would drop, such as __proto__", async () => {
    const odd = chainOf(7, [draft({ payload: JSON.parse('{"__proto__": {"x": 1}, "note": "kept"}') })]);
    const parsed = parseRecordText(JSON.stringify(buildRecord(commission, odd, { exportedAt })));
    expect(parsed.ok && verifyRecord(parsed.record).ok).toBe(true);
    expect(parsed.ok && (await verifyRecordAsync(parsed.record)).ok).toBe(true);
  });

  it("fails a record whose stated final hash or commission does not match its events", () => {
    const record = buildRecord(commission, events, { exportedAt });
    expect(verifyRecord({ ...record, finalHash: events[0].hash })).toMatchObject({ ok: false, seq: 3, reason: "hash mismatch" });
    expect(verifyRecord({ ...record, commission: { id: 8, title: "x" } })).toMatchObject({ ok: false, seq: 1, reason: "wrong commission" });
  });
});

describe("parseRecord", () => {
  const good = () => JSON.parse(JSON.stringify(buildRecord(commission, events, { exportedAt })));

  it("names the event and field that are wrong", () => {
    const bad = good();
    bad.events[1].hash = "not a hash";
    const r = parseRecord(bad);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toContain("event 2, hash: must be 64 lowercase hexadecimal characters");
    expect(!r.ok && r.errors.fieldErrors.events).toBeDefined();
  });

  it.each([
    ["format", (r: Record<string, unknown>) => ({ ...r, format: "other/1" }), 'format: must be "placet-trail/1"'],
    ["commission.id", (r: Record<string, unknown>) => ({ ...r, commission: { id: "7", title: "x" } }), "commission.id"],
    ["exportedAt", (r: Record<string, unknown>) => ({ ...r, exportedAt: "yesterday" }), "exportedAt: must be a UTC time"],
    ["events", (r: Record<string, unknown>) => ({ ...r, events: {} }), "events: must be a list of events"],
    ["finalHash", ({ finalHash: _f, ...r }: Record<string, unknown>) => r, "finalHash"],
  ])("reports a bad %s clearly", (_name, spoil, text) => {
    const r = parseRecord(spoil(good()));
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toContain(text);
  });

  it.each([null, 42, "text", []])("refuses %j without throwing", (value) => {
    const r = parseRecord(value);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/^This is not a Placet trail record/);
  });

  it("says so when the file is not JSON", () => {
    const r = parseRecordText("{ not json");
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/^The file is not valid JSON/);
    expect(!r.ok && r.errors.formErrors).toHaveLength(1);
  });
});
