import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";

const control = "mt-1 block w-full min-h-11 rounded-md border border-line bg-card px-3 py-2 text-base text-ink shadow-inner shadow-paper-deep/40 aria-[invalid=true]:border-danger";

interface Common { label: string; name: string; error?: string; hint?: ReactNode }

function Wrap({ label, name, error, hint, children }: Common & { children: ReactNode }) {
  return (
    <div className="mb-4">
      <label htmlFor={name} className="block text-sm font-medium text-ink">{label}</label>
      {children}
      {hint && !error && <p id={`${name}-hint`} className="mt-1 text-sm text-ink-soft">{hint}</p>}
      {error && <p id={`${name}-error`} role="alert" className="mt-1 text-sm font-medium text-danger">{error}</p>}
    </div>
  );
}

export function TextField({ label, name, error, hint, ...rest }: Common & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <Wrap label={label} name={name} error={error} hint={hint}>
      <input id={name} name={name} aria-invalid={error ? true : undefined} aria-describedby={error ? `${name}-error` : hint ? `${name}-hint` : undefined} className={control} {...rest} />
    </Wrap>
  );
}

export function TextArea({ label, name, error, hint, ...rest }: Common & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  return (
    <Wrap label={label} name={name} error={error} hint={hint}>
      <textarea id={name} name={name} aria-invalid={error ? true : undefined} aria-describedby={error ? `${name}-error` : undefined} className={control} {...rest} />
    </Wrap>
  );
}

export function SelectField({ label, name, error, hint, children, ...rest }: Common & SelectHTMLAttributes<HTMLSelectElement>) {
  return (
    <Wrap label={label} name={name} error={error} hint={hint}>
      <select id={name} name={name} aria-invalid={error ? true : undefined} aria-describedby={error ? `${name}-error` : undefined} className={control} {...rest}>
        {children}
      </select>
    </Wrap>
  );
}

export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return <p role="alert" className="mb-4 rounded-md border border-danger bg-danger-soft px-3 py-2 text-sm text-danger">{message}</p>;
}
