import type { GlassKind } from "./materials";
import type { PedestalMaterialKey, PedestalShape } from "./pedestal";

/** The parts a person can point at on the model. */
export type FontPart = "bowl" | "foot" | "pedestal";

/** All lengths in millimetres, angles in degrees. */
export interface FontParameters {
  rimRadius: number;
  depth: number;
  wallThickness: number;
  flatRadius: number;
  footBaseRadius: number;
  footTopRadius: number;
  footHeight: number;
  /** 0: the foot stands on the floor */
  pedestalHeight: number;
  pedestalShape: PedestalShape;
  /** diameter of a round pedestal, side of a square one */
  pedestalWidth: number;
  pedestalMaterial: PedestalMaterialKey;
  /** wall of a hollow pedestal; 0 = solid */
  pedestalHollowWall: number;
  glassFixedToPedestal: boolean;
  pedestalFixedToFloor: boolean;
  /** water level below the rim; 0 = to the brim */
  workingDepthBelowRim: number;
  glass: GlassKind;
  engravingCount: number;
  engravingStartAngle: number;
  engravingDrop: number;
}

/** The sizes the geometry needs (everything but the glass and the engravings). */
export type FontDimensions = Pick<
  FontParameters,
  | "rimRadius"
  | "depth"
  | "wallThickness"
  | "flatRadius"
  | "footBaseRadius"
  | "footTopRadius"
  | "footHeight"
  | "pedestalHeight"
  | "pedestalWidth"
  | "workingDepthBelowRim"
>;

export type FontFieldName = keyof FontParameters;

/** Field errors as z.flattenError gives them: field name → messages. */
export type FontFieldErrors = Partial<Record<FontFieldName, string[]>>;
