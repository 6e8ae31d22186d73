/** The roles a person can hold: on the studio side, and on a commission's committee (treasurer is a flag). */
export const STUDIO_ROLES = ["owner", "designer"] as const;
export type StudioRole = (typeof STUDIO_ROLES)[number];

export const COMMITTEE_ROLES = ["chair", "member", "adviser"] as const;
export type CommitteeRole = (typeof COMMITTEE_ROLES)[number];
