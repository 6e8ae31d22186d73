import { sql } from "drizzle-orm";
import { bigint, boolean, index, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, json, ref, utc } from "./columns";
import { commissions, decisions, revisions, users } from "./schema";

/** Release to fabrication: permissions, answers to conditions, the deposit, and the release itself. */

/** Which external permissions the commission needs, as the chair keeps it: a list, or "none required" with a reason. */
export const permissionPlans = mysqlTable("permission_plans", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  noneRequired: boolean("none_required").notNull().default(false),
  reason: varchar("reason", { length: 1000 }).notNull().default(""),
  setBy: varchar("set_by", { length: 255 }).notNull().references(() => users.id),
  setAt: utc("set_at").notNull(),
}, (t) => [uniqueIndex("permission_plans_commission").on(t.commissionId)]);

/** One permission on the list; recorded once the chair enters its grant and document. */
export const requiredPermissions = mysqlTable("required_permissions", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** What is needed, in the trade's words ("Faculty", "Listed building consent"). */
  name: varchar("name", { length: 200 }).notNull(),
  authority: varchar("authority", { length: 200 }).notNull().default(""),
  reference: varchar("reference", { length: 200 }),
  /** The date granted, YYYY-MM-DD. */
  grantedOn: varchar("granted_on", { length: 10 }),
  conditions: text("conditions"),
  documentKey: varchar("document_key", { length: 200 }),
  documentName: varchar("document_name", { length: 255 }),
  documentMime: varchar("document_mime", { length: 50 }),
  documentSha256: varchar("document_sha256", { length: 64 }),
  documentSize: int("document_size", { unsigned: true }),
  recordedBy: varchar("recorded_by", { length: 255 }).references(() => users.id),
  recordedAt: utc("recorded_at"),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
}, (t) => [index("required_permissions_commission").on(t.commissionId)]);

/** The studio's answer to one condition of an "approved as noted" decision: how it will be met. */
export const conditionAnswers = mysqlTable("condition_answers", {
  id: id(),
  decisionId: ref("decision_id").notNull().references(() => decisions.id),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  /** 0-based position of the condition in the decision's list. */
  conditionIndex: int("condition_index", { unsigned: true }).notNull(),
  answer: text("answer").notNull(),
  answeredBy: varchar("answered_by", { length: 255 }).notNull().references(() => users.id),
  answeredAt: utc("answered_at").notNull(),
}, (t) => [uniqueIndex("condition_answers_decision_index").on(t.decisionId, t.conditionIndex)]);

/** The money: contract sum, deposit and balance in minor units of one currency; the deposit paid or waived. */
export const deposits = mysqlTable("deposits", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  currency: varchar("currency", { length: 3 }).notNull(),
  contractSum: bigint("contract_sum", { mode: "number", unsigned: true }).notNull(),
  depositBasis: mysqlEnum("deposit_basis", ["percent", "amount"]).notNull(),
  depositPercent: int("deposit_percent", { unsigned: true }),
  depositAmount: bigint("deposit_amount", { mode: "number", unsigned: true }).notNull(),
  balanceAmount: bigint("balance_amount", { mode: "number", unsigned: true }).notNull(),
  setBy: varchar("set_by", { length: 255 }).notNull().references(() => users.id),
  setAt: utc("set_at").notNull(),
  waivedReason: varchar("waived_reason", { length: 1000 }),
  waivedBy: varchar("waived_by", { length: 255 }).references(() => users.id),
  waivedAt: utc("waived_at"),
  paidAt: utc("paid_at"),
}, (t) => [uniqueIndex("deposits_commission").on(t.commissionId)]);

/** The release to fabrication: one per commission, with the approved revision frozen into it. */
export const releases = mysqlTable("releases", {
  id: id(),
  commissionId: ref("commission_id").notNull().references(() => commissions.id),
  revisionId: ref("revision_id").notNull().references(() => revisions.id),
  decisionId: ref("decision_id").notNull().references(() => decisions.id),
  contentHash: varchar("content_hash", { length: 64 }).notNull(),
  /** The approved revision as released: number, parameters, figures, note, decision, conditions and answers. */
  frozen: json<Record<string, unknown>>("frozen").notNull(),
  releasedBy: varchar("released_by", { length: 255 }).notNull().references(() => users.id),
  releasedAt: utc("released_at").notNull(),
}, (t) => [uniqueIndex("releases_commission").on(t.commissionId)]);
