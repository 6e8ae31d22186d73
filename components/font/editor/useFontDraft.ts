"use client";

import { useEffect, useRef, useState } from "react";
import { evaluateFont, type FontEvaluation, type FontModel, type FontParameters, type LengthUnit } from "@/models/font";
import { candidateFromDraft, draftFromParams, draftProblems, type DraftState } from "./draft";

export interface FontDraft {
  draft: DraftState;
  /** the latest entry, evaluated once when it changed */
  evaluation: FontEvaluation;
  /** the last entry that made a valid font: what the picture, figures and plan show */
  lastValid: FontModel | null;
  update: (change: (d: DraftState) => DraftState) => void;
}

function evaluated(draft: DraftState, before: FontModel | null) {
  const ev = evaluateFont(candidateFromDraft(draft));
  const problems = draftProblems(draft);
  // An ambiguous number is refused with its own message, never guessed at.
  const evaluation: FontEvaluation = Object.keys(problems).length
    ? { ok: false, fieldErrors: { ...(ev.ok ? {} : ev.fieldErrors), ...problems }, formErrors: ev.ok ? [] : ev.formErrors }
    : ev;
  return { draft, evaluation, lastValid: evaluation.ok ? evaluation : before };
}

/** The entry and its one evaluation per change; every view of the font reads the result. */
export function useFontDraft(initialParams: FontParameters, initialUnits: LengthUnit): FontDraft {
  const [state, setState] = useState(() => evaluated(draftFromParams(initialParams, initialUnits), null));
  const update = (change: (d: DraftState) => DraftState) => setState((s) => evaluated(change(s.draft), s.lastValid));
  return { ...state, update };
}

/** Tell the caller after every change, without re-running when only the callback's identity changes. */
export function useReportChange(
  onChange: ((params: FontParameters, valid: boolean) => void) | undefined,
  params: FontParameters,
  valid: boolean,
) {
  const onChangeRef = useRef(onChange);
  useEffect(() => {
    onChangeRef.current = onChange;
  });
  useEffect(() => {
    onChangeRef.current?.(params, valid);
  }, [params, valid]);
}
