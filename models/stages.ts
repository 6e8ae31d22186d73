/** Every stage, in the order a commission passes through them, then the two it can be set aside in. */
export const STAGES = [
  "brief",
  "concept",
  "design-development",
  "approved",
  "in-fabrication",
  "installed",
  "handed-over",
  "on-hold",
  "withdrawn",
] as const;
export type Stage = (typeof STAGES)[number];

/** Commission stages, in the trade's words. */
export const STAGE_LABELS: Record<Stage, string> = {
  brief: "Brief",
  concept: "Concept",
  "design-development": "Design development",
  approved: "Approved",
  "in-fabrication": "In fabrication",
  installed: "Installed",
  "handed-over": "Handed over",
  "on-hold": "On hold",
  withdrawn: "Withdrawn",
};
