/** How a person wants to hear of new things: a mail each time, or one daily digest. */
export const NOTICE_CHOICES = ["immediate", "digest"] as const;
export type NoticeChoice = (typeof NOTICE_CHOICES)[number];
