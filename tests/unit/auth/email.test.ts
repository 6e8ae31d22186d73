import { describe, expect, it } from "vitest";
import { emailSchema } from "@/models/schemas/people";

const ok = (raw: string) => emailSchema.parse(raw);
const problem = (raw: string) => {
  const r = emailSchema.safeParse(raw);
  return r.success ? null : r.error.issues[0].message;
};

describe("one normalisation of an e-mail address", () => {
  it("trims and lower-cases ASCII (common practice; RFC 5321 §2.4: domains are case-insensitive)", () => {
    expect(ok("  MARGARET@STWENNA.TEST \n")).toBe("margaret@stwenna.test");
  });

  it("refuses non-ASCII with a plain message, before lower-casing could fold it (Unicode UTS #39 confusables)", () => {
    expect(problem("margaret@stwénna.test")).toMatch(/plain letters only/);
    expect(problem("margaret@stwennа.test")).toMatch(/plain letters only/); // Cyrillic а (U+0430)
    // U+212A KELVIN SIGN lower-cases to ASCII "k" (Unicode SpecialCasing / UnicodeData), so order matters.
    expect("\u212A".toLowerCase()).toBe("k");
    expect(problem("\u212Aate@stwenna.test")).toMatch(/plain letters only/);
    expect(problem("mar garet@stwenna.test")).toMatch(/plain letters only/);
  });

  it("keeps a plus-address as the different address it is", () => {
    expect(ok("margaret+x@stwenna.test")).toBe("margaret+x@stwenna.test");
  });

  it("refuses a trailing dot, empty input and more than 254 characters (RFC 5321 §4.5.3.1.3 path limit)", () => {
    expect(problem("margaret@stwenna.test.")).toMatch(/like name@example.org/);
    expect(problem("   ")).toBe("Enter an e-mail address.");
    expect(problem(`${"a".repeat(64)}@${"b".repeat(185)}.test`)).toMatch(/too long/);
    expect(ok(`${"a".repeat(64)}@${"b".repeat(184)}.test`)).toHaveLength(254);
  });
});
