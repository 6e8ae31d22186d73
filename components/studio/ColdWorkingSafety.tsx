/** The safety caution for the studio's cold-working settings, in plain words. */
export function ColdWorkingSafety() {
  return (
    <aside className="rounded-lg border border-record bg-record-soft p-4 text-sm" aria-label="Safety in the cold shop" data-testid="cold-working-caution">
      <h2 className="mb-1 font-serif text-base font-semibold">Safety in the cold shop</h2>
      <p>
        Grind and polish glass wet, to keep the dust down; wear eye protection at every machine; and lift cast pieces
        safely, with enough people or a lifting aid for the weight. The settings here plan the work; they do not make it safe.
      </p>
    </aside>
  );
}
