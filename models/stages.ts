/** Commission stages, in the trade's words. */
export const STAGE_LABELS = {
  brief: "Brief",
  concept: "Concept",
  "design-development": "Design development",
  approved: "Approved",
  "in-fabrication": "In fabrication",
  installed: "Installed",
  "handed-over": "Handed over",
  "on-hold": "On hold",
  withdrawn: "Withdrawn",
} as const;
export type Stage = keyof typeof STAGE_LABELS;

