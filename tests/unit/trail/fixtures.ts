import fc from "fast-check";
import { GENESIS_HASH, TRAIL_ACTIONS, type TrailEvent, type TrailEventBody } from "@/models/trail";
import { sealEvent } from "@/models/trail/node-hash";

export type Draft = Omit<TrailEventBody, "commissionId" | "seq" | "prevHash" | "at">;

/** Seals drafts into a valid chain for one commission, one minute apart. */
export function chainOf(commissionId: number, drafts: Draft[], start = Date.UTC(2026, 11, 1, 10)): TrailEvent[] {
  const events: TrailEvent[] = [];
  drafts.forEach((d, i) => {
    const at = new Date(start + i * 60_000).toISOString();
    const prevHash = i === 0 ? GENESIS_HASH : events[i - 1].hash;
    events.push(sealEvent({ commissionId, seq: i + 1, at, prevHash, ...d }));
  });
  return events;
}

export const draft = (over: Partial<Draft> = {}): Draft => ({
  actorId: "u-1",
  actorRole: "designer",
  action: "commission created",
  subjectType: "commission",
  subjectId: "1",
  payload: { title: "Font for St Aldwyn's" },
  ...over,
});

export const draftArb: fc.Arbitrary<Draft> = fc.record({
  actorId: fc.option(fc.uuid(), { nil: null }),
  actorRole: fc.constantFrom("owner", "designer", "chair", "member", "adviser", "system"),
  action: fc.constantFrom(...TRAIL_ACTIONS),
  subjectType: fc.constantFrom("commission", "revision", "ballot", "comment", "person"),
  subjectId: fc.integer({ min: 1, max: 99_999 }).map(String),
  payload: fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 4 }),
});

export const chainArb = (min = 1, max = 12) =>
  fc
    .record({ commissionId: fc.integer({ min: 1, max: 10_000 }), drafts: fc.array(draftArb, { minLength: min, maxLength: max }) })
    .map(({ commissionId, drafts }) => chainOf(commissionId, drafts));

/** As the chain leaves the server in a record: through JSON text and back. */
export const viaJson = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;
