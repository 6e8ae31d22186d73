import type { DecisionRecordDto } from "@/lib/dal/record";
import { RECORD_FORMAT, RECORD_FORMAT_ID } from "@/models/trail";

const hex = (n: number) => Array.from({ length: 64 }, (_, i) => "0123456789abcdef"[(n * 7 + i * 13) % 16]).join("");

/** An invented commission with a long trail, odd characters and one decision, for the renderer alone. */
export function recordFixture(entries = 60): DecisionRecordDto {
  const trail = Array.from({ length: entries }, (_, i) => ({
    seq: i + 1,
    at: new Date(Date.UTC(2026, 10, 2, 9, 0, 0) + i * 3_600_000).toISOString(),
    actorName: i % 3 ? "Margaret Ellery" : "Elias Penrose",
    actorRole: i % 3 ? "chair" : "designer",
    action: "comment posted",
    sentence: i % 5 === 0
      ? `Commented on Revision 2: “The bowl’s depth ≤ 150 mm and the rim angle θ ≈ 12° − please confirm; the foot’s fixing (M12 × 4) should be shown on the drawing, with a note on the slate floor’s levels.”`
      : `Voted in favour on Revision ${1 + (i % 2)}.`,
    hash: hex(i + 1),
    prevHash: hex(i),
  }));
  return {
    commission: { id: 7, title: "Baptismal font for the west end", clientBody: "Parochial church council of St Wenna’s, Tregony", site: "West end of the nave, beneath the tower arch", studioName: "Hollowmere Glass", stageLabel: "Approved" },
    revisions: [
      { number: 1, stateLabel: "Superseded", circulatedAt: "2026-11-02T10:00:00.000Z", contentHash: hex(101), note: "First design after the site visit: a shallow bowl on a low foot." },
      { number: 2, stateLabel: "Decided", circulatedAt: "2026-11-09T10:00:00.000Z", contentHash: hex(102), note: "A deeper bowl (150 mm, about 20 litres to the brim), three engravings spaced evenly, and the pedestal raised by 30 mm." },
    ],
    decisions: [{
      id: 1, revisionId: 2, number: 2, outcome: "approved-as-noted", outcomeLabel: "Approved as noted",
      conditions: [
        "Lower the rim by 30 mm so that children can be brought up to the font.",
        "Show the fixing of the foot to the pedestal on the drawing, with the stainless dowels and their depth into the stone plinth, before fabrication begins — the diocesan adviser asks for it.",
        "Tolerance on the bowl’s wall ≤ ±2 mm; Δ in height between the engravings under 1 mm.",
      ],
      statement: "The committee thanks the studio for a careful revision.\nWe approve it on the conditions above, and ask to see the final drawing at the January meeting.",
      contentHash: hex(102), recordedByName: "Margaret Ellery", recordedAt: "2026-11-20T19:30:00.000Z",
      tally: { ballotId: 3, kind: "meeting", meetingDate: "2026-11-20", inFavour: 4, against: 1, abstain: 0, votingMembers: 5, outcome: "carried", outcomeLabel: "Carried",
        minutesRef: "Minute book 3, page 41", roll: [
          { name: "Margaret Ellery", role: "chair" }, { name: "David Osei", role: "member" }, { name: "Ruth Penhallow", role: "member" },
          { name: "Colin Marsh", role: "member" }, { name: "Anna Pell", role: "member" },
        ] },
    }],
    trail,
    finalHash: trail.length ? trail[trail.length - 1].hash : "0".repeat(64),
    lastSeq: trail.length,
    head: { seq: trail.length, hash: trail.length ? trail[trail.length - 1].hash : "0".repeat(64) },
    formatId: RECORD_FORMAT_ID,
    formatDescription: RECORD_FORMAT,
    preparedAt: "2026-11-21T08:15:00.000Z",
    preparedBy: "Ruth Carne",
  };
}
