import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  TAP_SIZE, boxCentre, normalisePercentSelector, dragBox, formatPercentSelector, formatXywh, isTap, parsePercentSelector, parseXywh, percentBoxProblem, tapBox,
} from "@/models/comments";

/**
 * Media Fragments URI 1.0 (basic), W3C Recommendation 25 September 2012, §4.2.2 Spatial Dimension:
 * its three examples, and the grammar xywhparam = [ xywhunit ":" ] 1*DIGIT "," 1*DIGIT "," 1*DIGIT "," 1*DIGIT.
 */
describe("xywh by the Media Fragments grammar (§4.2.2)", () => {
  it("xywh=160,120,320,240 is a 320×240 box at x=160, y=120, in pixels (no unit means pixel)", () => {
    expect(parseXywh("xywh=160,120,320,240")).toEqual({ unit: "pixel", x: 160, y: 120, w: 320, h: 240 });
  });
  it("xywh=pixel:160,120,320,240 is the same box, the unit named", () => {
    expect(parseXywh("xywh=pixel:160,120,320,240")).toEqual({ unit: "pixel", x: 160, y: 120, w: 320, h: 240 });
  });
  it("xywh=percent:25,25,50,50 is a 50%×50% box at x=25%, y=25%", () => {
    expect(parseXywh("xywh=percent:25,25,50,50")).toEqual({ unit: "percent", x: 25, y: 25, w: 50, h: 50 });
    expect(parsePercentSelector("xywh=percent:25,25,50,50")).toEqual({ x: 25, y: 25, w: 50, h: 50 });
  });
  it.each([
    "xywh=percent:25.5,25,50,50", // the grammar has whole numbers only
    "xywh=percent:-1,25,50,50",
    "xywh=percent:25,25,50",
    "xywh=percent:25,25,50,50,1",
    "xywh=percent: 25,25,50,50",
    "xywh=inch:1,1,1,1",
    "XYWH=percent:1,1,1,1",
    "xywh=Percent:1,1,1,1",
    "xywh=percent:1,1,1,1&t=10",
    "t=10,20",
    "",
  ])("refuses %j", (s) => {
    expect(parseXywh(s)).toBeNull();
  });
  it("leading zeros are allowed by 1*DIGIT; the formatter writes the canonical form", () => {
    const f = parseXywh("xywh=percent:05,010,20,30")!;
    expect(formatXywh(f)).toBe("xywh=percent:5,10,20,30");
    expect(formatXywh(parseXywh("xywh=160,120,320,240")!)).toBe("xywh=pixel:160,120,320,240");
  });
});

describe("a comment's place on a drawing (Placet's rules on top of the grammar)", () => {
  it("must be in percent, inside the picture, at least 1% each way", () => {
    expect(parsePercentSelector("xywh=160,120,320,240")).toBeNull(); // pixels
    expect(parsePercentSelector("xywh=percent:60,0,50,10")).toBeNull(); // x + w > 100
    expect(parsePercentSelector("xywh=percent:0,95,10,6")).toBeNull(); // y + h > 100
    expect(parsePercentSelector("xywh=percent:10,10,0,0")).toBeNull(); // no zero-area boxes
    expect(parsePercentSelector("xywh=percent:0,0,100,100")).toEqual({ x: 0, y: 0, w: 100, h: 100 });
    expect(percentBoxProblem({ x: 1.5, y: 0, w: 2, h: 2 })).toMatch(/whole per cents/);
  });
  it("a tap is a small square centred on the spot, pulled inwards at the edges", () => {
    expect(tapBox(25, 40)).toEqual({ x: 24, y: 39, w: TAP_SIZE, h: TAP_SIZE });
    expect(boxCentre(tapBox(25, 40))).toEqual({ x: 25, y: 40 });
    expect(tapBox(0, 100)).toEqual({ x: 0, y: 98, w: 2, h: 2 });
    expect(tapBox(Number.NaN, 150)).toEqual({ x: 49, y: 98, w: 2, h: 2 });
    expect(isTap(tapBox(3, 3))).toBe(true);
  });
  it("a drag covers the dragged area either way round; a tiny drag is a tap", () => {
    expect(dragBox(70.2, 60.7, 20.5, 10.1)).toEqual({ x: 20, y: 10, w: 51, h: 51 });
    expect(dragBox(10, 10, 10.5, 10.5)).toEqual(tapBox(10.25, 10.25));
    expect(dragBox(-20, -5, 150, 120)).toEqual({ x: 0, y: 0, w: 100, h: 100 });
  });
  it("the formatter refuses a box that breaks the rules", () => {
    expect(() => formatPercentSelector({ x: 90, y: 0, w: 20, h: 5 })).toThrow(RangeError);
  });
});

describe("what devices send, read kindly and stored canonically", () => {
  it.each([
    ["xywh=percent:25.00,40.00,0,0", "xywh=percent:24,39,2,2"], // a tap sent as a zero-size box
    ["xywh=percent:10.5,20.2,30.1,40", "xywh=percent:10,20,31,41"], // fractions rounded outwards
    ["xywh=percent:05,10,20,30", "xywh=percent:5,10,20,30"],
    ["xywh=percent:0,0,100,100", "xywh=percent:0,0,100,100"],
    ["xywh=percent:100,100,0,0", "xywh=percent:98,98,2,2"],
  ])("%j → %j", (input, stored) => {
    expect(normalisePercentSelector(input)).toBe(stored);
  });
  it.each(["xywh=160,120,320,240", "xywh=percent:99.5,0,1,0", "xywh=percent:50,50,60,1", "xywh=percent:1e2,0,1,1", "xywh=percent:-1,0,2,2", "xywh=percent:1000,0,1,1"])("refuses %j", (s) => {
    expect(normalisePercentSelector(s)).toBeNull();
  });
});

describe("properties", () => {
  const box = fc.integer({ min: 0, max: 99 }).chain((x) => fc.integer({ min: 0, max: 99 }).chain((y) =>
    fc.record({ x: fc.constant(x), y: fc.constant(y), w: fc.integer({ min: 1, max: 100 - x }), h: fc.integer({ min: 1, max: 100 - y }) })));

  it("parse ∘ format is the identity on valid boxes", () => {
    fc.assert(fc.property(box, (b) => {
      expect(parsePercentSelector(formatPercentSelector(b))).toEqual(b);
    }), { numRuns: 500 });
  });
  it("format ∘ parse is the identity on canonical strings, for either unit", () => {
    const unit = fc.constantFrom("pixel", "percent");
    const n = fc.nat({ max: 100_000 });
    fc.assert(fc.property(unit, n, n, n, n, (u, x, y, w, h) => {
      const s = `xywh=${u}:${x},${y},${w},${h}`;
      expect(formatXywh(parseXywh(s)!)).toBe(s);
    }), { numRuns: 500 });
  });
  it("normalising is idempotent and always gives a valid place", () => {
    const p = fc.integer({ min: 0, max: 10000 }).map((v) => v / 100);
    fc.assert(fc.property(p, p, p, p, (x, y, w, h) => {
      const out = normalisePercentSelector(`xywh=percent:${x},${y},${w},${h}`);
      if (x + w > 100 + 1e-6 || y + h > 100 + 1e-6) {
        expect(out).toBeNull();
        return;
      }
      expect(out).not.toBeNull();
      expect(parsePercentSelector(out!)).not.toBeNull();
      expect(normalisePercentSelector(out!)).toBe(out);
    }), { numRuns: 500 });
  });
  it("any tap or drag anywhere (even off the picture) gives a valid place", () => {
    const any = fc.double({ min: -1e6, max: 1e6, noNaN: false });
    fc.assert(fc.property(any, any, any, any, (a, b, c, d) => {
      expect(percentBoxProblem(tapBox(a, b))).toBeNull();
      expect(percentBoxProblem(dragBox(a, b, c, d))).toBeNull();
    }), { numRuns: 500 });
  });
  it("a tap inside the picture lands within half a per cent of its pin", () => {
    const p = fc.double({ min: 1, max: 99, noNaN: true });
    fc.assert(fc.property(p, p, (x, y) => {
      const c = boxCentre(tapBox(x, y));
      expect(Math.abs(c.x - x)).toBeLessThanOrEqual(0.5 + 1e-9);
      expect(Math.abs(c.y - y)).toBeLessThanOrEqual(0.5 + 1e-9);
    }));
  });
});
