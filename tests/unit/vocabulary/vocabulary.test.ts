/**
 * One vocabulary: every value list a column accepts is the domain's own list, so the two cannot drift
 * apart (common practice: a single source for enumerations shared by code and storage).
 */
import { describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { BALLOT_KINDS, BALLOT_STATUSES } from "@/models/ballot/kinds";
import { THRESHOLDS } from "@/models/ballot/rules";
import { VOTE_CHOICES } from "@/models/ballot/state";
import { DECISION_OUTCOMES } from "@/models/decision";
import { LENGTH_UNITS } from "@/models/font/units";
import { NOTICE_CHOICES } from "@/models/notices";
import { COMMITTEE_ROLES, STUDIO_ROLES } from "@/models/permissions/roles";
import { ATTACHMENT_KINDS } from "@/models/revision/attachment-kinds";
import { REVISION_STATES } from "@/models/revision/state";
import { STAGE_LABELS, STAGES } from "@/models/stages";

const columns: [string, { enumValues?: readonly string[] }, readonly string[]][] = [
  ["users.units", schema.users.units, LENGTH_UNITS],
  ["users.notices", schema.users.notices, NOTICE_CHOICES],
  ["studio_members.role", schema.studioMembers.role, STUDIO_ROLES],
  ["commissions.stage", schema.commissions.stage, STAGES],
  ["commissions.threshold", schema.commissions.threshold, THRESHOLDS],
  ["commission_members.role", schema.commissionMembers.role, COMMITTEE_ROLES],
  ["revisions.state", schema.revisions.state, REVISION_STATES],
  ["attachments.kind", schema.attachments.kind, ATTACHMENT_KINDS],
  ["ballots.kind", schema.ballots.kind, BALLOT_KINDS],
  ["ballots.status", schema.ballots.status, BALLOT_STATUSES],
  ["votes.choice", schema.votes.choice, VOTE_CHOICES],
  ["decisions.outcome", schema.decisions.outcome, DECISION_OUTCOMES],
];

describe("the columns' value lists are the domain's", () => {
  it.each(columns)("%s accepts exactly the domain's list, in its order", (_name, column, list) => {
    expect(column.enumValues).toEqual([...list]);
  });
  it("every stage has a label and every label a stage", () => {
    expect(Object.keys(STAGE_LABELS).sort()).toEqual([...STAGES].sort());
  });
});
