import { z } from "zod";

/**
 * The one normalisation of an e-mail address: trimmed, ASCII only (checked before lower-casing, which
 * could turn a non-ASCII letter into an ASCII one), lower-cased, at most 254 characters.
 */
export const emailSchema = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .min(1, "Enter an e-mail address.")
  .regex(/^[\x21-\x7e]+$/, "Use the e-mail address with plain letters only (no accents, other alphabets or spaces).")
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .pipe(z.email({ error: "Enter an e-mail address like name@example.org." }));

export const signInSchema = z.object({ email: emailSchema });

export const inviteSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  role: z.enum(["chair", "member", "adviser"], { error: "Choose chair, member or adviser." }),
  treasurer: z.boolean().default(false),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const commissionSchema = z.object({
  title: z.string().trim().min(3, "Give the commission a title of at least 3 characters.").max(200, "Keep the title under 200 characters."),
  clientBody: z.string().trim().min(2, "Name the committee or body commissioning the work.").max(200, "Keep this under 200 characters."),
  site: z.string().trim().min(2, "Say where the piece will stand.").max(300, "Keep the site under 300 characters."),
});
export type CommissionInput = z.infer<typeof commissionSchema>;

/** Turns a zod error into { field: first message } for forms. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const flat = z.flattenError(error);
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(flat.fieldErrors as Record<string, string[] | undefined>)) {
    if (v && v.length) out[k] = v[0];
  }
  if (flat.formErrors.length) out._form = flat.formErrors[0];
  return out;
}
