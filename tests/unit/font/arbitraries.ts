import fc from "fast-check";
import {
  capHeightForBase,
  capSphereRadius,
  glassKinds,
  pedestalMaterialKeys,
  pedestalShapes,
  type FontParameters,
} from "@/models/font";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/**
 * Parameters built to be valid by construction: depth ≤ rim radius, a flat that leaves more than 5 mm
 * of glass under the interior, engravings on the curved outside.
 */
export const validFontParams: fc.Arbitrary<FontParameters> = fc
  .record({
    a: num(60, 1500),
    dFrac: num(0.05, 1),
    t: num(8, 120),
    fFrac: num(0.05, 0.95),
    footBaseRadius: num(20, 1500),
    footTopRadius: num(20, 1500),
    footHeight: num(10, 1500),
    pedestalHeight: fc.oneof(num(10, 2000), fc.constant(0)),
    pedestalShape: fc.constantFrom(...pedestalShapes),
    widthFrac: num(1, 1.5),
    pedestalMaterial: fc.constantFrom(...pedestalMaterialKeys),
    hollowFrac: fc.oneof(fc.constant(0), num(0.05, 0.9)),
    glassFixedToPedestal: fc.boolean(),
    pedestalFixedToFloor: fc.boolean(),
    workingFrac: num(0, 0.95),
    glass: fc.constantFrom(...glassKinds),
    engravingCount: fc.integer({ min: 0, max: 12 }),
    engravingStartAngle: num(-360, 360),
    dropFrac: num(0.02, 0.95),
  })
  .map((v) => {
    const depth = v.a * v.dFrac;
    const R = capSphereRadius(v.a, depth);
    const outer = R + v.t;
    // The widest flat leaves exactly 5 mm: Ro − √(Ro² − f²) = t − 5  ⇔  f² = Ro² − (R + 5)².
    const flatRadius = v.fFrac * Math.sqrt(outer * outer - (R + 5) ** 2);
    const flatCap = capHeightForBase(outer, flatRadius);
    return {
      rimRadius: v.a,
      depth,
      wallThickness: v.t,
      flatRadius,
      footBaseRadius: v.footBaseRadius,
      footTopRadius: v.footTopRadius,
      footHeight: v.footHeight,
      pedestalHeight: v.pedestalHeight,
      pedestalShape: v.pedestalShape,
      pedestalWidth: Math.min(3000, 2 * v.footBaseRadius * v.widthFrac),
      pedestalMaterial: v.pedestalMaterial,
      pedestalHollowWall: (v.hollowFrac * Math.min(3000, 2 * v.footBaseRadius * v.widthFrac)) / 2,
      glassFixedToPedestal: v.glassFixedToPedestal,
      pedestalFixedToFloor: v.pedestalFixedToFloor,
      workingDepthBelowRim: v.workingFrac * depth,
      glass: v.glass,
      engravingCount: v.engravingCount,
      engravingStartAngle: v.engravingStartAngle,
      engravingDrop: v.dropFrac * (depth + v.t - flatCap),
    };
  });
