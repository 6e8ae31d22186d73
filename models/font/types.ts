import type { GlassKind } from "./materials";

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
  pedestalHeight: number;
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
>;

export type FontFieldName = keyof FontParameters;

/** Field errors as z.flattenError gives them: field name → messages. */
export type FontFieldErrors = Partial<Record<FontFieldName, string[]>>;
