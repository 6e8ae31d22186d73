import { z } from "zod";
import { VOTE_CHOICES, type VoteChoice } from "@/models/ballot/state";
import { fieldErrors } from "./people";

/** A ballot may stay open at most this long. */
export const MAX_BALLOT_DAYS = 60;
export const MOTION_MAX = 500;
const DAY_MS = 24 * 3600 * 1000;
/** The earliest time zone is UTC+14: a date that is "today" somewhere on earth is never refused. */
const EARLIEST_ZONE_MS = 14 * 3600 * 1000;

type Parsed<T> = { ok: true; data: T } | { ok: false; errors: Record<string, string> };

const motionSchema = z
  .string({ error: "The motion must be text." })
  .trim()
  .max(MOTION_MAX, `Keep the motion under ${MOTION_MAX} characters.`)
  .optional()
  .nullable();

/** An instant with its zone, as a browser's Date.toISOString() gives it (no zone would be ambiguous). */
const ZONED = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})$/;

export const choiceSchema = z.enum(VOTE_CHOICES, { error: "Choose in favour, against or abstain." });

export function parseChoice(input: unknown): Parsed<VoteChoice> {
  const raw = input && typeof input === "object" ? (input as { choice?: unknown }).choice : input;
  const r = choiceSchema.safeParse(raw);
  return r.success ? { ok: true, data: r.data } : { ok: false, errors: { choice: "Choose in favour, against or abstain." } };
}

export function parseOpenBallot(input: unknown, now: Date): Parsed<{ closesAt: Date; motion: string | null }> {
  const o = (input && typeof input === "object" ? input : {}) as Record<string, unknown>;
  const motion = motionSchema.safeParse(o.motion);
  if (!motion.success) return { ok: false, errors: { motion: motion.error.issues[0].message } };
  const raw = o.closesAt;
  const when = typeof raw === "string" && ZONED.test(raw.trim()) ? new Date(raw.trim()) : null;
  if (!when || Number.isNaN(when.getTime())) return { ok: false, errors: { closesAt: "Give the closing date and time." } };
  if (when.getTime() <= now.getTime()) return { ok: false, errors: { closesAt: "The closing time must be in the future." } };
  if (when.getTime() - now.getTime() > MAX_BALLOT_DAYS * DAY_MS) {
    return { ok: false, errors: { closesAt: `A ballot can stay open for at most ${MAX_BALLOT_DAYS} days.` } };
  }
  return { ok: true, data: { closesAt: when, motion: motion.data || null } };
}

const count = (what: string) =>
  z.number({ error: `Give the number ${what} as a whole number.` })
    .int(`Give the number ${what} as a whole number.`)
    .min(0, `The number ${what} cannot be negative.`)
    .max(10_000, `The number ${what} is too large.`);

const countsSchema = z.object({ inFavour: count("in favour"), against: count("against"), abstain: count("abstaining") });

const perMemberSchema = z
  .array(z.object({ userId: z.string({ error: "Each vote must name a member." }).min(1, "Each vote must name a member.").max(255), choice: choiceSchema }), {
    error: "Give each member's vote as a list.",
  })
  .max(1000, "That is more votes than anyone has members.");

export interface MeetingVoteInput {
  meetingDate: string;
  motion: string | null;
  counts: { inFavour: number; against: number; abstain: number };
  /** Present when each member's vote was recorded, not only the counts. */
  perMember: { userId: string; choice: VoteChoice }[] | null;
  /** Where the minutes are: the minute book and page, a file name or a link. */
  minutesRef: string;
}

export const MINUTES_REF_MAX = 500;
const minutesRefSchema = z
  .string({ error: "Say where the minutes of the meeting are (for example the minute book and page)." })
  .trim()
  .min(1, "Say where the minutes of the meeting are (for example the minute book and page).")
  .max(MINUTES_REF_MAX, `Keep the reference to the minutes under ${MINUTES_REF_MAX} characters.`);

/** A real calendar date written YYYY-MM-DD, else null. */
export function calendarDate(s: unknown): Date | null {
  if (typeof s !== "string" || !/^\d{4}-\d{2}-\d{2}$/.test(s)) return null;
  const d = new Date(`${s}T00:00:00.000Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s ? d : null;
}

/** The date of `at` in the earliest time zone: no meeting can be later than this. */
export function latestPossibleToday(at: Date): string {
  return new Date(at.getTime() + EARLIEST_ZONE_MS).toISOString().slice(0, 10);
}

export function parseMeetingVote(input: unknown, now: Date): Parsed<MeetingVoteInput> {
  const o = (input && typeof input === "object" ? input : {}) as Record<string, unknown>;
  const errors: Record<string, string> = {};
  const date = calendarDate(o.meetingDate);
  if (!date) errors.meetingDate = "Give the meeting's date (year, month and day).";
  else if ((o.meetingDate as string) > latestPossibleToday(now)) errors.meetingDate = "The meeting date cannot be in the future.";
  const motion = motionSchema.safeParse(o.motion);
  if (!motion.success) errors.motion = motion.error.issues[0].message;
  const minutes = minutesRefSchema.safeParse(o.minutesRef);
  if (!minutes.success) errors.minutesRef = minutes.error.issues[0].message;
  const hasCounts = o.counts !== undefined && o.counts !== null;
  const hasPer = o.perMember !== undefined && o.perMember !== null;
  let counts = { inFavour: 0, against: 0, abstain: 0 };
  let perMember: MeetingVoteInput["perMember"] = null;
  if (hasCounts === hasPer) {
    errors._form = hasCounts ? "Give either the counts or each member's vote, not both." : "Give the counts, or each member's vote.";
  } else if (hasCounts) {
    const c = countsSchema.safeParse(o.counts);
    if (c.success) counts = c.data;
    else Object.assign(errors, fieldErrors(c.error));
  } else {
    const p = perMemberSchema.safeParse(o.perMember);
    if (!p.success) errors.perMember = p.error.issues[0].message;
    else if (new Set(p.data.map((v) => v.userId)).size !== p.data.length) errors.perMember = "A member appears twice; each member has one vote.";
    else if (!p.data.length) errors.perMember = "Choose at least one member's vote.";
    else {
      perMember = p.data;
      for (const v of p.data) counts[v.choice === "in-favour" ? "inFavour" : v.choice] += 1;
    }
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, data: { meetingDate: o.meetingDate as string, motion: motion.data || null, counts, perMember, minutesRef: minutes.data! } };
}
