/**
 * Validate raw input and compute the figures in one call. Never throws: bad input comes back as
 * messages keyed by field (the shape z.flattenError gives).
 */
import { z } from "zod";
import { computeFontFigures, type FontFigures } from "./figures";
import { fontParametersSchema } from "./schema";
import type { FontFieldErrors, FontParameters } from "./types";

export type FontParseResult =
  | { ok: true; params: FontParameters }
  | { ok: false; fieldErrors: FontFieldErrors; formErrors: string[] };

export function parseFontParameters(input: unknown): FontParseResult {
  const r = fontParametersSchema.safeParse(input);
  if (r.success) return { ok: true, params: r.data };
  const flat = z.flattenError(r.error);
  return { ok: false, fieldErrors: flat.fieldErrors as FontFieldErrors, formErrors: flat.formErrors };
}

export type FontEvaluation =
  | { ok: true; params: FontParameters; figures: FontFigures }
  | { ok: false; fieldErrors: FontFieldErrors; formErrors: string[] };

export function evaluateFont(input: unknown): FontEvaluation {
  const r = parseFontParameters(input);
  return r.ok ? { ...r, figures: computeFontFigures(r.params) } : r;
}
