import "server-only";
import { isKnownError, ValidationError } from "./errors";

/**
 * What a form shows for a failed server action: the per-field messages of bad input, the plain message of
 * any other refusal (under "_form"), or — for anything unexpected, which is logged — the given fallback.
 */
export function formErrors(err: unknown, fallback: string): Record<string, string> {
  if (err instanceof ValidationError) return err.fields;
  if (isKnownError(err)) return { _form: err.message };
  console.error(err);
  return { _form: fallback };
}
