"use client";
import { useMemo, useState } from "react";
import { formatList, modelFont, type LengthUnit } from "@/models/font";
import { FontCautions, FontViewer } from "@/components/font";
import { UnitsToggle } from "@/components/revision/UnitsToggle";
import { CopyHash } from "@/components/copy-hash";
import { figureRows, parameterRows } from "./diff";
import { CompareTable } from "./CompareTable";
import { AttachmentChanges } from "./AttachmentChanges";
import type { CompareSide } from "./types";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });

function HashLine({ side, role }: { side: CompareSide; role: "older" | "newer" }) {
  return (
    <li className="flex flex-wrap items-center gap-x-2 text-sm" data-testid={`content-hash-${role}`} data-hash={side.contentHash ?? ""}>
      <span className="font-medium">Revision {side.number}</span>
      <span className="text-ink-soft">{side.stateLabel}{side.circulatedAt ? `, circulated ${when.format(new Date(side.circulatedAt))}` : ""}</span>
      {side.contentHash ? <CopyHash hash={side.contentHash} label={`content hash of Revision ${side.number}`} /> : <span className="text-ink-soft">· no content hash until it is circulated</span>}
    </li>
  );
}

function summary(changed: number, parameters: string[]): string {
  if (changed === 0) return "No values changed.";
  const count = changed === 1 ? "One value changed" : `${changed} values changed`;
  if (!parameters.length) return `${count}.`;
  return `${count}, from ${parameters.length === 1 ? "one parameter" : `${parameters.length} parameters`}: ${formatList(parameters)}.`;
}

/** Two revisions side by side: what changed, in words and in the 3D view. */
export function CompareView({ older, newer, initialUnits }: { older: CompareSide; newer: CompareSide; initialUnits: LengthUnit }) {
  const [units, setUnits] = useState<LengthUnit>(initialUnits);
  const [onlyChanges, setOnlyChanges] = useState(false);
  const params = useMemo(() => parameterRows(older.params, newer.params, units), [older, newer, units]);
  const figures = useMemo(() => figureRows(older.figures, newer.figures, units), [older, newer, units]);
  // Each form worked out once, with the figures the server sent.
  const newerModel = useMemo(() => (newer.validParams ? modelFont(newer.validParams, newer.figures) : null), [newer]);
  const olderModel = useMemo(() => (older.validParams ? modelFont(older.validParams, older.figures) : null), [older]);
  const changed = params.filter((r) => r.change).length + figures.filter((r) => r.change).length;
  const o = `Revision ${older.number}`;
  const n = `Revision ${newer.number}`;

  return (
    <article className="grid gap-5" data-testid="compare-view">
      <header className="grid gap-2">
        <h2 className="font-serif text-3xl font-semibold">{n} against {o}</h2>
        <ul className="grid gap-1" aria-label="Content hashes">
          <HashLine side={older} role="older" />
          <HashLine side={newer} role="newer" />
        </ul>
      </header>

      <div className="z-10 sm:sticky sm:top-0 -mx-1 flex flex-wrap items-center justify-between gap-3 bg-paper/95 px-1 py-2">
        <p className="text-sm" role="status" data-testid="change-count">
          {summary(changed, params.filter((r) => r.change).map((r) => r.label))}
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <label className="flex min-h-11 items-center gap-2 text-sm">
            <input type="checkbox" className="size-5" checked={onlyChanges} onChange={(e) => setOnlyChanges(e.target.checked)} />
            Only what changed
          </label>
          <UnitsToggle units={units} onChange={setUnits} />
        </div>
      </div>

      <CompareTable caption="Parameters" rows={params} olderLabel={o} newerLabel={n} onlyChanges={onlyChanges} testId="compare-parameters" />
      <section aria-labelledby="model-h" className="grid gap-2">
        <h3 id="model-h" className="font-serif text-2xl font-semibold">The two forms</h3>
        {newerModel ? (
          <>
            <FontViewer model={newerModel} ghost={olderModel} units={units}
              label={`3D view of ${n}, with ${o} drawn faintly behind it`} />
            <p className="text-sm text-ink-soft">{n} is drawn solid; {older.validParams ? `${o} is the faint outline behind it.` : `${o} cannot be drawn: its values do not make a valid font.`}</p>
          </>
        ) : (
          <p className="text-danger">{n}&apos;s values do not make a valid font yet, so it cannot be drawn.</p>
        )}
      </section>

      <CompareTable caption="Figures" rows={figures} olderLabel={o} newerLabel={n} onlyChanges={onlyChanges} testId="compare-figures" />
      <AttachmentChanges older={older} newer={newer} />
      <FontCautions />
    </article>
  );
}
