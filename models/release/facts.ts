/**
 * The facts the release rule reads, each derived here from what is stored, so the data-access layer only
 * loads rows and the deciding stays pure.
 */
import type { ReleaseFacts } from "./rule";

export interface PermissionPlanFacts {
  noneRequired: boolean;
  reason: string;
}

export interface PermissionFacts {
  reference: string | null;
  grantedOn: string | null;
  documentKey: string | null;
}

export interface ApprovalFacts {
  outcome: "approved" | "approved-as-noted" | "revise-and-resubmit" | "not-approved";
  conditions: string[];
}

export interface StoredRelease {
  /** The latest decision on the commission, if any. */
  approval: ApprovalFacts | null;
  /** Condition positions (0-based) the studio has answered with words. */
  answered: number[];
  plan: PermissionPlanFacts | null;
  permissions: PermissionFacts[];
  /** The last day of a published public notice (YYYY-MM-DD), or null when none was published. */
  noticeLastDay: string | null;
  /** Today, YYYY-MM-DD, in the commission's reckoning. */
  today: string;
  deposit: { paid: boolean; waived: boolean } | null;
}

export const isApproved = (a: ApprovalFacts | null): boolean => a?.outcome === "approved" || a?.outcome === "approved-as-noted";

/** A permission counts as recorded when its reference, date granted and document are all there. */
export const permissionRecorded = (p: PermissionFacts): boolean =>
  Boolean(p.reference?.trim()) && Boolean(p.grantedOn) && Boolean(p.documentKey);

/** The chair has said what is needed, and each needed permission is recorded; or none is needed, with a reason. */
export function permissionsSettled(plan: PermissionPlanFacts | null, permissions: PermissionFacts[]): boolean {
  if (!plan) return false;
  if (plan.noneRequired) return plan.reason.trim().length > 0 && permissions.length === 0;
  return permissions.length > 0 && permissions.every(permissionRecorded);
}

/** Every condition of an "approved as noted" decision has an answer; other decisions have none to answer. */
export function conditionsAnswered(a: ApprovalFacts | null, answered: number[]): boolean {
  if (!a || a.outcome !== "approved-as-noted") return true;
  const got = new Set(answered);
  return a.conditions.every((_, i) => got.has(i));
}

/** The notice period is over once its last day has passed (a notice runs through its last day). */
export const noticeOver = (lastDay: string | null, today: string): boolean => lastDay === null || today > lastDay;

export function releaseFacts(s: StoredRelease): ReleaseFacts {
  return {
    approvedRevision: isApproved(s.approval),
    permissionsRecorded: permissionsSettled(s.plan, s.permissions),
    noticePeriodOver: noticeOver(s.noticeLastDay, s.today),
    depositSettled: Boolean(s.deposit && (s.deposit.paid || s.deposit.waived)),
    conditionsAnswered: conditionsAnswered(s.approval, s.answered),
  };
}
