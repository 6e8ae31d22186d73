import { sql } from "drizzle-orm";
import {
  boolean, index, int, mysqlEnum, mysqlTable, primaryKey, text, timestamp, uniqueIndex, varchar,
} from "drizzle-orm/mysql-core";
import { id, ref, utc, json } from "./columns";
// The value lists are the domain's own (models/); storage only uses them.
import { BALLOT_KINDS, BALLOT_STATUSES } from "../models/ballot/kinds";
import { THRESHOLDS } from "../models/ballot/rules";
import { VOTE_CHOICES, type FrozenResult } from "../models/ballot/state";
import type { CommentTarget } from "../models/comments/schema";
import { DECISION_OUTCOMES } from "../models/decision";
import type { StudioSettings } from "../models/font/studio";
import { LENGTH_UNITS } from "../models/font/units";
import { NOTICE_CHOICES } from "../models/notices";
import { COMMITTEE_ROLES, STUDIO_ROLES } from "../models/permissions/roles";
import { ATTACHMENT_KINDS } from "../models/revision/attachment-kinds";
import { REVISION_STATES } from "../models/revision/state";
import { STAGES } from "../models/stages";

/** Kept importable from here for storage code that already reads them here. */
export { ATTACHMENT_KINDS, COMMITTEE_ROLES, DECISION_OUTCOMES, REVISION_STATES, STAGES, STUDIO_ROLES, THRESHOLDS, VOTE_CHOICES };

const now = () => utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`);

// --- Auth.js tables (shape required by @auth/drizzle-adapter) ---------------------------------
// users.email and verification_tokens.identifier are utf8mb4_bin (migration 0005): byte-for-byte
// comparison, so an accented or differently cased look-alike never matches an invited address.
export const users = mysqlTable("users", {
  id: varchar("id", { length: 255 }).primaryKey().$defaultFn(() => crypto.randomUUID()),
  name: varchar("name", { length: 255 }),
  email: varchar("email", { length: 255 }).notNull().unique(),
  emailVerified: timestamp("emailVerified", { mode: "date", fsp: 3 }),
  image: varchar("image", { length: 255 }),
  units: mysqlEnum("units", LENGTH_UNITS).notNull().default("mm"),
  notices: mysqlEnum("notices", NOTICE_CHOICES).notNull().default("immediate"),
  createdAt: now(),
});

export const accounts = mysqlTable("accounts", {
  userId: varchar("userId", { length: 255 }).notNull().references(() => users.id, { onDelete: "cascade" }),
  type: varchar("type", { length: 255 }).$type<"email" | "oauth" | "oidc" | "webauthn">().notNull(),
  provider: varchar("provider", { length: 255 }).notNull(),
  providerAccountId: varchar("providerAccountId", { length: 255 }).notNull(),
  refresh_token: varchar("refresh_token", { length: 255 }),
  access_token: varchar("access_token", { length: 255 }),
  expires_at: int("expires_at"),
  token_type: varchar("token_type", { length: 255 }),
  scope: varchar("scope", { length: 255 }),
  id_token: varchar("id_token", { length: 2048 }),
  session_state: varchar("session_state", { length: 255 }),
}, (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })]);

/** sessionToken holds the SHA-256 of the cookie's value, never the value itself. */
export const sessions = mysqlTable("sessions", {
  sessionToken: varchar("sessionToken", { length: 255 }).primaryKey(),
  userId: varchar("userId", { length: 255 }).notNull().references(() => users.id, { onDelete: "cascade" }),
  expires: timestamp("expires", { mode: "date" }).notNull(),
  createdAt: now(),
  lastSeenAt: utc("last_seen_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  userAgent: varchar("user_agent", { length: 255 }).notNull().default(""),
}, (t) => [index("sessions_user").on(t.userId)]);

export const verificationTokens = mysqlTable("verification_tokens", {
  identifier: varchar("identifier", { length: 255 }).notNull(),
  token: varchar("token", { length: 255 }).notNull(),
  expires: timestamp("expires", { mode: "date" }).notNull(),
}, (t) => [primaryKey({ columns: [t.identifier, t.token] })]);

// --- Studios ------------------------------------------------------------------------------------
export const studios = mysqlTable("studios", {
  id: id(),
  name: varchar("name", { length: 200 }).notNull(),
  town: varchar("town", { length: 200 }).notNull().default(""),
  /** Machines, abrasive sets and default stock (models/font studioSettingsSchema). */
  settings: json<StudioSettings>("settings").notNull(),
  createdAt: now(),
});

export const studioMembers = mysqlTable("studio_members", {
  id: id(),
  studioId: ref("studio_id").notNull().references(() => studios.id),
  userId: varchar("user_id", { length: 255 }).notNull().references(() => users.id),
  role: mysqlEnum("role", STUDIO_ROLES).notNull(),
  createdAt: now(),
}, (t) => [uniqueIndex("studio_members_studio_user").on(t.studioId, t.userId)]);

// --- Commissions --------------------------------------------------------------------------------
export const commissions = mysqlTable("commissions", {
  id: id(),
  studioId: ref("studio_id").notNull().references(() => studios.id),
  title: varchar("title", { length: 200 }).notNull(),
  clientBody: varchar("client_body", { length: 200 }).notNull(),
  site: varchar("site", { length: 300 }).notNull(),
  kind: mysqlEnum("kind", ["font"]).notNull().default("font"),
  stage: mysqlEnum("stage", STAGES).notNull().default("brief"),
  /** "majority" or a whole number of voting members. */
  quorum: varchar("quorum", { length: 20 }).notNull().default("majority"),
  threshold: mysqlEnum("threshold", THRESHOLDS).notNull().default("majority"),
  chairVotes: boolean("chair_votes").notNull().default(false),
  /** The bylaw clause or resolution allowing electronic ballots; null = votes are taken at meetings. */
  electronicAuthority: varchar("electronic_authority", { length: 500 }),
  /** The trail's head: the last appended event's seq and hash, moved in the same transaction as each append. */
  trailHeadSeq: int("trail_head_seq", { unsigned: true }).notNull().default(0),
  trailHeadHash: varchar("trail_head_hash", { length: 64 }).notNull().default("0".repeat(64)),
  /** When the chair confirmed the rules (the studio only proposes them); no ballot before this. */
  rulesConfirmedAt: utc("rules_confirmed_at"),
  rulesConfirmedBy: varchar("rules_confirmed_by", { length: 255 }).references(() => users.id),
  createdAt: now(),
  updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
}, (t) => [index("commissions_studio").on(t.studioId)]);

export const commissionMembers = mysqlTable("commission_members", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  userId: varchar("user_id", { length: 255 }).notNull().references(() => users.id),
  role: mysqlEnum("role", COMMITTEE_ROLES).notNull(),
  treasurer: boolean("treasurer").notNull().default(false),
  invitedBy: varchar("invited_by", { length: 255 }).references(() => users.id),
  createdAt: now(),
}, (t) => [uniqueIndex("commission_members_commission_user").on(t.commissionId, t.userId)]);


// --- Decision trail (append-only; triggers in a migration refuse UPDATE and DELETE) -------------
export const trailEvents = mysqlTable("trail_events", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  seq: int("seq", { unsigned: true }).notNull(),
  at: utc("at").notNull(),
  actorId: varchar("actor_id", { length: 255 }),
  actorRole: varchar("actor_role", { length: 20 }).notNull(),
  action: varchar("action", { length: 60 }).notNull(),
  subjectType: varchar("subject_type", { length: 40 }).notNull(),
  subjectId: varchar("subject_id", { length: 64 }).notNull(),
  payload: json<Record<string, unknown>>("payload").notNull(),
  prevHash: varchar("prev_hash", { length: 64 }).notNull(),
  hash: varchar("hash", { length: 64 }).notNull(),
}, (t) => [uniqueIndex("trail_events_commission_seq").on(t.commissionId, t.seq)]);

/** A person's own security events (sign-in and the like), apart from any commission's chain. */
export const securityLog = mysqlTable("security_log", {
  id: id(),
  userId: varchar("user_id", { length: 255 }),
  email: varchar("email", { length: 255 }),
  at: utc("at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  action: varchar("action", { length: 60 }).notNull(),
  detail: json<Record<string, unknown>>("detail").notNull(),
}, (t) => [index("security_log_user").on(t.userId)]);

/**
 * Sign-in link requests per key (a keyed hash of an address or a client IP) per fixed window, counted
 * by INSERT … ON DUPLICATE KEY UPDATE so parallel requests never read a stale count.
 */
export const signInCounters = mysqlTable("sign_in_counters", {
  keyHash: varchar("key_hash", { length: 80 }).notNull(),
  windowStart: utc("window_start").notNull(),
  n: int("n").notNull().default(0),
}, (t) => [primaryKey({ columns: [t.keyHash, t.windowStart] })]);

// --- Outbox: mail written in the same transaction as the change, sent by a worker with retries -----
export const outbox = mysqlTable("outbox", {
  id: id(),
  /** One message per key, ever: a retried or repeated change never mails twice. */
  dedupeKey: varchar("dedupe_key", { length: 191 }).notNull(),
  toEmail: varchar("to_email", { length: 255 }).notNull(),
  subject: varchar("subject", { length: 255 }).notNull(),
  bodyText: text("body_text").notNull(),
  status: mysqlEnum("status", ["pending", "sending", "sent", "failed"]).notNull().default("pending"),
  attempts: int("attempts").notNull().default(0),
  nextAttemptAt: utc("next_attempt_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  lastError: varchar("last_error", { length: 500 }),
  sentAt: utc("sent_at"),
  createdAt: now(),
}, (t) => [uniqueIndex("outbox_dedupe").on(t.dedupeKey), index("outbox_due").on(t.status, t.nextAttemptAt)]);

// --- Revisions and their attachments ---------------------------------------------------------------
export const revisions = mysqlTable("revisions", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** Revision 1, 2, 3 … within the commission. */
  number: int("number", { unsigned: true }).notNull(),
  state: mysqlEnum("state", REVISION_STATES).notNull().default("draft"),
  /**
   * Font parameters (models/font fontParametersSchema). Still loosely typed: the writer merges partial
   * input into it; json<FontParameters> once that code stops casting to a plain record.
   */
  params: json<Record<string, unknown>>("params").notNull(),
  /** Computed figures, frozen at circulation (null while a draft: computed on read). */
  figures: json<Record<string, unknown> | null>("figures"),
  note: text("note").notNull(),
  /** SHA-256 over RFC 8785 canonical JSON of the frozen content; set when circulated. */
  contentHash: varchar("content_hash", { length: 64 }),
  createdBy: varchar("created_by", { length: 255 }).notNull().references(() => users.id),
  circulatedBy: varchar("circulated_by", { length: 255 }).references(() => users.id),
  circulatedAt: utc("circulated_at"),
  supersededAt: utc("superseded_at"),
  createdAt: now(),
  updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
}, (t) => [uniqueIndex("revisions_commission_number").on(t.commissionId, t.number)]);

export const attachments = mysqlTable("attachments", {
  id: id(),
  revisionId: ref("revision_id").notNull().references(() => revisions.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** Server-chosen storage keys; never derived from the uploaded name. */
  storageKey: varchar("storage_key", { length: 200 }).notNull(),
  thumbKey: varchar("thumb_key", { length: 200 }),
  kind: mysqlEnum("kind", ATTACHMENT_KINDS).notNull(),
  mime: varchar("mime", { length: 50 }).notNull(),
  name: varchar("name", { length: 255 }).notNull(),
  caption: varchar("caption", { length: 500 }).notNull().default(""),
  sha256: varchar("sha256", { length: 64 }).notNull(),
  sizeBytes: int("size_bytes", { unsigned: true }).notNull(),
  width: int("width", { unsigned: true }),
  height: int("height", { unsigned: true }),
  pages: int("pages", { unsigned: true }),
  position: int("position", { unsigned: true }).notNull().default(0),
  uploadedBy: varchar("uploaded_by", { length: 255 }).notNull().references(() => users.id),
  createdAt: now(),
}, (t) => [index("attachments_revision").on(t.revisionId)]);

// --- Review: comments, ballots, votes, decisions ---------------------------------------------------
export const comments = mysqlTable("comments", {
  id: id(),
  revisionId: ref("revision_id").notNull().references(() => revisions.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** Replies point at the thread's first comment. */
  parentId: ref("parent_id"),
  authorId: varchar("author_id", { length: 255 }).notNull().references(() => users.id),
  body: text("body").notNull(),
  /**
   * Where it is pinned: { kind: "revision" } | { kind: "attachment", attachmentId, selector: "xywh=percent:x,y,w,h" }
   * | { kind: "model", part, point: [x, y, z] } (model millimetres).
   */
  target: json<CommentTarget>("target").notNull(),
  resolvedAt: utc("resolved_at"),
  resolvedBy: varchar("resolved_by", { length: 255 }).references(() => users.id),
  editedAt: utc("edited_at"),
  createdAt: now(),
}, (t) => [index("comments_revision").on(t.revisionId)]);

export const ballots = mysqlTable("ballots", {
  id: id(),
  revisionId: ref("revision_id").notNull().references(() => revisions.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  kind: mysqlEnum("kind", BALLOT_KINDS).notNull(),
  status: mysqlEnum("status", BALLOT_STATUSES).notNull(),
  /** The motion, in words ("That Revision 2 be approved"). */
  motion: varchar("motion", { length: 500 }).notNull(),
  openedBy: varchar("opened_by", { length: 255 }).notNull().references(() => users.id),
  openedAt: utc("opened_at").notNull(),
  closesAt: utc("closes_at"),
  closedAt: utc("closed_at"),
  meetingDate: varchar("meeting_date", { length: 10 }),
  /** For a meeting vote: where the minutes are (a reference: minute book page, file name, link). */
  minutesRef: varchar("minutes_ref", { length: 500 }),
  /** Frozen when closed: rules, voting members, counts and decideBallot's result. */
  result: json<FrozenResult | null>("result"),
}, (t) => [index("ballots_revision").on(t.revisionId)]);

/** The roll: who may vote on a ballot, fixed when it opens (or, for a meeting vote, when it is recorded). */
export const ballotRoll = mysqlTable("ballot_roll", {
  id: id(),
  ballotId: ref("ballot_id").notNull().references(() => ballots.id),
  userId: varchar("user_id", { length: 255 }).notNull().references(() => users.id),
  /** The name as it stood when the roll was fixed. */
  name: varchar("name", { length: 255 }).notNull(),
  role: mysqlEnum("role", ["chair", "member"]).notNull(),
  position: int("position", { unsigned: true }).notNull(),
}, (t) => [uniqueIndex("ballot_roll_ballot_user").on(t.ballotId, t.userId)]);

export const votes = mysqlTable("votes", {
  id: id(),
  ballotId: ref("ballot_id").notNull().references(() => ballots.id),
  userId: varchar("user_id", { length: 255 }).notNull().references(() => users.id),
  choice: mysqlEnum("choice", VOTE_CHOICES).notNull(),
  castAt: utc("cast_at").notNull(),
}, (t) => [uniqueIndex("votes_ballot_user").on(t.ballotId, t.userId)]);

export const decisions = mysqlTable("decisions", {
  id: id(),
  /** Exactly one decision per revision. */
  revisionId: ref("revision_id").notNull().references(() => revisions.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  outcome: mysqlEnum("outcome", DECISION_OUTCOMES).notNull(),
  conditions: json<string[]>("conditions").notNull(),
  statement: text("statement").notNull(),
  ballotId: ref("ballot_id").references(() => ballots.id),
  contentHash: varchar("content_hash", { length: 64 }).notNull(),
  recordedBy: varchar("recorded_by", { length: 255 }).notNull().references(() => users.id),
  recordedAt: utc("recorded_at").notNull(),
}, (t) => [uniqueIndex("decisions_revision").on(t.revisionId)]);

/** Notices held for a person's daily digest (people who chose "digest" instead of immediate mail). */
export const digestItems = mysqlTable("digest_items", {
  id: id(),
  userId: varchar("user_id", { length: 255 }).notNull().references(() => users.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** One line of the digest, e.g. "Ruth Penhallow replied to your comment on Revision 2". */
  line: varchar("line", { length: 500 }).notNull(),
  link: varchar("link", { length: 500 }).notNull(),
  dedupeKey: varchar("dedupe_key", { length: 191 }).notNull(),
  createdAt: now(),
  digestedAt: utc("digested_at"),
}, (t) => [uniqueIndex("digest_items_dedupe").on(t.dedupeKey), index("digest_items_user").on(t.userId, t.digestedAt)]);
export * from "./schema-release";
