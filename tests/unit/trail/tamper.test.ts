import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GENESIS_HASH, TRAIL_ACTIONS, verifyChainAsync, type TrailEvent } from "@/models/trail";
import { sealEvent, verifyChain } from "@/models/trail/node-hash";
import { chainArb, draftArb, viaJson, type Draft } from "./fixtures";

const FIELDS = [
  "commissionId", "seq", "at", "actorId", "actorRole", "action",
  "subjectType", "subjectId", "payload", "prevHash", "hash",
] as const;
type Field = (typeof FIELDS)[number];

const flipHex = (h: string, k: number) => {
  const at = k % 64;
  const c = ((parseInt(h[at], 16) + 1 + (k % 15)) % 16).toString(16);
  return h.slice(0, at) + c + h.slice(at + 1);
};

/** A copy of e with one field set to a value that always differs from the original. */
function changed(e: TrailEvent, field: Field, k: number): unknown {
  const next: Record<string, unknown> = { ...e };
  switch (field) {
    case "commissionId": next.commissionId = e.commissionId + 1 + k; break;
    case "seq": next.seq = k % 2 ? e.seq + 1 + k : e.seq - 1 - k; break;
    case "at": next.at = new Date(Date.parse(e.at) + 1 + k).toISOString(); break;
    case "actorId": next.actorId = e.actorId === null ? "intruder" : k % 2 ? null : `${e.actorId}x`; break;
    case "actorRole": next.actorRole = e.actorRole === "chair" ? "member" : "chair"; break;
    case "action": {
      const i = TRAIL_ACTIONS.indexOf(e.action);
      next.action = TRAIL_ACTIONS[(i + 1 + (k % (TRAIL_ACTIONS.length - 1))) % TRAIL_ACTIONS.length];
      break;
    }
    case "subjectType": next.subjectType = `${e.subjectType}x`; break;
    case "subjectId": next.subjectId = `${e.subjectId}0`; break;
    case "payload": {
      const keys = Object.keys(e.payload);
      next.payload = keys.length && k % 2 ? { ...e.payload, [keys[0]]: { was: e.payload[keys[0]] ?? null } } : { ...e.payload, [`tampered${k}`]: k };
      break;
    }
    case "prevHash": next.prevHash = flipHex(e.prevHash, k); break;
    case "hash": next.hash = flipHex(e.hash, k); break;
  }
  return next;
}

type Tamper =
  | { kind: "change"; i: number; field: Field; k: number }
  | { kind: "delete"; i: number }
  | { kind: "swap"; i: number; j: number }
  | { kind: "move"; i: number; j: number }
  | { kind: "insert"; p: number; forged: Draft; renumber: boolean }
  | { kind: "duplicate"; i: number; p: number };

const tamperArb = (n: number): fc.Arbitrary<Tamper> => {
  const idx = fc.nat({ max: n - 1 });
  const pos = fc.nat({ max: n });
  const pair = fc.tuple(idx, idx).filter(([a, b]) => a !== b);
  const options: fc.Arbitrary<Tamper>[] = [
    fc.record({ kind: fc.constant("change" as const), i: idx, field: fc.constantFrom(...FIELDS), k: fc.nat({ max: 1000 }) }),
    fc.record({ kind: fc.constant("delete" as const), i: idx }),
    fc.record({ kind: fc.constant("insert" as const), p: pos, forged: draftArb, renumber: fc.boolean() }),
    fc.record({ kind: fc.constant("duplicate" as const), i: idx, p: pos }),
  ];
  if (n >= 2) {
    options.push(pair.map(([i, j]) => ({ kind: "swap" as const, i, j })));
    options.push(pair.map(([i, j]) => ({ kind: "move" as const, i, j })));
  }
  return fc.oneof(...options);
};

/** Applies the tampering; returns the events and the seq where the verifier must first fail, if known. */
function apply(events: TrailEvent[], t: Tamper): { events: unknown[]; failAt?: number } {
  const out: unknown[] = [...events];
  switch (t.kind) {
    case "change": out[t.i] = changed(events[t.i], t.field, t.k); return { events: out, failAt: t.i + 1 };
    case "delete": out.splice(t.i, 1); return { events: out, failAt: t.i + 1 };
    case "swap": [out[t.i], out[t.j]] = [out[t.j], out[t.i]]; return { events: out, failAt: Math.min(t.i, t.j) + 1 };
    case "move": out.splice(t.j, 0, ...out.splice(t.i, 1)); return { events: out, failAt: Math.min(t.i, t.j) + 1 };
    case "duplicate": out.splice(t.p, 0, viaJson(events[t.i])); return { events: out };
    case "insert": {
      // A forger who knows the format: a well-formed event, properly sealed onto its predecessor.
      const prev = events[t.p - 1];
      const at = prev ? prev.at : events[0].at;
      const forged = sealEvent({ ...t.forged, commissionId: events[0].commissionId, seq: t.p + 1, at, prevHash: prev?.hash ?? GENESIS_HASH });
      out.splice(t.p, 0, forged);
      if (t.renumber) for (let q = t.p + 1; q < out.length; q++) out[q] = { ...(out[q] as TrailEvent), seq: q + 1 };
      return { events: out, failAt: t.p + 2 };
    }
  }
}

const scenario = chainArb(1, 10).chain((chain) => fc.tuple(fc.constant(chain), tamperArb(chain.length)));

describe("tamper detection (property-based)", () => {
  it("detects every one of 1,200 random tamperings of exported chains, at the right event", async () => {
    let tried = 0;
    await fc.assert(
      fc.asyncProperty(scenario, async ([chain, tamper]) => {
        const exported = viaJson(chain);
        const opts = { expectedCommissionId: chain[0].commissionId, expectedFinalHash: chain[chain.length - 1].hash };
        const { events, failAt } = apply(exported, tamper);
        const sync = verifyChain(events, opts);
        expect(sync.ok).toBe(false);
        if (!sync.ok && failAt !== undefined) expect(sync.seq).toBe(failAt);
        expect(await verifyChainAsync(events, opts)).toEqual(sync);
        tried++;
      }),
      { numRuns: 1200 },
    );
    expect(tried).toBe(1200);
  });

  it("accepts every untampered chain, before and after a trip through JSON", async () => {
    await fc.assert(
      fc.asyncProperty(chainArb(0, 15), async (chain) => {
        const final = chain.length ? chain[chain.length - 1].hash : GENESIS_HASH;
        for (const events of [chain, viaJson(chain)]) {
          const expected = { ok: true, count: chain.length, finalHash: final };
          expect(verifyChain(events, { expectedFinalHash: final })).toEqual(expected);
          expect(await verifyChainAsync(events, { expectedFinalHash: final })).toEqual(expected);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("sync and async verifiers agree on arbitrary junk as well", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(fc.jsonValue({ maxDepth: 3 }), { maxLength: 4 }), async (junk) => {
        expect(await verifyChainAsync(junk)).toEqual(verifyChain(junk));
      }),
      { numRuns: 300 },
    );
  });
});
