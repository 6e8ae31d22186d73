/** The cautions shown beside the font's figures, in plain words. */
export function FontCautions({ className = "" }: { className?: string }) {
  return (
    <aside
      className={`rounded-lg border border-record bg-record-soft p-4 font-sans text-sm text-ink ${className}`}
      aria-label="Cautions about these figures"
      data-testid="font-cautions"
    >
      <h3 className="mb-2 font-serif text-base font-semibold">Please read before relying on these figures</h3>
      <ul className="list-disc space-y-1 pl-5">
        <li>These figures are estimates for discussion. They are not engineering.</li>
        <li>
          The filled weight, the risk of tipping, the load on the floor, how the font is anchored, and the lamination of
          glass that carries load must be checked by a qualified structural engineer under the local building code.
        </li>
        <li>Cold-working glass needs wet grinding, eye protection and safe lifting.</li>
      </ul>
    </aside>
  );
}
