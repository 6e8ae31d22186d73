import type { InputHTMLAttributes, ReactNode } from "react";

const control =
  "block w-full min-h-11 rounded-md border border-line bg-card px-3 py-2 text-base text-ink aria-[invalid=true]:border-danger";

interface InputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "onChange" | "id"> {
  /** the field's path in the settings, e.g. "machines.0.downfeedPerTurnMm"; also its element id */
  id: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: ReactNode;
  suffix?: string;
}

/** One entry with its label, an optional unit after it, and its error right beside it. */
export function Input({ id, label, value, onChange, error, hint, suffix, className = "", ...rest }: InputProps) {
  const describedBy = [hint ? `${id}-hint` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`mb-3 min-w-0 ${className}`}>
      <label htmlFor={id} className="block text-sm font-medium text-ink">{label}</label>
      <div className="mt-1 flex items-center gap-2">
        <input id={id} value={value} onChange={(e) => onChange(e.target.value)} aria-invalid={error ? true : undefined}
          aria-describedby={describedBy} autoComplete="off" spellCheck={false} className={control} {...rest} />
        {suffix && <span className="shrink-0 text-sm text-ink-soft">{suffix}</span>}
      </div>
      {hint && <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">{hint}</p>}
      {error && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-medium text-danger" data-testid={`error-${id}`}>{error}</p>
      )}
    </div>
  );
}

/** A message for a whole list (e.g. "Add at least one machine."). */
export function ListError({ id, error }: { id: string; error?: string }) {
  if (!error) return null;
  return <p role="alert" className="mb-3 text-sm font-medium text-danger" data-testid={`error-${id}`}>{error}</p>;
}
