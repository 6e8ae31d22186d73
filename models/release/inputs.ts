/** Input for the release steps: permissions the commission needs, their records, and answers to conditions. */
import { z } from "zod";
import { fieldErrors } from "../schemas/people";

const text = (max: number, empty: string, long: string) => z.string({ error: empty }).trim().min(1, empty).max(max, long);

export const neededPermissionSchema = z.object({
  name: text(200, "Name the permission needed (for example: faculty, listed building consent).", "Keep the name under 200 characters."),
  authority: z.string({ error: "The authority must be text." }).trim().max(200, "Keep the authority under 200 characters.").default(""),
});

export const noneRequiredSchema = z.object({
  noneRequired: z.literal(true),
  reason: text(1000, "Say why no permission is needed, and on whose advice.", "Keep the reason under 1000 characters."),
});

/** A real calendar date, YYYY-MM-DD, not after `today`. */
export function isPastOrToday(ymd: string, today: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(ymd)) return false;
  const d = new Date(`${ymd}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === ymd && ymd <= today;
}

export const permissionRecordSchema = (today: string) => z.object({
  authority: text(200, "Name the authority that granted it.", "Keep the authority under 200 characters."),
  reference: text(200, "Enter the permission's reference.", "Keep the reference under 200 characters."),
  grantedOn: z.string({ error: "Enter the date granted." }).trim()
    .refine((v) => isPastOrToday(v, today), "Enter the date granted as a real date (YYYY-MM-DD), not in the future."),
  conditions: z.string({ error: "The conditions must be text." }).trim().max(4000, "Keep the conditions under 4000 characters.").default(""),
});

export const conditionAnswerSchema = z.object({
  answer: text(4000, "Say how the condition will be met.", "Keep the answer under 4000 characters."),
});

export type Parsed<T> = { ok: true; data: T } | { ok: false; errors: Record<string, string> };

export function parseWith<T>(schema: z.ZodType<T>, input: unknown): Parsed<T> {
  const r = schema.safeParse(input ?? {});
  return r.success ? { ok: true, data: r.data } : { ok: false, errors: fieldErrors(r.error) };
}
