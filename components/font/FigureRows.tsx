import type { ReactNode } from "react";

/** One figure: what it is, its value, and how it was found. */
export function Row({ label, value, basis, testId }: { label: string; value: ReactNode; basis: string; testId?: string }) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 border-b border-line py-2 last:border-b-0" data-testid={testId}>
      <dt className="text-ink">{label}</dt>
      <dd className="text-right font-semibold tabular-nums text-ink">{value}</dd>
      <dd className="col-span-2 text-xs text-ink-soft">{basis}</dd>
    </div>
  );
}

export function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="rounded-lg border border-line bg-card p-4">
      <h3 className="mb-1 font-serif text-lg font-semibold">{title}</h3>
      <dl className="text-sm">{children}</dl>
    </section>
  );
}
