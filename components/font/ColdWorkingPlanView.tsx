import {
  formatAngle,
  formatArea,
  formatLength,
  formatNumber,
  mmToIn,
  type ColdWorkingPlan,
  type ColdWorkingResult,
  type LengthUnit,
} from "@/models/font";

export interface ColdWorkingPlanViewProps {
  plan: ColdWorkingResult;
  units: LengthUnit;
  className?: string;
}

type Part = { plan: ColdWorkingPlan; units: LengthUnit };

function HeaderRow({ titles }: { titles: string[] }) {
  return (
    <thead>
      <tr className="border-b border-line text-ink-soft">
        {titles.map((t, i) => (
          <th key={t} scope="col" className={`py-2 font-medium ${i < titles.length - 1 ? "pr-3" : ""}`}>
            {t}
          </th>
        ))}
      </tr>
    </thead>
  );
}

function Problems({ plan, className }: { plan: Extract<ColdWorkingResult, { ok: false }>; className: string }) {
  return (
    <div
      className={`rounded-lg border border-danger bg-danger-soft p-4 text-sm text-danger ${className}`}
      role="status"
    >
      <p className="font-semibold">The cold-working plan cannot be made yet:</p>
      <ul className="mt-1 list-disc pl-5">
        {plan.problems.map((p, i) => (
          <li key={i}>{p.message}</li>
        ))}
      </ul>
    </div>
  );
}

function SurfacesTable({ plan, units }: Part) {
  const L = (mm: number) => formatLength(mm, units);
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Worked surfaces</caption>
        <HeaderRow titles={["Surface", "Area", "Stock to remove", "Handwheel turns"]} />
        <tbody>
          {plan.surfaces.map((s) => (
            <tr key={s.surface} className="border-b border-line last:border-b-0">
              <th scope="row" className="py-2 pr-3 font-medium text-ink">
                {s.label}
              </th>
              <td className="py-2 pr-3 whitespace-nowrap tabular-nums">{formatArea(s.areaCm2, units)}</td>
              <td className="py-2 pr-3 tabular-nums">
                {L(s.stockMm)}
                {s.formMm > 0 && (
                  <span className="block text-xs text-ink-soft">
                    {L(s.allowanceMm)} allowance + {L(s.formMm)} ground off to make the flat
                  </span>
                )}
              </td>
              <td className="py-2 whitespace-nowrap tabular-nums">{formatNumber(s.handwheelTurns, 2)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function StageList({ plan }: { plan: ColdWorkingPlan }) {
  return (
    <div>
      <h4 className="mb-1 font-serif text-base font-semibold">Stages for each surface, in order</h4>
      <ol className="list-decimal space-y-0.5 pl-6">
        {(plan.surfaces[0]?.stages ?? []).map((st) => (
          <li key={st.order}>
            {st.kind === "grind" ? "Grind" : "Polish"} with {st.label}
            {st.abrasive ? <span className="text-ink-soft"> ({st.abrasive})</span> : null}
          </li>
        ))}
      </ol>
    </div>
  );
}

function MarkingOut({ plan, units }: Part) {
  const L = (mm: number) => formatLength(mm, units);
  if (plan.engravingMarks.length === 0) return <p className="text-ink-soft">No engravings to mark out.</p>;
  return (
    <>
      <p className="mb-2 text-ink-soft">
        Measure from the datum mark along the outer edge of the rim (circumference {L(plan.rimCircumferenceMm)}),
        anticlockwise seen from above, then drop down the outside.
      </p>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Engraving marks</caption>
        <HeaderRow titles={["Mark", "Angle", "Along the rim", "Below the rim"]} />
        <tbody>
          {plan.engravingMarks.map((m) => (
            <tr key={m.index} className="border-b border-line tabular-nums last:border-b-0">
              <th scope="row" className="py-2 pr-3 font-medium">
                {m.index + 1}
              </th>
              <td className="py-2 pr-3">{formatAngle(m.angleDeg)}</td>
              <td className="py-2 pr-3">{L(m.arcFromDatumMm)}</td>
              <td className="py-2">{L(m.dropBelowRimMm)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}

/** The cold-working plan: surfaces with stock and handwheel turns, the abrasive stages, the marking-out list. */
export function ColdWorkingPlanView({ plan, units, className = "" }: ColdWorkingPlanViewProps) {
  if (!plan.ok) return <Problems plan={plan} className={className} />;
  const turn = plan.machine.downfeedPerTurnMm;
  return (
    <section className={`grid gap-4 font-sans text-sm ${className}`} data-testid="cold-working-plan">
      <p className="text-ink-soft">
        Machine: {plan.machine.name}. One full turn of its handwheel lowers the head {formatNumber(turn, 3)} mm (
        {formatNumber(mmToIn(turn), 3)} in). Abrasives: {plan.abrasiveSet.name}.
      </p>
      <SurfacesTable plan={plan} units={units} />
      <StageList plan={plan} />
      <div>
        <h4 className="mb-1 font-serif text-base font-semibold">Marking out the engravings</h4>
        <MarkingOut plan={plan} units={units} />
      </div>
      {plan.notes.map((n, i) => (
        <p key={i} className="text-ink-soft">
          {n}
        </p>
      ))}
    </section>
  );
}
