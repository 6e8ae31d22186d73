import "server-only";
import { sql } from "drizzle-orm";
import { digestItems } from "@/db/schema";
import { env } from "../env";
import { enqueueMail } from "../outbox";
import type { Tx } from "../trail";
import type { CommissionPerson } from "./commission-people";

export type NoticeReason = "reply" | "mention";

export interface CommentNotice {
  commission: { id: number; title: string };
  revisionNumber: number;
  threadId: number;
  commentId: number;
  body: string;
  author: { id: string; name: string; roleLabel: string };
  /** Who is told, and why; a reply to your comment outranks a mention in it. */
  reasons: Map<string, NoticeReason>;
  people: CommissionPerson[];
}

export function commentLink(commissionId: number, revisionNumber: number, threadId: number): string {
  return `${env.appUrl}/commissions/${commissionId}/revisions/${revisionNumber}#comment-${threadId}`;
}

/** Adds a reason for telling someone, keeping the stronger one. */
export function addReason(reasons: Map<string, NoticeReason>, userId: string, reason: NoticeReason) {
  if (reasons.get(userId) !== "reply") reasons.set(userId, reason);
}

/**
 * Tells people about a comment, inside the comment's transaction: by mail through the outbox for those who
 * want notices at once, or as a line in tomorrow's digest for the others. One notice per comment and
 * person, ever (the dedupe key), so a retried request or a later edit never tells anyone twice. Never the
 * author; never someone no longer on the commission.
 */
export async function sendCommentNotices(tx: Tx, n: CommentNotice): Promise<void> {
  const onCommission = new Map(n.people.map((p) => [p.id, p]));
  const link = commentLink(n.commission.id, n.revisionNumber, n.threadId);
  const where = `Revision ${n.revisionNumber} of "${n.commission.title}"`;
  const mails = [];
  const lines = [];
  for (const [userId, reason] of n.reasons) {
    const person = onCommission.get(userId);
    if (!person || userId === n.author.id) continue;
    const what = reason === "reply" ? `replied to your comment on ${where}` : `mentioned you in a comment on ${where}`;
    const dedupeKey = `comment:${n.commentId}:${userId}`;
    if (person.notices === "digest") {
      lines.push({ userId, commissionId: n.commission.id, line: `${n.author.name} ${what}`.slice(0, 500), link: link.slice(0, 500), dedupeKey });
      continue;
    }
    mails.push({
      dedupeKey,
      to: person.email,
      subject: `${n.author.name} ${what}`,
      text:
        `Dear ${person.name},\n\n${n.author.name} (${n.author.roleLabel}) ${what}:\n\n${quote(n.body)}\n\n` +
        `Read the thread and reply here:\n${link}\n\n` +
        `You are sent a mail for each notice like this. To get one daily digest instead, choose it under "Notices" beside the comments on any revision.\n`,
    });
  }
  await enqueueMail(tx, mails);
  if (lines.length) await tx.insert(digestItems).values(lines).onDuplicateKeyUpdate({ set: { dedupeKey: sql`dedupe_key` } });
}

/** The comment as a plain-text quotation, each line marked. */
export function quote(body: string): string {
  return body.split("\n").map((l) => `> ${l}`).join("\n");
}
