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
      <legend className="text-ink mb-2 text-sm font-medium">Enter sizes in</legend>
      <div className="border-line bg-card inline-flex rounded-md border p-1">
        {(["mm", "in"] as const).map((u) => (
          <label
            key={u}
            className={`flex min-h-11 min-w-28 cursor-pointer items-center justify-center rounded px-3 text-sm font-medium ${
              unit === u ? "bg-action text-action-ink" : "text-action"
            } has-[:focus-visible]:outline-action has-[:focus-visible]:outline has-[:focus-visible]:outline-3`}
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
