import { describe, expect, it } from "vitest";
import { RELEASE_CONDITIONS, releaseReadiness, type ReleaseFacts } from "@/models/release/rule";

const KEYS = RELEASE_CONDITIONS.map((c) => c.key);

/** The facts for one of the 2^5 combinations: bit i set ⇔ condition i holds. */
function combination(bits: number): ReleaseFacts {
  return Object.fromEntries(KEYS.map((k, i) => [k, Boolean(bits & (1 << i))])) as unknown as ReleaseFacts;
}

describe("release rule (release gating as the product's lifecycle rules set it; common practice in the trade)", () => {
  it("has exactly the five conditions, each with its own words", () => {
    expect(KEYS).toEqual(["approvedRevision", "permissionsRecorded", "noticePeriodOver", "depositSettled", "conditionsAnswered"]);
    expect(new Set(RELEASE_CONDITIONS.map((c) => c.missing)).size).toBe(5);
  });

  // Exhaustive truth table: 2^5 = 32 combinations, each checked on its own.
  for (let bits = 0; bits < 32; bits++) {
    const facts = combination(bits);
    const failing = RELEASE_CONDITIONS.filter((c) => !facts[c.key]).map((c) => c.missing);
    it(`combination ${bits.toString(2).padStart(5, "0")}: ready only if all hold, missing names exactly the failing`, () => {
      const r = releaseReadiness(facts);
      expect(r.ready).toBe(bits === 31);
      expect(r.missing).toEqual(failing);
      expect(r.missing.length).toBe(5 - bits.toString(2).split("").filter((b) => b === "1").length);
    });
  }

  it("treats anything other than true as not met (a missing fact never releases)", () => {
    const facts = { ...combination(31), depositSettled: undefined } as unknown as ReleaseFacts;
    expect(releaseReadiness(facts)).toEqual({ ready: false, missing: ["The deposit, paid or waived"] });
  });
});
