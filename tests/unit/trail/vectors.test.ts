import canonicalize from "canonicalize";
import { describe, expect, it } from "vitest";
import { sha256HexAsync } from "@/models/trail";
import { sha256Hex } from "@/models/trail/node-hash";

// FIPS 180-4 SHA-256. "abc" and the 448-bit message are the one- and two-block examples in
// NIST's "SHA-256" example document (Cryptographic Standards and Guidelines, Examples with
// Intermediate Values), also FIPS 180-2 Appendix B.1/B.2; a million "a" is FIPS 180-2
// Appendix B.3. The empty message is the Len = 0 vector of NIST CAVP's SHAVS file
// SHA256ShortMsg.rsp (not one of the FIPS examples).
const SHA256_VECTORS: [string, string, string][] = [
  ["NIST SHA-256 example, one block", "abc", "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"],
  ["NIST CAVP SHA256ShortMsg, Len = 0", "", "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"],
  [
    "NIST SHA-256 example, two blocks",
    "abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq",
    "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
  ],
  ["FIPS 180-2 B.3, one million 'a'", "a".repeat(1_000_000), "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0"],
];

describe("SHA-256 against published vectors", () => {
  it.each(SHA256_VECTORS)("%s (node:crypto)", (_name, message, digest) => {
    expect(sha256Hex(message)).toBe(digest);
  });
  it.each(SHA256_VECTORS)("%s (WebCrypto)", async (_name, message, digest) => {
    expect(await sha256HexAsync(message)).toBe(digest);
  });
  it("hashes the UTF-8 bytes of text, on both paths", async () => {
    const text = "Placet: é € 😀";
    const bytes = new TextEncoder().encode(text);
    const { createHash } = await import("node:crypto");
    const expected = createHash("sha256").update(bytes).digest("hex");
    expect(sha256Hex(text)).toBe(expected);
    expect(await sha256HexAsync(text)).toBe(expected);
  });
});

// RFC 8785 (JSON Canonicalization Scheme). The examples below were written down from memory of
// the RFC's text; each one also agrees with ECMAScript's JSON serialisation, which JCS adopts.
describe("RFC 8785 canonical JSON", () => {
  it("§3.2.2: the worked example of primitive serialisation", () => {
    const parsed = JSON.parse(
      '{"numbers": [333333333.33333329, 1E30, 4.50, 2e-3, 0.000000000000000000000000001],' +
        ' "string": "\\u20ac$\\u000F\\u000aA\'\\u0042\\u0022\\u005c\\\\\\"\\/",' +
        ' "literals": [null, true, false]}',
    );
    expect(canonicalize(parsed)).toBe(
      '{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],' +
        '"string":"€$\\u000f\\nA\'B\\"\\\\\\\\\\"/"}',
    );
  });

  it("§3.2.3: properties sorted by UTF-16 code units (the emoji before U+FB33)", () => {
    const parsed = JSON.parse(
      '{"\\u20ac": "Euro Sign", "\\r": "Carriage Return", "\\ufb33": "Hebrew Letter Dalet With Dagesh",' +
        ' "1": "One", "\\ud83d\\ude00": "Emoji: Grinning Face", "\\u0080": "Control",' +
        ' "\\u00f6": "Latin Small Letter O With Diaeresis"}',
    );
    // Read the order from the text: JSON.parse would move the key "1" first again.
    const values = [...canonicalize(parsed)!.matchAll(/":"([^"]*)"/g)].map((m) => m[1]);
    expect(values).toEqual([
      "Carriage Return",
      "One",
      "Control",
      "Latin Small Letter O With Diaeresis",
      "Euro Sign",
      "Emoji: Grinning Face",
      "Hebrew Letter Dalet With Dagesh",
    ]);
  });

  it("§3.2.1: no whitespace between tokens; nested objects sorted too", () => {
    expect(canonicalize({ b: [1, { d: 1, c: 2 }], a: "x" })).toBe('{"a":"x","b":[1,{"c":2,"d":1}]}');
  });

  // Appendix B, "Number Serialization Samples": IEEE 754 bit patterns and their JSON text.
  const NUMBER_SAMPLES: [string, string][] = [
    ["0000000000000000", "0"],
    ["8000000000000000", "0"], // minus zero
    ["0000000000000001", "5e-324"],
    ["8000000000000001", "-5e-324"],
    ["7fefffffffffffff", "1.7976931348623157e+308"],
    ["ffefffffffffffff", "-1.7976931348623157e+308"],
    ["4340000000000000", "9007199254740992"],
    ["c340000000000000", "-9007199254740992"],
    ["4430000000000000", "295147905179352830000"],
    ["44b52d02c7e14af5", "9.999999999999997e+22"],
    ["44b52d02c7e14af6", "1e+23"],
    ["444b1ae4d6e2ef50", "1e+21"],
    ["3eb0c6f7a0b5ed8c", "9.999999999999997e-7"],
    ["3eb0c6f7a0b5ed8d", "0.000001"],
    ["41b3de4355555555", "333333333.3333333"],
  ];
  const fromBits = (hex: string) => {
    const view = new DataView(new ArrayBuffer(8));
    view.setBigUint64(0, BigInt(`0x${hex}`));
    return view.getFloat64(0);
  };
  it.each(NUMBER_SAMPLES)("Appendix B: %s → %s", (bits, text) => {
    expect(canonicalize(fromBits(bits))).toBe(text);
  });

  it("§3.2.2.3: NaN and Infinity are errors", () => {
    expect(() => canonicalize(Number.NaN)).toThrow();
    expect(() => canonicalize(Number.POSITIVE_INFINITY)).toThrow();
  });
});
