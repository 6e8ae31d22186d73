import type { LengthUnit } from "@/models/font";

/** Millimetres or inches for every length field. */
export function UnitChoice({
  name,
  unit,
  onChange,
}: {
  name: string;
  unit: LengthUnit;
  onChange: (u: LengthUnit) => void;
}) {
  return (
    <fieldset className="mb-5">
      <legend className="mb-2 text-sm font-medium text-ink">Enter sizes in</legend>
      <div className="inline-flex rounded-md border border-line bg-card p-1">
        {(["mm", "in"] as const).map((u) => (
          <label
            key={u}
            className={`flex min-h-11 min-w-28 cursor-pointer items-center justify-center rounded px-3 text-sm font-medium ${
              unit === u ? "bg-action text-action-ink" : "text-action"
            } has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-action`}
          >
            <input
              type="radio"
              name={name}
              value={u}
              checked={unit === u}
              onChange={() => onChange(u)}
              className="sr-only"
            />
            {u === "mm" ? "Millimetres" : "Inches"}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
