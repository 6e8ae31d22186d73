import { glassKinds, glassMaterials, type FontFieldInfo, type LengthUnit } from "@/models/font";

export interface FontFieldInputProps {
  field: FontFieldInfo;
  idPrefix: string;
  value: string;
  unit: LengthUnit;
  errors?: string[];
  readOnly?: boolean;
  onChange: (value: string) => void;
}

const control =
  "block w-full min-h-11 rounded-md border border-line bg-card px-3 py-2 text-base text-ink aria-[invalid=true]:border-danger read-only:bg-paper disabled:bg-paper";

const optionsFor = (field: FontFieldInfo) =>
  field.kind === "glass" ? glassKinds.map((k) => ({ value: k, label: glassMaterials[k].label })) : (field.options ?? []);

/** One parameter: its label, the entry, its unit, a hint, and its errors right beside it. */
export function FontFieldInput({ field, idPrefix, value, unit, errors, readOnly, onChange }: FontFieldInputProps) {
  const id = `${idPrefix}-${field.name}`;
  const hasError = !!errors && errors.length > 0;
  const describedBy = `${id}-hint${hasError ? ` ${id}-error` : ""}`;
  const suffix = field.kind === "length" ? unit : field.kind === "angle" ? "°" : null;

  return (
    <div className="mb-4">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {field.label}
      </label>
      <div className="mt-1 flex items-center gap-2">
        {field.kind === "flag" ? (
          <input
            id={id}
            name={field.name}
            type="checkbox"
            checked={value === "true"}
            disabled={readOnly}
            aria-invalid={hasError || undefined}
            aria-describedby={describedBy}
            onChange={(e) => onChange(e.target.checked ? "true" : "false")}
            className="h-6 w-6 accent-ink"
          />
        ) : field.kind === "glass" || field.kind === "choice" ? (
          <select
            id={id}
            name={field.name}
            value={value}
            disabled={readOnly}
            aria-invalid={hasError || undefined}
            aria-describedby={describedBy}
            onChange={(e) => onChange(e.target.value)}
            className={control}
          >
            {optionsFor(field).map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        ) : (
          <input
            id={id}
            name={field.name}
            type="text"
            inputMode={field.kind === "count" ? "numeric" : "decimal"}
            autoComplete="off"
            spellCheck={false}
            value={value}
            readOnly={readOnly}
            aria-invalid={hasError || undefined}
            aria-describedby={describedBy}
            onChange={(e) => onChange(e.target.value)}
            className={control}
          />
        )}
        {suffix && (
          <span className="w-8 shrink-0 text-sm text-ink-soft" aria-hidden="true">
            {suffix}
          </span>
        )}
      </div>
      <p id={`${id}-hint`} className="mt-1 text-xs text-ink-soft">
        {field.hint}
        {suffix === "mm" || suffix === "in" ? (
          <span className="sr-only"> (in {unit === "in" ? "inches" : "millimetres"})</span>
        ) : null}
      </p>
      {hasError && (
        <p id={`${id}-error`} className="mt-1 text-sm font-medium text-danger" data-testid={`error-${field.name}`}>
          {errors.join(" ")}
        </p>
      )}
    </div>
  );
}
