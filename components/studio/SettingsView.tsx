import {
  coldWorkedSurfaceLabel,
  coldWorkedSurfaces,
  formatNumber,
  gritLabel,
  mmToIn,
  type StudioSettings,
} from "@/models/font";

const both = (mm: number, mmDigits: number, inDigits: number) =>
  `${formatNumber(mm, mmDigits)} mm (${formatNumber(mmToIn(mm), inDigits)} in)`;

/** The studio's settings to read, for staff who do not change them. */
export function SettingsView({ settings: s }: { settings: StudioSettings }) {
  return (
    <div className="grid gap-4" data-testid="studio-settings-view">
      <section aria-labelledby="v-machines" className="rounded-lg border border-line bg-card p-4">
        <h3 id="v-machines" className="mb-2 font-serif text-xl font-semibold">Machines</h3>
        <ul className="divide-y divide-line">
          {s.machines.map((m) => (
            <li key={m.id} className="py-2">
              <p className="font-medium">{m.name}</p>
              <p className="text-sm text-ink-soft">Downfeed {both(m.downfeedPerTurnMm, 3, 4)} per full turn of the handwheel</p>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="v-sets" className="grid gap-3">
        <h3 id="v-sets" className="font-serif text-xl font-semibold">Abrasive sets</h3>
        {s.abrasiveSets.map((a) => (
          <div key={a.id} className="rounded-lg border border-line bg-card p-4">
            <h4 className="mb-2 font-semibold">{a.name}</h4>
            <ol className="grid gap-1 text-sm">
              {a.stages.map((st, i) => (
                <li key={i} className="grid grid-cols-[2rem_6rem_minmax(0,1fr)] gap-2">
                  <span className="text-ink-soft">{i + 1}.</span>
                  <span>{st.kind === "grind" ? "Grinding" : "Polishing"}</span>
                  <span><span className="font-medium">{gritLabel(st)}</span>{st.abrasive ? `, ${st.abrasive}` : ""}</span>
                </li>
              ))}
            </ol>
          </div>
        ))}
      </section>
      <section aria-labelledby="v-stock" className="rounded-lg border border-line bg-card p-4">
        <h3 id="v-stock" className="mb-2 font-serif text-xl font-semibold">Stock usually left to remove</h3>
        <dl className="grid gap-1 text-sm">
          {coldWorkedSurfaces.map((k) => (
            <div key={k} className="grid grid-cols-[minmax(0,1fr)_auto] gap-3">
              <dt>{coldWorkedSurfaceLabel[k]}</dt>
              <dd className="tabular-nums">{both(s.defaultStockMm[k], 2, 3)}</dd>
            </div>
          ))}
        </dl>
      </section>
    </div>
  );
}
