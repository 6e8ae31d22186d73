/**
 * Validate raw input and compute the figures in one call. Never throws: bad input comes back as
 * messages keyed by field (the shape z.flattenError gives).
 */
import { z } from "zod";
import { computeFontFigures, type FontFigures } from "./figures";
import { fontProfile, type FontProfile } from "./profile";
import { fontParameterDefaults, fontParametersSchema } from "./schema";
import type { FontFieldErrors, FontParameters } from "./types";

export type FontParseResult =
  { ok: true; params: FontParameters } | { ok: false; fieldErrors: FontFieldErrors; formErrors: string[] };

export function parseFontParameters(input: unknown): FontParseResult {
  const r = fontParametersSchema.safeParse(input);
  if (r.success) return { ok: true, params: r.data };
  const flat = z.flattenError(r.error);
  return { ok: false, fieldErrors: flat.fieldErrors as FontFieldErrors, formErrors: flat.formErrors };
}

/**
 * One font worked out once: its parameters, the lathe profile built from them and the figures
 * integrated from that profile. Views read this instead of going back to the parameters.
 */
export interface FontModel {
  params: FontParameters;
  profile: FontProfile;
  figures: FontFigures;
}

/**
 * The model of parameters that passed fontParametersSchema. Figures already worked out for the same
 * parameters (e.g. those a server stored with a revision) are used as they are.
 */
export function modelFont(params: FontParameters, figures?: FontFigures | null): FontModel {
  const full = withFontDefaults(params);
  const profile = fontProfile(full);
  // Figures stored before the stability figures existed keep their values; the missing ones are
  // worked out from the same (defaulted) parameters.
  const stored = figures && figures.rimLoadToTipKg === undefined ? { ...computeFontFigures(full, profile), ...figures } : figures;
  return { params: full, profile, figures: stored ?? computeFontFigures(full, profile) };
}

/** Parameters saved before newer fields existed, with those fields at their stated defaults. */
export function withFontDefaults(params: FontParameters): FontParameters {
  return { ...fontParameterDefaults, ...params };
}

export type FontEvaluation =
  ({ ok: true } & FontModel) | { ok: false; fieldErrors: FontFieldErrors; formErrors: string[] };

export function evaluateFont(input: unknown): FontEvaluation {
  const r = parseFontParameters(input);
  return r.ok ? { ok: true, ...modelFont(r.params) } : r;
}
