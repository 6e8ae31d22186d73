import type { FontModel, FontPart, LengthUnit } from "@/models/font";

/** A point on the model in model millimetres: x, y across the floor, z up from the floor. */
export type PointMm = [x: number, y: number, z: number];

export interface ViewerPin {
  id: string;
  part: FontPart;
  point: PointMm;
  label: string;
}

export interface FontViewerProps {
  /** the form, worked out once by whoever shows it (modelFont, or the editor's evaluation) */
  model: FontModel;
  /** an older form drawn faintly behind, for comparing revisions */
  ghost?: FontModel | null;
  pins?: ViewerPin[];
  /** called when someone clicks or taps a point on the model (not at the end of a drag) */
  onPickPoint?: (part: FontPart, pointMm: PointMm) => void;
  /** called when someone chooses a pin from the list under the picture (e.g. to open its comment thread) */
  onPinSelect?: (pinId: string) => void;
  /** units for the text summary */
  units?: LengthUnit;
  initialSection?: boolean;
  initialWater?: boolean;
  /** accessible name of the picture; defaults to "3D view of the font" */
  label?: string;
  className?: string;
}
