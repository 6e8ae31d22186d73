import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defaultFontParameters as p, evaluateFont, fontFieldNames, parseFontParameters } from "@/models/font";

function errorsFor(input: unknown) {
  const r = parseFontParameters(input);
  if (r.ok) throw new Error("expected a refusal");
  return r.fieldErrors;
}

describe("refusals name the field and say why", () => {
  it("the defaults are valid", () => {
    expect(parseFontParameters(p).ok).toBe(true);
  });

  it("depth beyond a hemisphere", () => {
    const e = errorsFor({ ...p, depth: 281 });
    expect(e.depth?.[0]).toMatch(/Depth .*hemisphere/);
  });

  it("a flat so wide it would grind through the wall", () => {
    const e = errorsFor({ ...p, flatRadius: 200 });
    expect(e.flatRadius?.[0]).toMatch(/Flat radius .*5 mm/);
  });

  it("a flat wider than the bowl", () => {
    expect(errorsFor({ ...p, flatRadius: 2000 }).flatRadius?.[0]).toMatch(/Flat radius/);
  });

  it("a wall too thin to keep 5 mm under the flat", () => {
    expect(errorsFor({ ...p, wallThickness: 5 }).wallThickness?.[0]).toMatch(/Wall thickness .*5 mm/);
  });

  it("an engraving below the bowl, only when there are engravings", () => {
    expect(errorsFor({ ...p, engravingDrop: 170 }).engravingDrop?.[0]).toMatch(/Engraving drop .*below/);
    expect(parseFontParameters({ ...p, engravingDrop: 170, engravingCount: 0 }).ok).toBe(true);
  });

  it("non-positive and absurd sizes", () => {
    expect(errorsFor({ ...p, footHeight: 0 }).footHeight?.[0]).toBe("Foot height must be more than 0.");
    expect(errorsFor({ ...p, rimRadius: -3 }).rimRadius?.[0]).toMatch(/Rim radius must be more than 0/);
    expect(errorsFor({ ...p, pedestalHeight: 3001 }).pedestalHeight?.[0]).toMatch(/Pedestal height .*3000 mm/);
  });

  it("engraving count must be a whole number from 0 to 12", () => {
    expect(errorsFor({ ...p, engravingCount: 13 }).engravingCount?.[0]).toMatch(/Number of engravings .*12/);
    expect(errorsFor({ ...p, engravingCount: 2.5 }).engravingCount?.[0]).toMatch(/whole number/);
  });

  it("missing, non-numeric and unknown values", () => {
    const { rimRadius: _, ...rest } = p;
    expect(errorsFor(rest).rimRadius?.[0]).toBe("Rim radius is required.");
    expect(errorsFor({ ...p, depth: "deep" }).depth?.[0]).toBe("Depth must be a number.");
    expect(errorsFor({ ...p, depth: Number.NaN }).depth?.[0]).toBe("Depth must be a number.");
    expect(errorsFor({ ...p, glass: "lead crystal" }).glass?.[0]).toMatch(/Glass must be/);
  });

  it("a pedestal of height 0 is allowed: the foot stands on the floor (common practice)", () => {
    expect(parseFontParameters({ ...p, pedestalHeight: 0 }).ok).toBe(true);
    expect(errorsFor({ ...p, pedestalHeight: -1 }).pedestalHeight?.[0]).toBe("Pedestal height must be 0 or more.");
  });

  it("pedestal and water refusals name their field", () => {
    expect(errorsFor({ ...p, pedestalHollowWall: 190 }).pedestalHollowWall?.[0]).toMatch(/Hollow pedestal wall is too thick/);
    expect(errorsFor({ ...p, pedestalWidth: 250 }).pedestalWidth?.[0]).toMatch(/Pedestal width .*foot/);
    expect(errorsFor({ ...p, pedestalMaterial: "balsa" }).pedestalMaterial?.[0]).toMatch(/Pedestal material must be one of: oak, ash/);
    expect(errorsFor({ ...p, pedestalShape: "hexagon" }).pedestalShape?.[0]).toBe("Pedestal shape must be round or square.");
    expect(errorsFor({ ...p, glassFixedToPedestal: "yes" }).glassFixedToPedestal?.[0]).toMatch(/must be yes or no/);
    expect(errorsFor({ ...p, workingDepthBelowRim: 150 }).workingDepthBelowRim?.[0]).toMatch(/less than the depth/);
  });

  it("a set saved without the new fields loads with the stated defaults", () => {
    const old = { rimRadius: 280, depth: 150, wallThickness: 28, flatRadius: 110, footBaseRadius: 150, footTopRadius: 110,
      footHeight: 250, pedestalHeight: 550, glass: "low-iron", engravingCount: 3, engravingStartAngle: 90, engravingDrop: 45 };
    const r = parseFontParameters(old);
    expect(r.ok && r.params).toMatchObject({
      pedestalShape: "round", pedestalWidth: 380, pedestalMaterial: "oak", pedestalHollowWall: 0,
      glassFixedToPedestal: false, pedestalFixedToFloor: false, workingDepthBelowRim: 50,
    });
  });

  it("several problems are reported together", () => {
    const e = errorsFor({ ...p, depth: 300, footHeight: "x" });
    expect(Object.keys(e).sort()).toEqual(["depth", "footHeight"]);
  });
});

describe("never a throw", () => {
  it("any value at all is answered, not thrown", () => {
    fc.assert(
      fc.property(fc.anything(), (input) => {
        const r = evaluateFont(input);
        if (!r.ok) expect(r.formErrors.length + Object.keys(r.fieldErrors).length).toBeGreaterThan(0);
      }),
      { numRuns: 500 },
    );
  });

  it("any mix of numbers for the fields is either valid with finite figures or refused by field", () => {
    const anyNumber = fc.oneof(fc.double(), fc.integer({ min: -10, max: 4000 }), fc.constant(Number.NaN));
    fc.assert(
      fc.property(
        fc.record({
          rimRadius: anyNumber,
          depth: anyNumber,
          wallThickness: anyNumber,
          flatRadius: anyNumber,
          footBaseRadius: anyNumber,
          footTopRadius: anyNumber,
          footHeight: anyNumber,
          pedestalHeight: anyNumber,
          glass: fc.constantFrom("soda-lime", "low-iron", "borosilicate", "flint", ""),
          engravingCount: anyNumber,
          engravingStartAngle: anyNumber,
          engravingDrop: anyNumber,
        }),
        (input) => {
          const r = evaluateFont(input);
          if (r.ok) {
            for (const v of Object.values(r.figures)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
          } else {
            const fields = Object.keys(r.fieldErrors);
            expect(fields.length).toBeGreaterThan(0);
            for (const k of fields) expect(fontFieldNames).toContain(k);
          }
        },
      ),
      { numRuns: 500 },
    );
  });
});
