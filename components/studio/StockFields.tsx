"use client";
import { coldWorkedSurfaceLabel, coldWorkedSurfaces, type ColdWorkedSurface, type LengthUnit } from "@/models/font";
import { typed, type LengthEntry } from "./draft";
import { Input } from "./Input";

interface Props {
  stock: Record<ColdWorkedSurface, LengthEntry>;
  unit: LengthUnit;
  errors: Record<string, string>;
  onChange: (stock: Record<ColdWorkedSurface, LengthEntry>) => void;
}

export function StockFields({ stock, unit, errors, onChange }: Props) {
  return (
    <section aria-labelledby="stock-h" className="rounded-lg border border-line bg-card p-4">
      <h3 id="stock-h" className="font-serif text-xl font-semibold">Stock usually left to remove</h3>
      <p className="mb-3 text-sm text-ink-soft">Glass left on each worked surface after casting, ground away to the finished size.</p>
      <div className="grid gap-x-4 sm:grid-cols-2">
        {coldWorkedSurfaces.map((k) => (
          <Input key={k} id={`defaultStockMm.${k}`} label={coldWorkedSurfaceLabel[k]} inputMode="decimal" suffix={unit}
            value={stock[k].text} onChange={(text) => onChange({ ...stock, [k]: typed(text) })} error={errors[`defaultStockMm.${k}`]} />
        ))}
      </div>
    </section>
  );
}
