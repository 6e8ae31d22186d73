/**
 * Whether a commission may be released to fabrication, and what still stands in the way. Pure: the
 * data-access layer gathers the five facts and asks here; nothing else decides release.
 */
export interface ReleaseFacts {
  /** An approved, or approved-as-noted, revision. */
  approvedRevision: boolean;
  /** The list of permissions the commission needs is kept, and every one on it is recorded (or none is required, with a reason). */
  permissionsRecorded: boolean;
  /** The public notice period is over, where a notice was published (true when none was). */
  noticePeriodOver: boolean;
  /** The deposit is paid, or waived by the studio owner with a reason. */
  depositSettled: boolean;
  /** Every condition of an "approved as noted" decision is answered by the studio (true when there are none). */
  conditionsAnswered: boolean;
}

export type ReleaseCondition = keyof ReleaseFacts;

/** The five conditions in the order they are met in practice, each with its plain words for "still missing". */
export const RELEASE_CONDITIONS: readonly { key: ReleaseCondition; missing: string }[] = [
  { key: "approvedRevision", missing: "An approved (or approved as noted) revision" },
  { key: "permissionsRecorded", missing: "Every permission the commission needs, recorded by the chair" },
  { key: "noticePeriodOver", missing: "The end of the public notice period" },
  { key: "depositSettled", missing: "The deposit, paid or waived" },
  { key: "conditionsAnswered", missing: "The studio's answer to each condition of the approval" },
];

export interface Readiness {
  ready: boolean;
  missing: string[];
}

/** Ready only when all five hold; `missing` names exactly those that do not, in a fixed order. */
export function releaseReadiness(facts: ReleaseFacts): Readiness {
  const missing = RELEASE_CONDITIONS.filter((c) => facts[c.key] !== true).map((c) => c.missing);
  return { ready: missing.length === 0, missing };
}
