import { formatLength, formatNumber, type LengthUnit } from "@/models/font";
import { boxCentre, isTap, normalisePercentSelector, parsePercentSelector } from "./fragment";
import { PART_LABELS, type CommentTarget } from "./schema";

/** Only the author edits a comment, and only within this long of posting it. */
export const EDIT_WINDOW_MS = 10 * 60 * 1000;

export function editableUntil(createdAt: Date): Date {
  return new Date(createdAt.getTime() + EDIT_WINDOW_MS);
}

export function mayEdit(c: { authorId: string; createdAt: Date }, viewerId: string, now: Date): boolean {
  return c.authorId === viewerId && now.getTime() <= editableUntil(c.createdAt).getTime();
}

const pct = (n: number) => `${formatNumber(n, 1)}%`;

/**
 * Where a comment is pinned, in plain words: "on the whole revision", "on drawing “West elevation” at 25%
 * across, 40% down", "on the bowl, 830 mm up and 210 mm out from the centre".
 */
export function describeTarget(target: CommentTarget, opts: { attachmentName?: (id: number) => string | undefined; units?: LengthUnit } = {}): string {
  switch (target.kind) {
    case "revision":
      return "on the whole revision";
    case "attachment": {
      const name = opts.attachmentName?.(target.attachmentId);
      const where = name ? `on drawing “${name}”` : "on a drawing";
      const canonical = normalisePercentSelector(target.selector);
      const box = canonical ? parsePercentSelector(canonical) : null;
      if (!box) return where;
      if (isTap(box)) {
        const c = boxCentre(box);
        return `${where} at ${pct(c.x)} across, ${pct(c.y)} down`;
      }
      return `${where}, the area ${formatNumber(box.x, 0)}–${pct(box.x + box.w)} across and ${formatNumber(box.y, 0)}–${pct(box.y + box.h)} down`;
    }
    case "model": {
      const units = opts.units ?? "mm";
      const [x, y, z] = target.point;
      const out = Math.hypot(x, y);
      const part = PART_LABELS[target.part];
      const up = formatLength(z, units);
      if (out < 1) return `on the ${part}, on the centre line, ${up} up`;
      return `on the ${part}, ${up} up and ${formatLength(out, units)} out from the centre`;
    }
  }
}
