import "server-only";
import type { commissions } from "@/db/schema";
import { env } from "../env";
import { enqueueMail } from "../outbox";
import type { Tx } from "../trail";
import { peopleOnCommission } from "./commission-people";

type CommissionRow = typeof commissions.$inferSelect;
const utcText = (d: Date) => `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;

/**
 * One plain-text notice of a release step to everyone on the commission (or to the roles given), queued
 * in the caller's transaction; `key` makes a repeated step mail nobody twice.
 */
export async function mailCommission(
  tx: Tx, c: CommissionRow, m: { key: string; subject: string; lines: string[]; path?: string; roles?: string[] },
): Promise<void> {
  const people = (await peopleOnCommission(tx, c)).filter((p) => !m.roles || m.roles.includes(p.role));
  const link = `${env.appUrl}${m.path ?? `/commissions/${c.id}`}`;
  await enqueueMail(tx, people.map((p) => ({
    dedupeKey: `${m.key}:${p.id}`,
    to: p.email,
    subject: `${m.subject} — "${c.title}"`,
    text: `Dear ${p.name},\n\n${m.lines.join("\n\n")}\n\nThe commission and its decision trail:\n${link}\n`,
  })));
}

export async function mailRelease(tx: Tx, c: CommissionRow, r: { number: number; contentHash: string; byName: string; at: Date }) {
  await mailCommission(tx, c, {
    key: `release:${c.id}`,
    subject: `Released to fabrication: Revision ${r.number}`,
    lines: [
      `${r.byName}, for the studio, released "${c.title}" to fabrication on ${utcText(r.at)}. The workshop now works from Revision ${r.number} as approved.`,
      `Revision ${r.number}'s content hash (SHA-256): ${r.contentHash}`,
    ],
  });
}
