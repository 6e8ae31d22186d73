import type { CommentTarget, NoticePreference } from "./schema";

/** What the comments API answers; shared by the data-access layer and the components. */
export interface CommentAuthorDto {
  id: string;
  name: string;
  /** e.g. "chair", "designer"; "former" for someone no longer on the commission */
  role: string;
  roleLabel: string;
}

export interface CommentDto {
  id: number;
  body: string;
  author: CommentAuthorDto;
  createdAt: string;
  editedAt: string | null;
  /** Until when the viewer may still edit it (their own, within ten minutes), or null. */
  editableUntil: string | null;
}

export interface ThreadDto extends CommentDto {
  /** The pin number people see (1, 2, 3 … in the order threads were started on this revision). */
  number: number;
  target: CommentTarget;
  /** Where it is pinned, in words ("on drawing “West elevation” at 25% across, 40% down"). */
  targetLabel: string;
  /** Resolved by the studio: folded away but kept, with when and by whom. */
  resolved: boolean;
  resolvedAt: string | null;
  resolvedBy: string | null;
  replies: CommentDto[];
}

export interface CommentsDto {
  revisionId: number;
  threads: ThreadDto[];
  you: { canComment: boolean; canResolve: boolean; notices: NoticePreference };
  /** The server's clock, so edit windows count down correctly on a device whose clock is off. */
  serverTime: string;
}
