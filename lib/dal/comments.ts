import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import { noticePreferenceSchema, type NoticePreference } from "@/models/comments";
import { fieldErrors } from "@/models/schemas/people";
import { ValidationError } from "../errors";
import type { Viewer } from "./viewer";

export { listComments, annotationsFor } from "./comments-read";
export { postComment, replyToComment, editComment, resolveThread, reopenThread } from "./comments-write";

/** A person's own choice: a mail for each notice, or one daily digest. Theirs alone, so no commission trail. */
export async function setNoticePreference(viewer: Viewer, input: unknown): Promise<{ notices: NoticePreference }> {
  const r = noticePreferenceSchema.safeParse(typeof input === "string" ? { notices: input } : (input ?? {}));
  if (!r.success) throw new ValidationError(fieldErrors(r.error));
  await getDb().update(users).set({ notices: r.data.notices }).where(eq(users.id, viewer.id));
  return { notices: r.data.notices };
}
