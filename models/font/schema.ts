/**
 * Input schema for the font. Every refusal names the field it concerns and says why, in plain words.
 * Limits: sizes must be positive and at most 3 m; the bowl at most a hemisphere; at least 5 mm of glass
 * left under the interior once the flat is ground; engravings on the bowl's curved outside.
 */
import { z } from "zod";
import { glassKinds } from "./materials";
import { pedestalMaterialKeys, pedestalMaterials, pedestalShapes } from "./pedestal";
import { fontFieldLabel } from "./fields";
import { capHeightForBase, capSphereRadius } from "./geometry";
import type { FontFieldName, FontParameters } from "./types";

export const MAX_LENGTH_MM = 3000;
export const MIN_GLASS_UNDER_INTERIOR_MM = 5;
export const MAX_ENGRAVINGS = 12;

const numberIssue = (label: string) => (iss: { input: unknown }) =>
  iss.input === undefined || iss.input === null || iss.input === ""
    ? `${label} is required.`
    : `${label} must be a number.`;

/** A length that may be 0 (a pedestal of no height, water to the brim, a solid pedestal). */
function lengthOrZero(field: FontFieldName) {
  const label = fontFieldLabel[field];
  return z
    .number({ error: numberIssue(label) })
    .min(0, `${label} must be 0 or more.`)
    .max(MAX_LENGTH_MM, `${label} must be at most ${MAX_LENGTH_MM} mm (3 m, about 118 in).`);
}

const yesNo = (field: FontFieldName) => z.boolean({ error: `${fontFieldLabel[field]} must be yes or no.` });

/**
 * Values a parameter set saved before these fields existed is read with: the pedestal the demo has
 * always drawn (380 mm round, solid oak), nothing fixed (the cautious assumption) and water 50 mm
 * below the rim.
 */
export const fontParameterDefaults = {
  pedestalShape: "round",
  pedestalWidth: 380,
  pedestalMaterial: "oak",
  pedestalHollowWall: 0,
  glassFixedToPedestal: false,
  pedestalFixedToFloor: false,
  workingDepthBelowRim: 50,
} as const;

const materialList = pedestalMaterialKeys.map((k) => pedestalMaterials[k].label.toLowerCase()).join(", ");

function length(field: FontFieldName) {
  const label = fontFieldLabel[field];
  return z
    .number({ error: numberIssue(label) })
    .positive(`${label} must be more than 0.`)
    .max(MAX_LENGTH_MM, `${label} must be at most ${MAX_LENGTH_MM} mm (3 m, about 118 in).`);
}

const baseSchema = z.object(
  {
    rimRadius: length("rimRadius"),
    depth: length("depth"),
    wallThickness: length("wallThickness"),
    flatRadius: length("flatRadius"),
    footBaseRadius: length("footBaseRadius"),
    footTopRadius: length("footTopRadius"),
    footHeight: length("footHeight"),
    pedestalHeight: lengthOrZero("pedestalHeight"),
    pedestalShape: z
      .enum(pedestalShapes, { error: "Pedestal shape must be round or square." })
      .default(fontParameterDefaults.pedestalShape),
    pedestalWidth: length("pedestalWidth").default(fontParameterDefaults.pedestalWidth),
    pedestalMaterial: z
      .enum(pedestalMaterialKeys, { error: `Pedestal material must be one of: ${materialList}.` })
      .default(fontParameterDefaults.pedestalMaterial),
    pedestalHollowWall: lengthOrZero("pedestalHollowWall").default(fontParameterDefaults.pedestalHollowWall),
    glassFixedToPedestal: yesNo("glassFixedToPedestal").default(fontParameterDefaults.glassFixedToPedestal),
    pedestalFixedToFloor: yesNo("pedestalFixedToFloor").default(fontParameterDefaults.pedestalFixedToFloor),
    workingDepthBelowRim: lengthOrZero("workingDepthBelowRim").default(fontParameterDefaults.workingDepthBelowRim),
    glass: z.enum(glassKinds, {
      error: "Glass must be one of: soda-lime, low-iron or borosilicate.",
    }),
    engravingCount: z
      .number({ error: numberIssue(fontFieldLabel.engravingCount) })
      .int(`${fontFieldLabel.engravingCount} must be a whole number.`)
      .min(0, `${fontFieldLabel.engravingCount} must be 0 or more.`)
      .max(MAX_ENGRAVINGS, `${fontFieldLabel.engravingCount} must be at most ${MAX_ENGRAVINGS}.`),
    engravingStartAngle: z
      .number({ error: numberIssue(fontFieldLabel.engravingStartAngle) })
      .min(-360, `${fontFieldLabel.engravingStartAngle} must be between −360° and 360°.`)
      .max(360, `${fontFieldLabel.engravingStartAngle} must be between −360° and 360°.`),
    engravingDrop: length("engravingDrop"),
  },
  { error: "The font's parameters must be a set of named values." },
);

const okSize = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v) && v > 0 && v <= MAX_LENGTH_MM;

export const fontParametersSchema = baseSchema.superRefine((p: Partial<Record<keyof FontParameters, unknown>>, ctx) => {
  const add = (path: FontFieldName, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
  const { rimRadius: a, depth: d, wallThickness: t, flatRadius: f } = p;
  pedestalChecks(p, add);
  if (!okSize(a) || !okSize(d) || !okSize(t)) return;
  const w = p.workingDepthBelowRim;
  if (typeof w === "number" && w >= d)
    add("workingDepthBelowRim", "Water level below the rim must be less than the depth, or the bowl would be empty.");
  if (d > a) {
    add("depth", "Depth must not be more than the rim radius: the bowl would be deeper than a hemisphere.");
    return;
  }
  if (t <= MIN_GLASS_UNDER_INTERIOR_MM) {
    add(
      "wallThickness",
      "Wall thickness must be more than 5 mm (0.2 in), so that glass remains under the interior once the flat is ground.",
    );
  }
  if (!okSize(f)) return;
  const outer = capSphereRadius(a, d) + t;
  if (f >= outer) {
    add("flatRadius", "Flat radius is wider than the outside of the bowl.");
    return;
  }
  const flatCap = capHeightForBase(outer, f);
  if (t > MIN_GLASS_UNDER_INTERIOR_MM && t - flatCap < MIN_GLASS_UNDER_INTERIOR_MM) {
    add(
      "flatRadius",
      "Flat radius is too wide: grinding it would leave less than 5 mm (0.2 in) of glass under the interior.",
    );
  }
  const e = p.engravingDrop;
  const n = p.engravingCount;
  if (okSize(e) && typeof n === "number" && Number.isInteger(n) && n > 0 && e >= d + t - flatCap) {
    add(
      "engravingDrop",
      "Engraving drop is too far: engravings this far below the rim would sit below the bowl's curved outside.",
    );
  }
}, {
  // Run the cross-field checks even when another field is wrong, so every problem shows at once.
  when: (payload) => typeof payload.value === "object" && payload.value !== null,
});

type Add = (path: FontFieldName, message: string) => void;

function pedestalChecks(p: Partial<Record<keyof FontParameters, unknown>>, add: Add) {
  const { pedestalWidth: w, pedestalHollowWall: t, pedestalHeight: h, footBaseRadius: b } = p;
  if (okSize(w) && typeof t === "number" && t > 0 && 2 * t >= w)
    add("pedestalHollowWall", "Hollow pedestal wall is too thick: two walls would be wider than the pedestal.");
  if (okSize(w) && okSize(b) && typeof h === "number" && h > 0 && w < 2 * b)
    add("pedestalWidth", "Pedestal width must be at least the foot's base (twice the foot base radius): the foot would overhang it.");
}

/** The type the schema produces: the same as FontParameters. */
export type FontParametersInput = z.input<typeof fontParametersSchema>;
const _sameShape: FontParameters = {} as z.output<typeof fontParametersSchema>;
void _sameShape;

/**
 * A plausible cast glass font: a 560 mm bowl on a 250 mm solid foot on a wooden pedestal, rim at
 * about 960 mm. Invented; not a real commission.
 */
export const defaultFontParameters: FontParameters = {
  rimRadius: 280,
  depth: 150,
  wallThickness: 28,
  flatRadius: 110,
  footBaseRadius: 150,
  footTopRadius: 110,
  footHeight: 250,
  pedestalHeight: 550,
  ...fontParameterDefaults,
  glass: "low-iron",
  engravingCount: 3,
  engravingStartAngle: 90,
  engravingDrop: 45,
};
