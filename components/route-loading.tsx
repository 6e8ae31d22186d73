export default function Loading() {
  return <p className="py-10 text-ink-soft" aria-live="polite">Loading…</p>;
}
