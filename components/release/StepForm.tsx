"use client";
import { useState, type FormEvent } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";

export interface StepField {
  name: string;
  label: string;
  kind?: "text" | "textarea" | "date" | "file";
  hint?: string;
}

const control = "mt-1 block w-full min-h-11 rounded-md border border-line bg-card px-3 py-2 text-base text-ink aria-[invalid=true]:border-danger";

/**
 * One release step as a small form: sends its fields as JSON (or as a form upload when it has a file) to
 * the route, shows each refusal beside its field, and reloads the page's data when it worked.
 */
export function StepForm({ id, url, fields, submit, extra }: { id: string; url: string; fields: StepField[]; submit: string; extra?: Record<string, unknown> }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setBusy(true);
    setErrors({});
    const data = new FormData(e.currentTarget);
    const upload = fields.some((f) => f.kind === "file");
    const body = upload ? data : JSON.stringify({ ...Object.fromEntries([...data.entries()].map(([k, v]) => [k, String(v)])), ...extra });
    try {
      const res = await fetch(url, { method: "POST", body, headers: { accept: "application/json", ...(upload ? {} : { "content-type": "application/json" }) } });
      const json = await res.json().catch(() => ({}));
      if (!res.ok) setErrors({ ...(json.fields ?? {}), _form: json.error ?? "That did not work. Nothing was changed." });
      else { e.currentTarget?.reset(); router.refresh(); }
    } catch {
      setErrors({ _form: "Placet could not be reached. Nothing was changed; try again." });
    } finally {
      setBusy(false);
    }
  }
  return (
    <form onSubmit={onSubmit} className="grid gap-3" noValidate>
      {fields.map((f) => {
        const fid = `${id}-${f.name}`, err = errors[f.name];
        const common = { id: fid, name: f.name, "aria-invalid": err ? true : undefined, "aria-describedby": err ? `${fid}-error` : undefined, className: control };
        return (
          <div key={f.name}>
            <label htmlFor={fid} className="block text-sm font-medium">{f.label}</label>
            {f.kind === "textarea" ? <textarea rows={3} {...common} /> : <input type={f.kind ?? "text"} {...common} />}
            {f.hint && !err && <p className="mt-1 text-sm text-ink-soft">{f.hint}</p>}
            {err && <p id={`${fid}-error`} role="alert" className="mt-1 text-sm font-medium text-danger">{err}</p>}
          </div>
        );
      })}
      {errors._form && !fields.some((f) => errors[f.name]) && <p role="alert" className="text-sm font-medium text-danger">{errors._form}</p>}
      <div><Button type="submit" disabled={busy}>{busy ? "Saving…" : submit}</Button></div>
    </form>
  );
}
