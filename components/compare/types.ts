import type { FontFigures, FontParameters } from "@/models/font";

/** One side of a comparison: only what the page shows. */
export interface CompareSide {
  number: number;
  state: string;
  stateLabel: string;
  contentHash: string | null;
  circulatedAt: string | null;
  params: FontParameters | Record<string, unknown>;
  /** null when the parameters do not make a valid font (a draft being worked on) */
  validParams: FontParameters | null;
  figures: FontFigures | null;
  attachments: { id: number; sha256: string; name: string; kind: string; url: string }[];
}
