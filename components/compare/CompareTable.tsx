import type { CompareRow } from "./diff";

interface Props {
  caption: string;
  rows: CompareRow[];
  olderLabel: string;
  newerLabel: string;
  onlyChanges: boolean;
  testId: string;
}

/**
 * Older, newer and the change, one row a value. On a phone each row stacks: the name on its own line,
 * then three short columns under it, so nothing scrolls sideways on a narrow screen; an unchanged value
 * takes a single dimmed line.
 */
export function CompareTable({ caption, rows, olderLabel, newerLabel, onlyChanges, testId }: Props) {
  const shown = onlyChanges ? rows.filter((r) => r.change) : rows;
  const hidden = rows.length - shown.length;
  return (
    <div className="rounded-lg border border-line bg-card">
      <table className="w-full border-collapse text-sm max-sm:block" data-testid={testId}>
        <caption className="px-4 pt-3 text-left font-serif text-xl font-semibold max-sm:block">{caption}</caption>
        <thead className="max-sm:sr-only">
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="px-4 py-2 font-medium">Value</th>
            <th scope="col" className="px-2 py-2 font-medium">{olderLabel}</th>
            <th scope="col" className="px-2 py-2 font-medium">{newerLabel}</th>
            <th scope="col" className="px-4 py-2 font-medium">Change</th>
          </tr>
        </thead>
        <tbody className="max-sm:block">
          {shown.map((r) => (r.change ? <ChangedRow key={r.key} r={r} o={olderLabel} n={newerLabel} /> : <SameRow key={r.key} r={r} />))}
          {shown.length === 0 && (
            <tr className="max-sm:block"><td colSpan={4} className="px-4 py-3 text-ink-soft max-sm:block">Nothing here changed.</td></tr>
          )}
        </tbody>
      </table>
      {hidden > 0 && <p className="px-4 pb-3 text-xs text-ink-soft">{hidden === 1 ? "One value" : `${hidden} values`} unchanged and hidden.</p>}
    </div>
  );
}

const cell = "py-2 align-top tabular-nums";

function ChangedRow({ r, o, n }: { r: CompareRow; o: string; n: string }) {
  return (
    <tr data-changed="yes" data-testid={`row-${r.key}`}
      className="border-b border-line last:border-b-0 max-sm:grid max-sm:grid-cols-3 max-sm:gap-x-2 max-sm:px-4 max-sm:py-2">
      <th scope="row" className="px-4 py-2 text-left align-top font-semibold text-ink max-sm:col-span-3 max-sm:p-0">{r.label}</th>
      <td className={`${cell} px-2 max-sm:p-0`}><span className="block text-xs text-ink-soft sm:hidden">{o}</span>{r.older}</td>
      <td className={`${cell} px-2 font-semibold max-sm:p-0`}><span className="block text-xs font-normal text-ink-soft sm:hidden">{n}</span>{r.newer}</td>
      <td className={`${cell} px-4 max-sm:p-0`}>
        <span className="block text-xs text-ink-soft sm:hidden">Change</span>
        <span className="inline-block rounded bg-record-soft px-1.5 font-semibold text-ink" data-testid="change">{r.change}</span>
      </td>
    </tr>
  );
}

function SameRow({ r }: { r: CompareRow }) {
  return (
    <tr data-changed="no" data-testid={`row-${r.key}`}
      className="border-b border-line text-ink-soft last:border-b-0 max-sm:flex max-sm:justify-between max-sm:gap-3 max-sm:px-4 max-sm:py-1.5">
      <th scope="row" className="px-4 py-2 text-left align-top font-normal max-sm:p-0">{r.label}</th>
      <td className={`${cell} px-2 max-sm:hidden`}>{r.older}</td>
      <td className={`${cell} px-2 max-sm:p-0 max-sm:text-right`}>{r.newer}<span className="sm:hidden"> · same</span></td>
      <td className={`${cell} px-4 max-sm:hidden`}>No change</td>
    </tr>
  );
}
