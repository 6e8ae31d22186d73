import { describe, expect, it, vi } from "vitest";
import { GENESIS_HASH, WebCryptoUnavailableError, eventBody, hashInput, verifyChainAsync, type TrailEvent } from "@/models/trail";
import { hashEvent, sealEvent, sha256Hex, verifyChain } from "@/models/trail/node-hash";
import { chainOf, draft } from "./fixtures";

const five = () =>
  chainOf(7, [
    draft(),
    draft({ action: "person invited", subjectType: "person", subjectId: "u-2", payload: { role: "chair" } }),
    draft({ action: "ballot rules changed", payload: { before: { quorum: "majority" }, after: { quorum: 4 } } }),
    draft({ action: "revision circulated", subjectType: "revision", subjectId: "12", payload: { number: 1 } }),
    draft({ actorId: null, actorRole: "system", action: "ballot closed", subjectType: "ballot", subjectId: "3", payload: {} }),
  ]);

/** Both verifiers, which must always agree. */
async function verifyBoth(events: readonly unknown[], opts = {}) {
  const sync = verifyChain(events, opts);
  expect(await verifyChainAsync(events, opts)).toEqual(sync);
  return sync;
}

describe("hashing an event", () => {
  it("hashes the UTF-8 of prevHash followed by the canonical JSON of the body", () => {
    const [e] = five();
    const body = eventBody(e);
    expect(body).not.toHaveProperty("hash");
    const text = hashInput(e.prevHash, body);
    expect(text.startsWith(GENESIS_HASH + "{")).toBe(true);
    expect(text.slice(64)).toContain(`"prevHash":"${GENESIS_HASH}"`);
    expect(hashEvent(e.prevHash, body)).toBe(sha256Hex(text));
    expect(e.hash).toBe(hashEvent(e.prevHash, body));
  });

  it("does not depend on key order or on extra fields of the object passed in", () => {
    const [e] = five();
    const shuffled = Object.fromEntries(Object.entries(e).reverse()) as TrailEvent;
    expect(hashEvent(e.prevHash, shuffled)).toBe(e.hash);
    expect(hashEvent(e.prevHash, { ...e, extra: 1 } as TrailEvent)).toBe(e.hash);
  });

  it("keeps a stable hash for a fixed event (changing it breaks every stored record)", () => {
    const e = sealEvent({ ...draft(), commissionId: 1, seq: 1, at: "2026-12-01T10:00:00.000Z", prevHash: GENESIS_HASH });
    // The canonical text written out by hand; its digest checked with coreutils `sha256sum`.
    const canonical =
      `{"action":"commission created","actorId":"u-1","actorRole":"designer","at":"2026-12-01T10:00:00.000Z",` +
      `"commissionId":1,"payload":{"title":"Font for St Aldwyn's"},"prevHash":"${GENESIS_HASH}","seq":1,` +
      `"subjectId":"1","subjectType":"commission"}`;
    expect(hashInput(e.prevHash, e)).toBe(GENESIS_HASH + canonical);
    expect(e.hash).toBe("1d6541cec7b91f2f397974007dd3a26e8ed5b7450495ce692f83d76b5afcbc12");
  });
});

describe("verifyChain", () => {
  it("accepts an intact chain and reports its count and final hash", async () => {
    const events = five();
    expect(await verifyBoth(events, { expectedCommissionId: 7, expectedFinalHash: events[4].hash })).toEqual({
      ok: true,
      count: 5,
      finalHash: events[4].hash,
    });
  });

  it("accepts an empty chain, whose final hash is 64 zeros", async () => {
    expect(await verifyBoth([])).toEqual({ ok: true, count: 0, finalHash: GENESIS_HASH });
  });

  it("finds a changed payload: hash mismatch at that event", async () => {
    const events = five();
    events[2] = { ...events[2], payload: { before: { quorum: "majority" }, after: { quorum: 3 } } };
    expect(await verifyBoth(events)).toMatchObject({ ok: false, seq: 3, reason: "hash mismatch" });
  });

  it("finds a deleted event: gap", async () => {
    const events = five();
    events.splice(1, 1);
    const r = await verifyBoth(events);
    expect(r).toMatchObject({ ok: false, seq: 2, reason: "gap" });
    expect(!r.ok && r.message).toMatch(/skips event 2/);
  });

  it("finds a deleted event renumbered to hide it: broken link", async () => {
    const events = five();
    events.splice(1, 1);
    const renumbered = events.map((e, i) => ({ ...e, seq: i + 1 }));
    expect(await verifyBoth(renumbered)).toMatchObject({ ok: false, seq: 2, reason: "broken link" });
  });

  it("finds a reordered chain: gap at the first moved event", async () => {
    const events = five();
    [events[1], events[3]] = [events[3], events[1]];
    expect(await verifyBoth(events)).toMatchObject({ ok: false, seq: 2, reason: "gap" });
  });

  it("finds the first event not starting from 64 zeros", async () => {
    const events = five().slice(1);
    const r = await verifyBoth(events.map((e, i) => ({ ...e, seq: i + 1 })));
    expect(r).toMatchObject({ ok: false, seq: 1, reason: "broken link" });
  });

  it("finds an event of another commission", async () => {
    const events = five();
    const other = chainOf(8, [draft(), draft()]);
    expect(await verifyBoth([...events.slice(0, 1), { ...other[1], prevHash: events[0].hash }])).toMatchObject({
      ok: false,
      seq: 2,
      reason: "wrong commission",
    });
    expect(await verifyBoth(events, { expectedCommissionId: 8 })).toMatchObject({ ok: false, seq: 1, reason: "wrong commission" });
  });

  it("finds a truncated chain only with the expected final hash", async () => {
    const events = five();
    expect((await verifyBoth(events.slice(0, 4))).ok).toBe(true);
    const r = await verifyBoth(events.slice(0, 4), { expectedFinalHash: events[4].hash });
    expect(r).toMatchObject({ ok: false, seq: 5, reason: "hash mismatch" });
  });

  it.each([
    ["not an object", () => "event"],
    ["a bad hash", (e: TrailEvent) => ({ ...e, hash: e.hash.toUpperCase() })],
    ["an unknown field", (e: TrailEvent) => ({ ...e, note: "added later" })],
    ["a missing field", ({ payload: _payload, ...e }: TrailEvent) => e],
    ["an unknown action", (e: TrailEvent) => ({ ...e, action: "ballot rigged" })],
    ["an impossible date", (e: TrailEvent) => ({ ...e, at: "2026-02-30T10:00:00.000Z" })],
    ["a local time", (e: TrailEvent) => ({ ...e, at: "2026-12-01T10:00:00.000+01:00" })],
    ["a fractional seq", (e: TrailEvent) => ({ ...e, seq: 2.5 })],
    ["a lone surrogate", (e: TrailEvent) => ({ ...e, payload: { note: "\ud800" } })],
  ])("calls an event with %s malformed, naming the field", async (_what, spoil) => {
    const events: unknown[] = five();
    events[1] = spoil(events[1] as TrailEvent);
    const r = await verifyBoth(events);
    expect(r).toMatchObject({ ok: false, seq: 2, reason: "malformed" });
    expect(!r.ok && r.message).toMatch(/^Event 2 /);
  });

  it("names the field in a malformed message", async () => {
    const events: unknown[] = five();
    events[0] = { ...(events[0] as TrailEvent), hash: "abc" };
    const r = await verifyBoth(events);
    expect(!r.ok && r.message).toContain("hash: must be 64 lowercase hexadecimal characters");
  });

  it("refuses something that is not a list", async () => {
    expect(await verifyBoth({} as unknown as unknown[])).toMatchObject({ ok: false, seq: 1, reason: "malformed" });
  });
});

describe("verifyChainAsync without WebCrypto", () => {
  it("says plainly that the browser cannot check here (e.g. a page not served over https)", async () => {
    vi.stubGlobal("crypto", undefined);
    try {
      await expect(verifyChainAsync(five())).rejects.toBeInstanceOf(WebCryptoUnavailableError);
    } finally {
      vi.unstubAllGlobals();
    }
    expect((await verifyChainAsync(five())).ok).toBe(true);
  });
});
