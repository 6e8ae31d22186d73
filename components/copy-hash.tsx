"use client";
import { useState } from "react";

/** A hash shown short, with a button that copies the whole of it. */
export function CopyHash({ hash, label = "hash" }: { hash: string; label?: string }) {
  const [copied, setCopied] = useState(false);
  return (
    <span className="inline-flex items-center gap-1">
      <code className="rounded bg-record-soft px-1.5 py-0.5 font-mono text-xs text-record" title={hash}>{hash.slice(0, 12)}…</code>
      <button type="button" aria-label={`Copy the full ${label}`} className="min-h-11 min-w-11 rounded px-2 text-xs text-action underline-offset-2 hover:underline"
        onClick={async () => {
          try { await navigator.clipboard.writeText(hash); setCopied(true); setTimeout(() => setCopied(false), 1500); } catch { /* clipboard refused */ }
        }}>
        {copied ? "Copied" : "Copy"}
      </button>
    </span>
  );
}
