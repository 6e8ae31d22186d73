/**
 * The studio settings as the owner is typing them: text per field, lengths in the chosen unit. A length
 * keeps its exact millimetre value until it is typed in, so switching units never drifts.
 */
import {
  coldWorkedSurfaces,
  lengthFromMm,
  lengthToMm,
  type ColdWorkedSurface,
  type LengthUnit,
  type StudioSettings,
} from "@/models/font";
import { parseTyped, plainNumber } from "@/components/font/editor/draft";

export interface LengthEntry {
  text: string;
  /** exact millimetres behind the text, until the person types in the field */
  exactMm?: number;
}

export interface MachineDraft { key: string; id: string; name: string; downfeed: LengthEntry }
export interface StageDraft { key: string; kind: "grind" | "polish"; grit: string; gritScale: string; abrasive: string }
export interface SetDraft { key: string; id: string; name: string; stages: StageDraft[] }

export interface SettingsDraft {
  unit: LengthUnit;
  machines: MachineDraft[];
  abrasiveSets: SetDraft[];
  stock: Record<ColdWorkedSurface, LengthEntry>;
}

let counter = 0;
/** A key for React lists and an id for new items; unique within the page. */
export const newKey = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${(counter++).toString(36)}`;

const digits = { downfeed: { mm: 3, in: 4 }, stock: { mm: 2, in: 3 } } as const;
type LengthKind = keyof typeof digits;

export function entryFromMm(mm: number, unit: LengthUnit, kind: LengthKind): LengthEntry {
  return { text: plainNumber(lengthFromMm(mm, unit), digits[kind][unit]), exactMm: mm };
}

/** The millimetres an entry stands for, or null while its text is not a number. */
export function entryMm(e: LengthEntry, unit: LengthUnit): number | null {
  if (e.exactMm !== undefined) return e.exactMm;
  const v = parseTyped(e.text);
  return typeof v === "number" ? lengthToMm(v, unit) : null;
}

export const typed = (text: string): LengthEntry => ({ text });

export function draftFromSettings(s: StudioSettings, unit: LengthUnit): SettingsDraft {
  return {
    unit,
    machines: s.machines.map((m) => ({ key: newKey("m"), id: m.id, name: m.name, downfeed: entryFromMm(m.downfeedPerTurnMm, unit, "downfeed") })),
    abrasiveSets: s.abrasiveSets.map((a) => ({
      key: newKey("a"),
      id: a.id,
      name: a.name,
      stages: a.stages.map((st) => ({ key: newKey("s"), kind: st.kind, grit: String(st.grit), gritScale: st.gritScale, abrasive: st.abrasive ?? "" })),
    })),
    stock: Object.fromEntries(
      coldWorkedSurfaces.map((k) => [k, entryFromMm(s.defaultStockMm[k], unit, "stock")]),
    ) as Record<ColdWorkedSurface, LengthEntry>,
  };
}

function convert(e: LengthEntry, from: LengthUnit, to: LengthUnit, kind: LengthKind): LengthEntry {
  const mm = entryMm(e, from);
  return mm === null ? e : entryFromMm(mm, to, kind); // unparseable text stays for the person to fix
}

export function switchUnit(d: SettingsDraft, unit: LengthUnit): SettingsDraft {
  if (unit === d.unit) return d;
  return {
    ...d,
    unit,
    machines: d.machines.map((m) => ({ ...m, downfeed: convert(m.downfeed, d.unit, unit, "downfeed") })),
    stock: Object.fromEntries(
      coldWorkedSurfaces.map((k) => [k, convert(d.stock[k], d.unit, unit, "stock")]),
    ) as Record<ColdWorkedSurface, LengthEntry>,
  };
}

/** A length for the server: millimetres when the text is a number, otherwise the text for the server to refuse. */
function lengthOut(e: LengthEntry, unit: LengthUnit): number | string | undefined {
  const mm = entryMm(e, unit);
  return mm ?? parseTyped(e.text);
}

/** What is sent to the server, in millimetres; the server checks every value. */
export function payloadFromDraft(d: SettingsDraft): unknown {
  return {
    machines: d.machines.map((m) => ({ id: m.id, name: m.name, downfeedPerTurnMm: lengthOut(m.downfeed, d.unit) })),
    abrasiveSets: d.abrasiveSets.map((a) => ({
      id: a.id,
      name: a.name,
      stages: a.stages.map((st) => ({
        kind: st.kind,
        grit: parseTyped(st.grit),
        gritScale: st.gritScale,
        ...(st.abrasive.trim() ? { abrasive: st.abrasive } : {}),
      })),
    })),
    defaultStockMm: Object.fromEntries(coldWorkedSurfaces.map((k) => [k, lengthOut(d.stock[k], d.unit)])),
  };
}

/** Moves item i of a list by one place up (-1) or down (+1). */
export function move<T>(list: T[], i: number, by: -1 | 1): T[] {
  const j = i + by;
  if (j < 0 || j >= list.length) return list;
  const out = list.slice();
  [out[i], out[j]] = [out[j], out[i]];
  return out;
}
