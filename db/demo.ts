/** The invented demo scenario: a small glass studio, a parish committee, and a font at design development. */
export const DEMO_STUDIO = { name: "Hollowmere Glass", town: "Ashcombe Vale" };

export const DEMO_STAFF = [
  { email: "tamsin@hollowmere.test", name: "Tamsin Holloway", role: "owner" as const },
  { email: "elias@hollowmere.test", name: "Elias Brandt", role: "designer" as const },
];

export const DEMO_COMMISSION = {
  title: "Baptismal font for the west end",
  clientBody: "St Wenna's, Wrenfield — Building Committee",
  site: "St Wenna's Church, Wrenfield: the west end, beside the south door",
};

export const DEMO_COMMITTEE = [
  { email: "margaret@stwenna.test", name: "Margaret Ellery", role: "chair" as const, treasurer: false },
  { email: "david@stwenna.test", name: "David Osei", role: "member" as const, treasurer: false },
  { email: "ruth@stwenna.test", name: "Ruth Penhallow", role: "member" as const, treasurer: false },
  { email: "colin@stwenna.test", name: "Colin Marsh", role: "member" as const, treasurer: true },
  { email: "priya@stwenna.test", name: "Dr Priya Nandakumar", role: "adviser" as const, treasurer: false },
];

export const DEMO_RULES = {
  quorum: "majority" as const,
  threshold: "majority" as const,
  chairVotes: false,
  electronicAuthority: "Standing order 9(c): the committee may decide by electronic ballot between meetings (resolution of the parish council, 4 March 2026)",
};

/** A second commission of the same studio, with its own committee: nobody on one sees the other. */
export const OTHER_COMMISSION = {
  title: "Font and cover for the new chapel",
  clientBody: "Thrennick Chapel — Trustees",
  site: "Thrennick Chapel, Vellanshaw",
};
export const OTHER_COMMITTEE = [
  { email: "owen@thrennick.test", name: "Owen Tregarthen", role: "chair" as const, treasurer: false },
  { email: "hazel@thrennick.test", name: "Hazel Pryor", role: "member" as const, treasurer: false },
];
