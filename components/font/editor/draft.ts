/**
 * What the person has typed, field by field, in the units they chose, and how it becomes parameters.
 * Lengths converted from the other unit keep their exact millimetre value until the field is edited,
 * so switching units back and forth never drifts.
 */
import {
  fontFields,
  lengthFromMm,
  lengthToMm,
  type FontFieldName,
  type FontParameters,
  type LengthUnit,
} from "@/models/font";

export type Draft = Record<FontFieldName, string>;

export interface DraftState {
  unit: LengthUnit;
  text: Draft;
  /** exact mm behind a converted length, until the field is typed in */
  exactMm: Partial<Record<FontFieldName, number>>;
}

const isLength = (name: FontFieldName) => fontFields.find((f) => f.name === name)?.kind === "length";

/** Plain digits for an input: no grouping, at most `digits` decimals, no trailing zeros. */
export function plainNumber(n: number, digits: number): string {
  return String(Number(n.toFixed(digits)));
}

const lengthText = (mm: number, unit: LengthUnit) => plainNumber(lengthFromMm(mm, unit), unit === "in" ? 3 : 1);

export function draftFromParams(p: FontParameters, unit: LengthUnit): DraftState {
  const text = {} as Draft;
  const exactMm: DraftState["exactMm"] = {};
  for (const f of fontFields) {
    const v = p[f.name];
    if (f.kind === "length") {
      text[f.name] = lengthText(v as number, unit);
      exactMm[f.name] = v as number;
    } else text[f.name] = String(v);
  }
  return { unit, text, exactMm };
}

/**
 * Why a typed number cannot be read without guessing, or null. Figures print with a comma between
 * thousands ("1,524 mm"), so "1,200" could mean 1200 or 1.2: refused. A comma followed by one, two or
 * four or more digits cannot be a thousands separator and is read as a decimal comma; a number with
 * both a comma and a point is refused rather than read in either convention.
 */
export function typedNumberProblem(label: string, s: string): string | null {
  const t = s.trim();
  if (!t.includes(",")) return null;
  if (t.includes("."))
    return `${label}: "${t}" mixes a comma and a point. Type the number with a point for decimals and no commas, e.g. 1200.5.`;
  if (/^[-+]?\d{1,3}(,\d{3})+$/.test(t))
    return `${label}: "${t}" could mean ${t.replace(/,/g, "")} or ${t.replace(",", ".")}. Type it without the comma (${t.replace(/,/g, "")}) or with a point (${t.replace(",", ".")}).`;
  return null;
}

/** A typed number, accepting a decimal comma; text that is not a number, or is ambiguous, is passed on as text. */
export function parseTyped(s: string): number | string | undefined {
  const t = s.trim();
  if (t === "") return undefined;
  if (typedNumberProblem("", t)) return t;
  const normal = t.replace(",", ".");
  const n = Number(normal);
  return Number.isFinite(n) && /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normal) ? n : t;
}

/** The typed numbers that cannot be read without guessing, by field, with a message naming each. */
export function draftProblems(d: DraftState): Partial<Record<FontFieldName, string[]>> {
  const out: Partial<Record<FontFieldName, string[]>> = {};
  for (const f of fontFields) {
    if (f.kind === "glass" || f.kind === "choice" || f.kind === "flag" || d.exactMm[f.name] !== undefined) continue;
    const problem = typedNumberProblem(f.label, d.text[f.name]);
    if (problem) out[f.name] = [problem];
  }
  return out;
}

/** The values to validate, in millimetres and degrees. */
export function candidateFromDraft(d: DraftState): Record<FontFieldName, unknown> {
  const out = {} as Record<FontFieldName, unknown>;
  for (const f of fontFields) {
    if (f.kind === "glass" || f.kind === "choice") {
      out[f.name] = d.text[f.name];
      continue;
    }
    if (f.kind === "flag") {
      out[f.name] = d.text[f.name] === "true";
      continue;
    }
    const exact = d.exactMm[f.name];
    if (exact !== undefined) {
      out[f.name] = exact;
      continue;
    }
    const v = parseTyped(d.text[f.name]);
    out[f.name] = typeof v === "number" && f.kind === "length" ? lengthToMm(v, d.unit) : v;
  }
  return out;
}

export function editField(d: DraftState, name: FontFieldName, value: string): DraftState {
  const exactMm = { ...d.exactMm };
  delete exactMm[name];
  return { ...d, text: { ...d.text, [name]: value }, exactMm };
}

export function switchUnit(d: DraftState, unit: LengthUnit): DraftState {
  if (unit === d.unit) return d;
  const text = { ...d.text };
  const exactMm = { ...d.exactMm };
  for (const f of fontFields) {
    if (!isLength(f.name)) continue;
    const typed = parseTyped(d.text[f.name]);
    const mm = d.exactMm[f.name] ?? (typeof typed === "number" ? lengthToMm(typed, d.unit) : undefined);
    if (mm === undefined) continue; // leave unparseable text for the person to fix
    text[f.name] = lengthText(mm, unit);
    exactMm[f.name] = mm;
  }
  return { unit, text, exactMm };
}
