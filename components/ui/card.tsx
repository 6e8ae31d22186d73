import type { ReactNode } from "react";

export function Card({ title, children, className = "", action }: { title?: ReactNode; children: ReactNode; className?: string; action?: ReactNode }) {
  return (
    <section className={`rounded-lg border border-line bg-card p-4 shadow-sm sm:p-5 ${className}`}>
      {(title || action) && (
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
          {title && <h2 className="text-xl font-semibold">{title}</h2>}
          {action}
        </div>
      )}
      {children}
    </section>
  );
}

export function Badge({ children, tone = "neutral" }: { children: ReactNode; tone?: "neutral" | "record" | "ok" | "danger" | "action" }) {
  const tones = {
    neutral: "bg-paper-deep text-ink",
    record: "bg-record-soft text-record",
    ok: "bg-ok-soft text-ok",
    danger: "bg-danger-soft text-danger",
    action: "bg-action text-action-ink",
  };
  return <span className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold tracking-wide ${tones[tone]}`}>{children}</span>;
}

export function HashText({ hash, short = true }: { hash: string; short?: boolean }) {
  return (
    <code className="rounded bg-record-soft px-1.5 py-0.5 font-mono text-sm text-record" title={hash}>
      {short ? `${hash.slice(0, 12)}…` : hash}
    </code>
  );
}
