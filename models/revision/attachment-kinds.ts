/** The kinds of file a revision may carry. */
export const ATTACHMENT_KINDS = ["png", "jpeg", "webp", "pdf"] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];
