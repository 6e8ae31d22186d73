"use client";
import type { LengthUnit } from "@/models/font";

export function UnitsToggle({ units, onChange }: { units: LengthUnit; onChange: (u: LengthUnit) => void }) {
  return (
    <div role="group" aria-label="Units" className="inline-flex rounded-md border border-line bg-card p-0.5">
      {(["mm", "in"] as const).map((u) => (
        <button key={u} type="button" aria-pressed={units === u} onClick={() => onChange(u)}
          className={`min-h-11 min-w-16 rounded px-3 text-sm font-medium ${units === u ? "bg-action text-action-ink" : "text-ink-soft hover:text-ink"}`}>
          {u === "mm" ? "Millimetres" : "Inches"}
        </button>
      ))}
    </div>
  );
}
