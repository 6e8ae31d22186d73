import { z } from "zod";
import type { FontPart } from "@/models/font";
import { formatPercentSelector, normalisePercentSelector, percentBoxProblem, tapBox, dragBox, type PercentBox } from "./fragment";

export const BODY_MAX = 4000;
/** Points further than this from the font's footprint centre are not on the model (3 m). */
export const POINT_LIMIT_MM = 3000;
export const MODEL_PARTS = ["bowl", "foot", "pedestal"] as const satisfies readonly FontPart[];
export const PART_LABELS: Record<FontPart, string> = { bowl: "bowl", foot: "foot", pedestal: "pedestal" };

/** A point on the model in model millimetres: x, y across the floor from the centre line, z up from the floor. */
export type ModelPoint = [x: number, y: number, z: number];

export type CommentTarget =
  | { kind: "revision" }
  | { kind: "attachment"; attachmentId: number; selector: string }
  | { kind: "model"; part: FontPart; point: ModelPoint };
export type AttachmentTarget = Extract<CommentTarget, { kind: "attachment" }>;
export type ModelTarget = Extract<CommentTarget, { kind: "model" }>;

/**
 * People's words are kept as typed, as plain text: line breaks become "\n", other control characters are
 * dropped, and the ends are trimmed. Nothing is stripped or escaped; it is never shown as HTML.
 */
export function normaliseText(s: string): string {
  return s.replace(/\r\n?/g, "\n").replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/g, "").trim();
}

export const commentBodySchema = z
  .string({ error: "Write the comment as text." })
  .transform(normaliseText)
  .pipe(z.string().min(1, "Write something before posting.").max(BODY_MAX, `Keep a comment under ${BODY_MAX.toLocaleString("en-GB")} characters.`));

const coordinate = z
  .number({ error: "Each coordinate of the point must be a number of millimetres." })
  .refine(Number.isFinite, "Each coordinate of the point must be a finite number.")
  .refine((n) => Math.abs(n) <= POINT_LIMIT_MM, `A point on the model lies within ${POINT_LIMIT_MM / 1000} m of its centre.`)
  .transform((n) => Math.round(n * 10) / 10 + 0);

const revisionTarget = z.object({ kind: z.literal("revision") });
const attachmentTarget = z.object({
  kind: z.literal("attachment"),
  attachmentId: z.number({ error: "Say which drawing the comment is on." }).int().positive("Say which drawing the comment is on."),
  selector: z
    .string({ error: "Say where on the drawing the comment is." })
    .transform((s, ctx) => {
      const canonical = normalisePercentSelector(s);
      if (canonical) return canonical;
      ctx.addIssue({ code: "custom", message: "The place on the drawing must look like xywh=percent:x,y,w,h, in per cents, inside the drawing." });
      return z.NEVER;
    }),
});
const modelTarget = z.object({
  kind: z.literal("model"),
  part: z.enum(MODEL_PARTS, { error: "Choose the bowl, the foot or the pedestal." }),
  point: z.tuple([coordinate, coordinate, coordinate], { error: "Give the point as three numbers of millimetres: x, y and z." }),
});

export const commentTargetSchema = z.discriminatedUnion("kind", [revisionTarget, attachmentTarget, modelTarget], {
  error: "Say where the comment goes: the whole revision, a place on a drawing, or a point on the model.",
});

/** A new comment starting a thread. No target means the revision as a whole. */
export const newCommentSchema = z.object({
  body: commentBodySchema,
  target: commentTargetSchema.default({ kind: "revision" }),
});
export type NewCommentInput = z.infer<typeof newCommentSchema>;

export const commentTextSchema = z.object({ body: commentBodySchema });

export const noticePreferenceSchema = z.object({
  notices: z.enum(["immediate", "digest"], { error: "Choose a mail for each notice, or one daily digest." }),
});
export type NoticePreference = z.infer<typeof noticePreferenceSchema>["notices"];

/** Reads a stored target back; anything unreadable counts as the revision as a whole. */
export function readTarget(raw: unknown): CommentTarget {
  const r = commentTargetSchema.safeParse(raw);
  return r.success ? (r.data as CommentTarget) : { kind: "revision" };
}

// --- Builders for the viewer and the drawings ------------------------------------------------------

export function attachmentBoxTarget(attachmentId: number, box: PercentBox): AttachmentTarget {
  if (percentBoxProblem(box)) throw new RangeError("not a place on a drawing");
  return { kind: "attachment", attachmentId, selector: formatPercentSelector(box) };
}

/** The target for a tap on a drawing at (xPercent, yPercent). */
export function tapTarget(attachmentId: number, xPercent: number, yPercent: number): AttachmentTarget {
  return attachmentBoxTarget(attachmentId, tapBox(xPercent, yPercent));
}

/** The target for a drag across a drawing, corner to corner, in per cents. */
export function dragTarget(attachmentId: number, x1: number, y1: number, x2: number, y2: number): AttachmentTarget {
  return attachmentBoxTarget(attachmentId, dragBox(x1, y1, x2, y2));
}

/** The target for a point picked on the 3D model. */
export function modelPointTarget(part: FontPart, point: readonly [number, number, number]): ModelTarget {
  const round = (n: number) => Math.round(n * 10) / 10 + 0;
  return { kind: "model", part, point: [round(point[0]), round(point[1]), round(point[2])] };
}
