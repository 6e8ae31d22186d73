import { pedestalMaterialKeys, pedestalMaterials } from "./pedestal";
import type { FontFieldName } from "./types";

export type FontFieldKind = "length" | "angle" | "count" | "glass" | "choice" | "flag";

export interface FontFieldInfo {
  name: FontFieldName;
  label: string;
  kind: FontFieldKind;
  group: "bowl" | "foot" | "pedestal" | "water" | "glass" | "engravings";
  hint: string;
  /** for a choice: the values and their labels */
  options?: readonly { value: string; label: string }[];
}

const materialOptions = pedestalMaterialKeys.map((k) => ({ value: k, label: pedestalMaterials[k].label }));

/** The fields in the order a designer fills them in, with plain labels. */
export const fontFields: readonly FontFieldInfo[] = [
  { name: "rimRadius", label: "Rim radius", kind: "length", group: "bowl", hint: "Inside radius at the rim" },
  { name: "depth", label: "Depth", kind: "length", group: "bowl", hint: "Inside depth, rim to lowest point" },
  { name: "wallThickness", label: "Wall thickness", kind: "length", group: "bowl", hint: "Glass between inside and outside" },
  { name: "flatRadius", label: "Flat radius", kind: "length", group: "bowl", hint: "Ground flat under the bowl, for lamination" },
  { name: "footBaseRadius", label: "Foot base radius", kind: "length", group: "foot", hint: "Where the foot stands on the pedestal" },
  { name: "footTopRadius", label: "Foot top radius", kind: "length", group: "foot", hint: "Where the bowl's flat sits" },
  { name: "footHeight", label: "Foot height", kind: "length", group: "foot", hint: "Solid glass foot, base to top" },
  { name: "pedestalHeight", label: "Pedestal height", kind: "length", group: "pedestal", hint: "Floor to the top of the pedestal; 0 when the foot stands on the floor" },
  { name: "pedestalShape", label: "Pedestal shape", kind: "choice", group: "pedestal", hint: "Its footprint on the floor",
    options: [{ value: "round", label: "Round" }, { value: "square", label: "Square" }] },
  { name: "pedestalWidth", label: "Pedestal width", kind: "length", group: "pedestal", hint: "Diameter when round, side when square" },
  { name: "pedestalMaterial", label: "Pedestal material", kind: "choice", group: "pedestal", hint: "Sets the pedestal's weight", options: materialOptions },
  { name: "pedestalHollowWall", label: "Hollow pedestal wall", kind: "length", group: "pedestal", hint: "Wall thickness of a hollow pedestal; 0 when solid" },
  { name: "glassFixedToPedestal", label: "Glass fixed to the pedestal", kind: "flag", group: "pedestal", hint: "Fixed so it cannot lift off" },
  { name: "pedestalFixedToFloor", label: "Pedestal fixed to the floor", kind: "flag", group: "pedestal", hint: "Anchored to the floor (or the foot, with no pedestal)" },
  { name: "workingDepthBelowRim", label: "Water level below the rim", kind: "length", group: "water", hint: "Where the water usually stands; 0 to the brim" },
  { name: "glass", label: "Glass", kind: "glass", group: "glass", hint: "Sets the density used for the weights" },
  { name: "engravingCount", label: "Number of engravings", kind: "count", group: "engravings", hint: "0 to 12, spaced evenly round the bowl" },
  { name: "engravingStartAngle", label: "Start angle", kind: "angle", group: "engravings", hint: "Angle of the first engraving from the datum mark" },
  { name: "engravingDrop", label: "Engraving drop", kind: "length", group: "engravings", hint: "How far below the rim the engravings' centres sit" },
];

export const fontFieldLabel = Object.fromEntries(fontFields.map((f) => [f.name, f.label])) as Record<
  FontFieldName,
  string
>;

export const fontFieldNames = fontFields.map((f) => f.name);
