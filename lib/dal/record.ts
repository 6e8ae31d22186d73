import "server-only";
import { getDb } from "@/db/client";
import type { DecisionDto } from "@/models/decision";
import { GENESIS_HASH, RECORD_FORMAT, RECORD_FORMAT_ID, type TrailHead } from "@/models/trail";
import { authorize } from "./access";
import { getCommission } from "./commissions";
import { getDecision } from "./decisions";
import { listRevisions, type RevisionSummaryDto } from "./revisions-read";
import { listTrail, type TrailEntryDto } from "./trail";
import type { Viewer } from "./viewer";

/** Everything the printed decision record shows, gathered for one viewer. */
export interface DecisionRecordDto {
  commission: { id: number; title: string; clientBody: string; site: string; studioName: string; stageLabel: string };
  /** Revisions put before the committee, oldest first (drafts are never part of the record). */
  revisions: Pick<RevisionSummaryDto, "number" | "stateLabel" | "circulatedAt" | "contentHash" | "note">[];
  /** Decisions in revision order. */
  decisions: DecisionDto[];
  trail: TrailEntryDto[];
  /** The last entry's hash (64 zeros if there is none), as in the JSON record. */
  finalHash: string;
  lastSeq: number;
  /** The head the commission row holds, read with the trail; it should be entry lastSeq with finalHash. */
  head: TrailHead;
  formatId: string;
  formatDescription: string;
  preparedAt: string;
  preparedBy: string;
}

/** The decision record of a commission, for anyone who may export its record; outsiders get "not found". */
export async function decisionRecordFor(viewer: Viewer, commissionId: number): Promise<DecisionRecordDto> {
  await authorize(getDb(), viewer, commissionId, "record.export");
  const c = await getCommission(viewer, commissionId);
  const circulated = (await listRevisions(viewer, commissionId)).filter((r) => r.state !== "draft" && r.circulatedAt).reverse();
  const decisions: DecisionDto[] = [];
  // getDecision closes a ballot whose time has passed, so the trail is read after it and includes that entry.
  for (const r of circulated) {
    const d = (await getDecision(viewer, r.id)).decision;
    if (d) decisions.push(d);
  }
  const trail = await listTrail(viewer, commissionId);
  const last = trail.entries[trail.entries.length - 1];
  return {
    commission: { id: c.id, title: c.title, clientBody: c.clientBody, site: c.site, studioName: c.studioName, stageLabel: c.stageLabel },
    revisions: circulated.map((r) => ({ number: r.number, stateLabel: r.stateLabel, circulatedAt: r.circulatedAt, contentHash: r.contentHash, note: r.note })),
    decisions,
    trail: trail.entries,
    finalHash: trail.finalHash ?? GENESIS_HASH,
    lastSeq: last?.seq ?? 0,
    head: trail.head,
    formatId: RECORD_FORMAT_ID,
    formatDescription: RECORD_FORMAT,
    preparedAt: new Date().toISOString(),
    preparedBy: viewer.name || viewer.email,
  };
}
