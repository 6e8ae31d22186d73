/**
 * THE expectations table of the authorization matrix: one row per route handler + method, or per server
 * action (a second row only for a second kind of object or input). A new route.ts or "use server" export
 * fails the matrix until it has a row here.
 *
 * Outcomes, one per role in the order of ROLE_ORDER: ok (2xx), redirect (3xx / redirect()), 401 (not
 * signed in), 403 (known to the commission, not allowed), 404 (no standing, or an object they may not
 * see), or another status; "a|b" accepts either. On the other studio's commission ("foreign") every row
 * with an object expects 401 for nobody signed in and 404 for everyone else, unless the row says otherwise.
 * The rule behind the table: the role table of the product (who may do what) and OWASP ASVS 4.0.3 V4.1.1 /
 * V4.2.1 (access enforced on the server, for every object: no insecure direct object references).
 */
import sharp from "sharp";
import { defaultFontParameters, demoStudioSettings } from "@/models/font";
import type { Obj, ObjectKind, Role } from "./authz-matrix-world";

export const ROLE_ORDER: Role[] = ["anonymous", "outsider", "adviser", "member", "treasurer", "chair", "designer", "owner"];

//                anonymous outsider adviser member treasurer chair designer owner
const VIEW =     "401       404      ok      ok     ok        ok    ok       ok";
const SIGNED =   "401       ok       ok      ok     ok        ok    ok       ok";
const PUBLIC =   "ok        ok       ok      ok     ok        ok    ok       ok";
const DRAFT =    "401       404      404     404    404       404   ok       ok"; // drafts are the studio's alone
const DRAFT_CHAIR_ONLY = "401 404 404 404 404 404 403 403"; // chair's steps on a draft: not found to the committee
const STUDIO =   "401       404      403     403    403       403   ok       ok";
const CHAIR =    "401       404      403     403    403       ok    403      403";
const VOTERS =   "401       404      403     ok     ok        403   403      403"; // the demo's rules: the chair does not vote
const PEOPLE =   "401       404      ok      ok     ok        ok    ok       ok"; // anyone on the commission
const REDIRECT = "redirect  redirect redirect redirect redirect redirect redirect redirect";
const NOT_SERVED = "404 404 404 404 404 404 404 404";

export interface Row {
  /** `app/…/route.ts METHOD` or `app/…/actions.ts#exportName`. */
  key: string;
  /** Which object the attempt is on (a fresh one per attempt for most mutating rows). */
  object: ObjectKind;
  expect: string;
  /** Expected outcomes on the other studio's commission, by role, where they differ from 401 / 404. */
  foreign?: Partial<Record<Role, string>>;
  /** Outcomes that must leave every table unchanged even though they are not refusals. */
  unchangedAlways?: boolean;
  /** For an allowed answer: what in its body would be a leak (a problem in words), or null. */
  inspect?: (body: string, c: { role: Role | "expired"; email: string | null; own: number; foreign: number }) => string | null;
  /** Routes: the URL (default: the file's path with the object's ids), params, and a JSON body or a form. */
  url?: string;
  params?: Record<string, string | string[]>;
  body?: (o: Obj) => unknown;
  form?: (o: Obj) => FormData | Promise<FormData>;
  /** Actions: how to call it with the object. */
  call?: (fn: (...args: never[]) => Promise<unknown>, o: Obj) => Promise<unknown>;
}

const r = (file: string, method: string, object: ObjectKind, expect: string, more: Partial<Row> = {}): Row => ({ key: `app/${file}/route.ts ${method}`, object, expect, ...more });
type Fn = (...args: unknown[]) => Promise<unknown>;
const a = (file: string, name: string, object: ObjectKind, expect: string, call: (fn: Fn, o: Obj) => Promise<unknown>): Row =>
  ({ key: `app/${file}#${name}`, object, expect, call: call as Row["call"] });

let seq = 0;
const uniq = () => `${Date.now().toString(36)}${(seq += 1)}`;
const form = (fields: Record<string, string>) => { const f = new FormData(); for (const [k, v] of Object.entries(fields)) f.set(k, v); return f; };
const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
const today = () => new Date().toISOString().slice(0, 10);
const png = () => sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 9, g: 90, b: (seq += 1) % 255 } } }).png().toBuffer();
export const uploadForm = async () => { const f = new FormData(); f.set("file", new Blob([new Uint8Array(await png())], { type: "image/png" }), "upload.png"); f.set("caption", "A new view"); return f; };

const meetingVote = () => ({ meetingDate: today(), minutesRef: "Minute book 3, page 41", counts: { inFavour: 2, against: 0, abstain: 0 } });
const decision = () => ({ outcome: "revise-and-resubmit", conditions: "", statement: "Please show the fixing of the foot." });

export const TABLE: Row[] = [
  // ---- route handlers ----
  r("api/commissions", "GET", "none", SIGNED, {
    inspect: (body, c) => {
      const ids = (JSON.parse(body) as { commissions: { id: number }[] }).commissions.map((x) => x.id);
      const onOwn = !["anonymous", "outsider"].includes(c.role);
      if (ids.includes(c.foreign)) return "lists the other studio's commission";
      return ids.includes(c.own) === onOwn ? null : `${onOwn ? "leaves out" : "lists"} the demo's commission`;
    },
  }),
  r("api/commissions/[commissionId]/record.pdf", "GET", "commission", VIEW),
  r("api/commissions/[commissionId]/record.json", "GET", "commission", VIEW),
  r("api/commissions/[commissionId]/revisions", "GET", "commission", VIEW, {
    inspect: (body, c) => (["designer", "owner"].includes(c.role) ? null
      : (JSON.parse(body) as { revisions: { state: string }[] }).revisions.some((x) => x.state === "draft") ? "lists a draft to the committee" : null),
  }),
  r("api/ballots/[ballotId]/close", "POST", "freshOpenBallot", CHAIR),
  r("api/ballots/[ballotId]/votes", "POST", "openBallot", VOTERS, { body: () => ({ choice: "in-favour" }) }),
  // Auth.js's own endpoints: the session answer is the caller's own (null when signed out) ...
  r("api/auth/[...nextauth]", "GET", "none", PUBLIC, {
    url: "/api/auth/session", params: { nextauth: ["session"] },
    inspect: (body, c) => {
      const email = (JSON.parse(body) as { user?: { email?: string } } | null)?.user?.email ?? null;
      return email === c.email ? null : `answers the session of ${email} to ${c.email}`;
    },
  }),
  // ... and its sign-in and other endpoints are not served at all: one way in, Placet's own form.
  ...["POST", "PUT", "PATCH", "DELETE"].map((m) => r("api/auth/[...nextauth]", m, "none", NOT_SERVED, {
    url: "/api/auth/signin/nodemailer", params: { nextauth: ["signin", "nodemailer"] }, unchangedAlways: true,
    form: () => form({ email: "margaret@stwenna.test" }),
  })),
  // Placet's sign-in form: the same answer for everyone (a link is queued only for an invited address).
  r("sign-in/request", "POST", "none", REDIRECT, { form: () => form({ email: `nobody-${uniq()}@example.test` }) }),
  r("api/comments/[commentId]/reopen", "POST", "resolvedComment", STUDIO),
  r("api/comments/[commentId]/replies", "POST", "comment", PEOPLE, { body: () => ({ body: "Agreed." }) }),
  r("api/comments/[commentId]/resolve", "POST", "comment", STUDIO),
  r("api/comments/[commentId]", "PATCH", "comment", "401 404 403 ok 403 403 403 403", { body: () => ({ body: "The engraving depth looks right." }) }), // its author, the member
  // Release to fabrication: the rule's answer for its people; the owner alone releases (not ready: 409).
  r("api/commissions/[commissionId]/release", "GET", "commission", PEOPLE),
  r("api/commissions/[commissionId]/release", "POST", "commission", "401 404 403 403 403 403 403 409"),
  r("api/commissions/[commissionId]/permissions", "GET", "commission", PEOPLE),
  r("api/commissions/[commissionId]/permissions", "POST", "freshCommission", CHAIR, { body: () => ({ name: "Faculty", authority: "The diocese" }) }),
  r("api/commissions/[commissionId]/conditions", "GET", "commission", PEOPLE),
  // No approval as noted yet: the studio is told so (409); everyone else is refused first.
  r("api/commissions/[commissionId]/conditions/[number]", "POST", "current", "401 404 403 403 403 403 409 409",
    { body: () => ({ answer: "The wren badge is cut into the foot." }) }),
  r("api/permissions/[permissionId]/record", "POST", "permission", "401 404 403 403 403 422 403 403", { form: () => form({ authority: "The diocese", reference: "F/2026/14", grantedOn: "2026-11-30" }) }),
  r("api/permissions/[permissionId]/remove", "POST", "permission", CHAIR),
  // Nothing recorded yet, so there is no document to read for anyone.
  r("api/permissions/[permissionId]/document", "GET", "permission", "401 404 404 404 404 404 404 404"),
  r("api/formats/model-point", "GET", "none", PUBLIC),
  r("api/health", "GET", "none", PUBLIC),
  r("api/me/notices", "PATCH", "none", SIGNED, { body: () => ({ notices: "digest" }) }),
  r("api/revisions/[revisionId]", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/annotations", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]/annotations", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/attachments", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]/attachments", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/attachments", "POST", "draft", DRAFT, { form: uploadForm }),
  r("api/revisions/[revisionId]/attachments", "POST", "current", "401 404 403 403 403 403 409 409", { form: uploadForm }), // circulated: frozen
  r("api/revisions/[revisionId]/ballot", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]/ballot", "POST", "freshCirculated", CHAIR, { body: () => ({ closesAt: inHours(48) }) }),
  r("api/revisions/[revisionId]/comments", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]/comments", "POST", "current", PEOPLE, { body: () => ({ body: "Is the rim height measured from the floor?" }) }),
  // A pin on a picture of another commission, named by its id in the body: refused as bad input, nothing written.
  r("api/revisions/[revisionId]/comments", "POST", "current", "401 404 422 422 422 422 422 422", {
    body: (o) => ({ body: "Here.", target: { kind: "attachment", attachmentId: o.elsewhereAttachmentId, selector: "xywh=percent:10,10,20,20" } }),
  }),
  r("api/revisions/[revisionId]/decision", "GET", "readable", VIEW),
  r("api/revisions/[revisionId]/decision", "POST", "freshCirculated", CHAIR, { body: decision }),
  r("api/revisions/[revisionId]/decision/sign-in-link", "POST", "current", CHAIR),
  r("api/revisions/[revisionId]/meeting-vote", "POST", "freshCirculated", CHAIR, { body: meetingVote }),
  // The same revision routes on a draft: the committee cannot see it at all; the studio may read, not decide.
  r("api/revisions/[revisionId]/ballot", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/ballot", "POST", "draft", DRAFT_CHAIR_ONLY, { body: () => ({ closesAt: inHours(48) }) }),
  r("api/revisions/[revisionId]/comments", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/comments", "POST", "draft", "401 404 404 404 404 404 409 409", { body: () => ({ body: "A note to ourselves." }) }),
  r("api/revisions/[revisionId]/decision", "GET", "draft", DRAFT),
  r("api/revisions/[revisionId]/decision", "POST", "draft", DRAFT_CHAIR_ONLY, { body: decision }),
  r("api/revisions/[revisionId]/decision/sign-in-link", "POST", "draft", DRAFT_CHAIR_ONLY),
  r("api/revisions/[revisionId]/meeting-vote", "POST", "draft", DRAFT_CHAIR_ONLY, { body: meetingVote }),
  r("api/attachments/[attachmentId]/file", "GET", "readable", VIEW),
  r("api/attachments/[attachmentId]/file", "GET", "draftAttachment", DRAFT),
  r("api/attachments/[attachmentId]/thumb", "GET", "readable", VIEW),
  r("api/attachments/[attachmentId]/thumb", "GET", "draftAttachment", DRAFT),
  r("api/attachments/[attachmentId]", "PATCH", "draftAttachment", DRAFT, { body: () => ({ caption: "Detail of the foot" }) }),
  r("api/attachments/[attachmentId]", "DELETE", "draftAttachment", DRAFT),
  // The sign-in confirm button without a token: back to sign-in, nothing written.
  r("sign-in/confirm/complete", "POST", "none", REDIRECT, { unchangedAlways: true, form: () => form({ email: "margaret@stwenna.test" }) }),

  // ---- server actions ----
  a("commissions/[commissionId]/people/actions.ts", "inviteAction", "freshCommission", "401 404 403 403 403 ok ok ok",
    (fn, o) => fn(o.commissionId, {}, form({ email: `adviser-${uniq()}@stwenna.test`, name: "A new adviser", role: "adviser" }))),
  a("commissions/[commissionId]/people/actions.ts", "inviteAction", "freshCommission", "401 404 403 403 403 403 ok ok",
    (fn, o) => fn(o.commissionId, {}, form({ email: `member-${uniq()}@stwenna.test`, name: "A new member", role: "member" }))),
  // Inviting a member again as an adviser would take away their vote: the chair may invite advisers, not demote.
  a("commissions/[commissionId]/people/actions.ts", "inviteAction", "freshCommission", "401 404 403 403 403 403 ok ok",
    (fn, o) => fn(o.commissionId, {}, form({ email: "david@stwenna.test", name: "David Osei", role: "adviser" }))),
  a("commissions/[commissionId]/revisions/[number]/edit/actions.ts", "saveDraftAction", "draft", DRAFT,
    (fn, o) => fn(o.commissionId, o.number, { ...defaultFontParameters, engravingCount: 4 }, "Four engravings")),
  a("commissions/[commissionId]/revisions/[number]/edit/actions.ts", "circulateAction", "draft", DRAFT,
    (fn, o) => fn(o.commissionId, o.number, { ...defaultFontParameters }, "Ready for the committee")),
  a("commissions/[commissionId]/revisions/actions.ts", "createDraftAction", "noDraft", "401 404 403 403 403 403 redirect redirect",
    (fn, o) => fn(o.commissionId, {}, form({ note: "Next round" }))),
  // The rules are the committee's: the chair alone changes or confirms them.
  a("commissions/[commissionId]/rules/actions.ts", "confirmRulesAction", "freshCommission", "401 404 403 403 403 redirect 403 403",
    (fn, o) => fn(o.commissionId, {}, form({}))),
  a("commissions/[commissionId]/rules/actions.ts", "rulesAction", "freshCommission", "401 404 403 403 403 redirect 403 403",
    (fn, o) => fn(o.commissionId, {}, form({ quorumMode: "majority", threshold: "two-thirds", electronicAuthority: "Standing order 4" }))),
  a("commissions/new/actions.ts", "createCommissionAction", "none", "401 403 403 403 403 403 redirect redirect",
    (fn) => fn({}, form({ title: "Ambo for the nave", clientBody: "The same committee", site: "The nave" }))),
  a("sign-in/actions.ts", "signOutAction", "none", REDIRECT, (fn) => fn()),
  a("account/devices/actions.ts", "signOutOthersAction", "none", REDIRECT, (fn) => fn()), // signed out: to sign in
  a("studio/actions.ts", "saveStudioSettings", "none", "401 403 403 403 403 403 403 ok", (fn) => fn(demoStudioSettings)),
];

export function expected(row: Row, role: Role, side: "own" | "foreign"): string[] {
  if (side === "foreign") return (row.foreign?.[role] ?? (role === "anonymous" ? "401" : "404")).split("|");
  const cells = row.expect.trim().split(/\s+/);
  if (cells.length !== ROLE_ORDER.length) throw new Error(`${row.key}: ${cells.length} outcomes for ${ROLE_ORDER.length} roles`);
  return cells[ROLE_ORDER.indexOf(role)].split("|");
}
