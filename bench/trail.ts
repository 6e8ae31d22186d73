/**
 * How fast a commission's decision trail is re-checked: verifyChain over 100,000 events
 * (schema check, canonical JSON, SHA-256, links), next to the baseline of plain SHA-256 over
 * exactly the same bytes (each event's prevHash ‖ canonical JSON). Also the WebCrypto
 * verifier the /verify page uses, run here in Node.
 *
 * Run: npx tsx bench/trail.ts
 */
import { performance } from "node:perf_hooks";
import canonicalize from "canonicalize";
import { GENESIS_HASH, TRAIL_ACTIONS, eventBody, hashInput, trailEventSchema, verifyChainAsync, type TrailEvent } from "@/models/trail";
import { sealEvent, sha256Hex, verifyChain } from "@/models/trail/node-hash";

const N = 100_000;
const RUNS = 3;

function buildChain(n: number): TrailEvent[] {
  const events: TrailEvent[] = [];
  const start = Date.UTC(2026, 11, 1, 9);
  for (let i = 0; i < n; i++) {
    events.push(
      sealEvent({
        commissionId: 42,
        seq: i + 1,
        at: new Date(start + i * 1000).toISOString(),
        actorId: `user-${i % 12}`,
        actorRole: i % 5 === 0 ? "chair" : "member",
        action: TRAIL_ACTIONS[i % TRAIL_ACTIONS.length],
        subjectType: "revision",
        subjectId: String(1 + (i % 40)),
        payload: { revision: 1 + (i % 40), choice: "in favour", tally: { inFavour: i % 9, against: i % 4, abstain: i % 3 }, note: "Three engravings, evenly spaced." },
        prevHash: i === 0 ? GENESIS_HASH : events[i - 1].hash,
      }),
    );
  }
  return events;
}

async function best(label: string, fn: () => unknown | Promise<unknown>): Promise<number> {
  let fastest = Infinity;
  for (let r = 0; r < RUNS; r++) {
    const t0 = performance.now();
    await fn();
    fastest = Math.min(fastest, performance.now() - t0);
  }
  const perSecond = N / (fastest / 1000);
  console.log(`${label.padEnd(52)} ${fastest.toFixed(0).padStart(6)} ms   ${Math.round(perSecond).toLocaleString("en-GB").padStart(10)} events/s`);
  return perSecond;
}

const t0 = performance.now();
const events = buildChain(N);
const inputs = events.map((e) => hashInput(e.prevHash, eventBody(e)));
const bytes = inputs.reduce((s, t) => s + Buffer.byteLength(t, "utf8"), 0);
console.log(`trail: ${N.toLocaleString("en-GB")} events built in ${(performance.now() - t0).toFixed(0)} ms; ${(bytes / N).toFixed(0)} bytes hashed per event (best of ${RUNS} runs)`);

const check = verifyChain(events, { expectedFinalHash: events[N - 1].hash });
if (!check.ok || check.count !== N) throw new Error(`the bench chain should verify: ${JSON.stringify(check)}`);

let sink = 0;
const verify = await best("verifyChain (node:crypto)", () => verifyChain(events));
const plain = await best("baseline: plain SHA-256 over the same bytes", () => {
  for (const text of inputs) sink ^= sha256Hex(text).charCodeAt(0);
});
// Where the difference goes: the two other parts of verifyChain, each alone.
await best("  of which: canonical JSON alone (canonicalize)", () => {
  for (const e of events) sink ^= canonicalize(eventBody(e))!.length;
});
await best("  of which: schema check alone (zod)", () => {
  for (const e of events) sink ^= trailEventSchema.safeParse(e).success ? 1 : 0;
});
const web = await best("verifyChainAsync (WebCrypto, as on /verify)", () => verifyChainAsync(events));
console.log(
  `trail: verifyChain runs at ${((verify / plain) * 100).toFixed(0)}% of plain SHA-256's speed ` +
    `(${Math.round(verify).toLocaleString("en-GB")} vs ${Math.round(plain).toLocaleString("en-GB")} events/s); ` +
    `WebCrypto path ${Math.round(web).toLocaleString("en-GB")} events/s${sink < 0 ? "" : ""}`,
);
