/** The revision's life: draft → circulated → (superseded | decided). Only a draft changes. */
export const REVISION_STATES = ["draft", "circulated", "superseded", "decided"] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export const REVISION_STATE_LABELS: Record<RevisionState, string> = {
  draft: "Draft (studio only)",
  circulated: "Circulated",
  superseded: "Superseded",
  decided: "Decided",
};

/** Why a revision cannot be changed, in plain words, or null if it can. */
export function editRefusal(state: RevisionState, number: number): string | null {
  if (state === "draft") return null;
  return `Revision ${number} has been circulated and is frozen; nothing in it can change. Draft a new revision instead.`;
}

export function visibleToCommittee(state: RevisionState): boolean {
  return state !== "draft";
}

export const NOTE_MAX = 4000;
