import "server-only";
import { eq } from "drizzle-orm";
import { commissionMembers, commissions, studioMembers, users } from "@/db/schema";
import type { DecisionDto } from "@/models/decision";
import { formatHead } from "@/models/trail/head";
import { howVoted, rollWords } from "@/models/decision/tally-words";
import { env } from "../env";
import { enqueueMail } from "../outbox";
import type { Tx } from "../trail";

function voteLine(d: DecisionDto): string {
  const t = d.tally;
  if (!t) return "No ballot was held on this revision.";
  return `${t.outcomeLabel} in ${howVoted(t)}: ${t.inFavour} in favour, ${t.against} against, ${t.abstain} abstaining, of ${t.votingMembers} voting members.\nThe roll: ${rollWords(t)}.`;
}

/** The decision's notice, text only, to everyone on the commission: the committee and the studio. */
export async function mailDecision(tx: Tx, c: typeof commissions.$inferSelect, d: DecisionDto): Promise<void> {
  const committee = await tx.select({ id: users.id, email: users.email, name: users.name }).from(commissionMembers)
    .innerJoin(users, eq(users.id, commissionMembers.userId)).where(eq(commissionMembers.commissionId, c.id));
  const staff = await tx.select({ id: users.id, email: users.email, name: users.name }).from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId)).where(eq(studioMembers.studioId, c.studioId));
  const people = [...new Map([...committee, ...staff].map((p) => [p.id, p])).values()];
  const link = `${env.appUrl}/commissions/${c.id}/revisions/${d.number}`;
  const conditions = d.conditions.length ? `\nConditions:\n${d.conditions.map((x, i) => `${i + 1}. ${x}`).join("\n")}\n` : "";
  const statement = d.statement ? `\nStatement:\n${d.statement}\n` : "";
  const when = `${d.recordedAt.slice(0, 16).replace("T", " ")} UTC`;
  // The head as it stands in this transaction, after the decision's own trail entries.
  const [head] = await tx.select({ seq: commissions.trailHeadSeq, hash: commissions.trailHeadHash }).from(commissions).where(eq(commissions.id, c.id));
  const anchor = `\nTrail head after this decision: ${formatHead(head)}\nKeep this mail: a downloaded record of this commission must reach this head (paste the line above into ${env.appUrl}/verify), or it has been cut short or rewritten.\n`;
  await enqueueMail(tx, people.map((p) => ({
    dedupeKey: `decision:${d.revisionId}:${p.id}`,
    to: p.email,
    subject: `Decision on Revision ${d.number} of "${c.title}": ${d.outcomeLabel.toLowerCase()}`,
    text:
      `Dear ${p.name ?? p.email},\n\n${d.recordedByName}, as chair, recorded the committee's decision on Revision ${d.number} of "${c.title}" on ${when}.\n\n` +
      `Decision: ${d.outcomeLabel}\n${conditions}${statement}\nThe vote: ${voteLine(d)}\n\n` +
      `Revision ${d.number}'s content hash (SHA-256): ${d.contentHash}\n\nThe revision and the decision trail:\n${link}\n${anchor}`,
  })));
}
