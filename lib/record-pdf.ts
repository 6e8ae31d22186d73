import "server-only";
import { PDFDocument, StandardFonts } from "pdf-lib";
import type { DecisionDto } from "@/models/decision";
import { howVoted, rollWords } from "@/models/decision/tally-words";
import { ROLE_LABELS } from "@/models/permissions/policy";
import { formatHead } from "@/models/trail/head";
import type { DecisionRecordDto } from "./dal/record";
import { fitLine, footPages, GOLD, INK, MUTED, Writer, type Style } from "./pdf/layout";
import { toWinAnsi } from "./pdf/winansi";

/** "2026-12-05 18:00 UTC" (with seconds for trail entries). */
function utc(iso: string | null, seconds = false): string {
  if (!iso) return "not known";
  return `${iso.slice(0, seconds ? 19 : 16).replace("T", " ")} UTC`;
}

const roleWords = (role: string) =>
  role === "system" ? "automatic" : ROLE_LABELS[role as keyof typeof ROLE_LABELS]?.toLowerCase() ?? role;

function tallyWords(d: DecisionDto): string {
  const t = d.tally;
  if (!t) return "No ballot was held on this revision.";
  const how = howVoted(t);
  return `${how.charAt(0).toUpperCase()}${how.slice(1)}: ${t.outcomeLabel.toLowerCase()}, with ${t.inFavour} in favour, ${t.against} against and ${t.abstain} abstaining, of ${t.votingMembers} voting member${t.votingMembers === 1 ? "" : "s"}.`;
}

export interface RecordPdfOptions {
  /** The address people check records at, e.g. "https://placet.example/verify". */
  verifyUrl?: string;
}

/** The decision record for the minutes and advisory bodies: A4, paginated, ending with the final hash. */
export async function renderDecisionRecordPdf(input: DecisionRecordDto, opts: RecordPdfOptions = {}): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const sans = await doc.embedFont(StandardFonts.Helvetica);
  const bold = await doc.embedFont(StandardFonts.HelveticaBold);
  const serif = await doc.embedFont(StandardFonts.TimesRoman);
  const S = {
    title: { font: bold, size: 22, leading: 28 },
    subtitle: { font: serif, size: 15, leading: 20 },
    h2: { font: bold, size: 13, leading: 18 },
    h3: { font: bold, size: 11, leading: 15 },
    label: { font: sans, size: 8.5, color: MUTED, leading: 12 },
    body: { font: serif, size: 11, leading: 15 },
    small: { font: sans, size: 8.5, color: MUTED, leading: 11.5 },
    meta: { font: sans, size: 9, leading: 12.5 },
    hash: { font: sans, size: 9, leading: 12.5 },
    entry: { font: serif, size: 10.5, leading: 13.5 },
  } satisfies Record<string, Style>;
  const c = input.commission;
  const w = new Writer(doc);

  const heading = (text: string, after = 60) => {
    w.ensure(S.h2.leading + after);
    w.gap(10);
    w.drawLine(text, S.h2);
    w.gap(S.h2.leading + 2);
  };
  /** A label in a narrow column beside a wrapped value. */
  const field = (label: string, value: string, style: Style = S.body, labelWidth = 118) => {
    const lines = w.lines(value, style, w.width - labelWidth);
    w.ensure(Math.min(w.height(lines.length, style), 200));
    w.drawLine(label, S.label, w.left, style.size);
    w.paragraph(value, style, { indent: labelWidth });
  };

  // Title and the commission
  w.drawLine("Decision record", S.title);
  w.gap(S.title.leading);
  w.paragraph(c.title, S.subtitle);
  w.gap(2);
  w.paragraph(`Prepared from Placet by ${input.preparedBy} on ${utc(input.preparedAt)}. It shows the trail up to entry ${input.lastSeq}.`, S.small);
  w.gap(8);
  w.rule(GOLD, 1);
  w.gap(6);

  heading("The commission");
  field("Title", c.title);
  field("Commissioning body", c.clientBody);
  field("Site", c.site);
  field("Studio", c.studioName);
  field("Stage", c.stageLabel);
  field("Commission number", String(c.id));

  heading("Revisions circulated");
  if (!input.revisions.length) w.paragraph("No revision has been circulated to the committee yet.", S.body);
  for (const r of input.revisions) {
    const note = r.note.trim() ? w.lines(r.note, S.entry, w.width - 118) : [];
    w.ensure(S.h3.leading + 2 * S.meta.leading + Math.min(w.height(note.length, S.entry), 120) + 8);
    w.drawLine(`Revision ${r.number}`, S.h3);
    w.drawRight(r.stateLabel, { ...S.meta, color: MUTED }, w.right, S.h3.size);
    w.gap(S.h3.leading);
    field("Circulated", utc(r.circulatedAt), S.meta);
    field("Content hash", r.contentHash ?? "none", S.hash);
    if (note.length) field("Note", r.note, S.entry);
    w.gap(8);
  }

  heading("Decisions");
  if (!input.decisions.length) w.paragraph("No decision has been recorded on this commission yet.", S.body);
  for (const d of input.decisions) {
    w.ensure(S.h3.leading + 70);
    w.drawLine(`Revision ${d.number}: ${d.outcomeLabel}`, S.h3);
    w.gap(S.h3.leading + 2);
    if (d.conditions.length) {
      w.drawLine("Conditions", S.label);
      w.gap(S.label.leading);
      d.conditions.forEach((cond, i) => {
        w.ensure(S.body.leading);
        w.drawLine(`${i + 1}.`, S.body, w.left + 4);
        w.paragraph(cond, S.body, { indent: 24 });
      });
      w.gap(4);
    }
    if (d.statement.trim()) {
      w.ensure(S.label.leading + S.body.leading * 2);
      w.drawLine("Statement", S.label);
      w.gap(S.label.leading);
      w.paragraph(d.statement, S.body);
      w.gap(4);
    }
    field("Vote", tallyWords(d), S.meta, 96);
    if (d.tally) field("Roll", rollWords(d.tally), S.meta, 96);
    field("Recorded", `by ${d.recordedByName} on ${utc(d.recordedAt)}`, S.meta, 96);
    field("Revision hash", d.contentHash, S.hash, 96);
    w.gap(10);
  }

  const seqWidth = 34;
  const entryHeight = (sentence: string) => S.meta.leading + w.height(w.lines(sentence, S.entry, w.width - seqWidth).length, S.entry) + 5;
  heading("The trail, in plain words", 3 * S.small.leading + (input.trail[0] ? entryHeight(input.trail[0].sentence) : 0));
  w.paragraph("Every entry, oldest first. Times are UTC. Each entry is sealed with a hash of the one before it; the first twelve characters of each hash are shown.", S.small);
  w.gap(6);
  for (const e of input.trail) {
    w.ensure(entryHeight(e.sentence));
    w.drawLine(`${e.seq}`, { ...S.meta, font: bold });
    const short = `${e.hash.slice(0, 12)}…`;
    const room = w.width - seqWidth - S.hash.font.widthOfTextAtSize(short, S.hash.size) - 12;
    const who = fitLine(toWinAnsi(`${utc(e.at, true)}  ·  ${e.actorName} (${roleWords(e.actorRole)})`), S.meta.font, S.meta.size, room);
    w.drawLine(who, { ...S.meta, color: MUTED }, w.left + seqWidth);
    w.drawRight(short, { ...S.hash, color: MUTED });
    w.gap(S.meta.leading);
    w.paragraph(e.sentence, S.entry, { indent: seqWidth });
    w.gap(5);
  }

  drawRecordBox(w, input, opts, { bold, sans, serif });
  footPages(w, `Placet decision record · Commission ${c.id}: ${c.title}`, { font: sans, size: 8, color: MUTED });

  doc.setTitle(`Decision record: ${c.title}`);
  doc.setSubject(`Commission ${c.id}, ${c.clientBody}; final hash ${input.finalHash}`);
  doc.setAuthor(input.preparedBy);
  doc.setCreator("Placet");
  doc.setProducer("Placet");
  doc.setCreationDate(new Date(input.preparedAt));
  doc.setModificationDate(new Date(input.preparedAt));
  return doc.save({ useObjectStreams: false });
}

const headAgrees = (r: DecisionRecordDto) => r.head.seq === r.lastSeq && r.head.hash === r.finalHash;

/** The box at the end: the final hash and the trail head in full, and how to check them. Never split across pages. */
function drawRecordBox(w: Writer, input: DecisionRecordDto, opts: RecordPdfOptions, f: Record<"bold" | "sans" | "serif", Style["font"]>) {
  const pad = 16;
  const inner = w.width - 2 * pad;
  const st = {
    label: { font: f.bold, size: 10, color: INK, leading: 14 },
    hash: { font: f.bold, size: 10.5, color: INK, leading: 15 },
    meta: { font: f.sans, size: 9, color: MUTED, leading: 12.5 },
    text: { font: f.serif, size: 11, color: INK, leading: 15 },
    fine: { font: f.sans, size: 8, color: MUTED, leading: 10.5 },
  } satisfies Record<string, Style>;
  const where = opts.verifyUrl ? ` The check page is at ${opts.verifyUrl}.` : "";
  const later = input.lastSeq
    ? ` If entries have been added since, a later record is longer: its entry ${input.lastSeq} must carry this hash.`
    : "";
  const blocks: [string, Style, number][] = [
    ["Final hash", st.label, 2],
    [input.finalHash, st.hash, 2],
    [input.lastSeq ? `The hash of entry ${input.lastSeq}, the last in the trail above.` : "The trail has no entries yet.", st.meta, 0],
    ["Trail head (held by the commission as this record was prepared)", st.label, 2],
    [`Trail head: ${formatHead(input.head)}`, st.hash, 2],
    [headAgrees(input)
      ? "Paste this line into /verify beside the JSON record: the record must reach this head, or it has been cut short or rewritten."
      : `Warning: the commission's head is event ${input.head.seq} but the trail above ends at entry ${input.lastSeq}; the trail has been cut short or rewritten since it was recorded.`, st.meta, 10],
    [`Record format: ${input.formatId}`, st.meta, 10],
    [`Download the JSON record from the trail page and check it at /verify, or with any SHA-256 tool following the format described in the record; the final hash must match the one printed here.${where}${later}`, st.text, 10],
    [`The format, as the record describes it: ${input.formatDescription}`, st.fine, 0],
  ];
  const laid = blocks.map(([text, style, after]) => ({ lines: w.lines(text, style, inner), style, after }));
  const height = pad * 2 + laid.reduce((h, b) => h + b.lines.length * (b.style.leading ?? b.style.size * 1.35) + b.after, 0);
  w.gap(12);
  w.ensure(height + 4);
  const top = w.y;
  w.page.drawRectangle({ x: w.left, y: top - height, width: w.width, height, borderColor: GOLD, borderWidth: 1.25 });
  w.page.drawRectangle({ x: w.left, y: top - height, width: 4, height, color: GOLD });
  w.y = top - pad;
  for (const b of laid) {
    for (const line of b.lines) {
      w.drawLine(line, b.style, w.left + pad);
      w.gap(b.style.leading ?? b.style.size * 1.35);
    }
    w.gap(b.after);
  }
  w.y = top - height;
}
