import { describe, expect, it } from "vitest";
import { calendarDate, latestPossibleToday, parseChoice, parseMeetingVote, parseOpenBallot } from "@/models/schemas/ballots";

const now = new Date("2026-12-01T10:00:00.000Z");

describe("opening a ballot", () => {
  it("takes a zoned closing time in the future, within 60 days", () => {
    expect(parseOpenBallot({ closesAt: "2026-12-03T18:00:00.000Z" }, now)).toEqual({ ok: true, data: { closesAt: new Date("2026-12-03T18:00:00.000Z"), motion: null } });
    expect(parseOpenBallot({ closesAt: "2026-12-03T18:00+01:00", motion: "  That it be approved. " }, now)).toMatchObject({ ok: true, data: { motion: "That it be approved." } });
  });
  it.each([
    [{}, "Give the closing date and time."],
    [{ closesAt: "2026-12-03T18:00" }, "Give the closing date and time."],
    [{ closesAt: 1764700000000 }, "Give the closing date and time."],
    [{ closesAt: "2026-12-01T09:59:00Z" }, "The closing time must be in the future."],
    [{ closesAt: "2027-02-01T10:00:00Z" }, "A ballot can stay open for at most 60 days."],
  ])("refuses %j by naming closesAt", (input, message) => {
    expect(parseOpenBallot(input, now)).toEqual({ ok: false, errors: { closesAt: message } });
  });
});

describe("a vote", () => {
  it("is one of three choices", () => {
    expect(parseChoice("abstain")).toEqual({ ok: true, data: "abstain" });
    expect(parseChoice({ choice: "in-favour" })).toEqual({ ok: true, data: "in-favour" });
    expect(parseChoice({ choice: "yes" })).toMatchObject({ ok: false, errors: { choice: expect.stringContaining("in favour") } });
  });
});

describe("a meeting's vote", () => {
  it("accepts the counts, or each member's vote (counted here)", () => {
    expect(parseMeetingVote({ meetingDate: "2026-11-30", minutesRef: "Minute book 3, page 41", counts: { inFavour: 3, against: 1, abstain: 0 } }, now)).toMatchObject({ ok: true, data: { counts: { inFavour: 3, against: 1, abstain: 0 }, perMember: null } });
    const per = parseMeetingVote({ meetingDate: "2026-12-01", minutesRef: "Minute book 3, page 41", perMember: [{ userId: "a", choice: "in-favour" }, { userId: "b", choice: "abstain" }, { userId: "c", choice: "in-favour" }] }, now);
    expect(per).toMatchObject({ ok: true, data: { counts: { inFavour: 2, against: 0, abstain: 1 } } });
  });
  it("allows today in the earliest time zone but not a day later", () => {
    expect(latestPossibleToday(now)).toBe("2026-12-02");
    expect(parseMeetingVote({ meetingDate: "2026-12-02", minutesRef: "Minute book 3, page 41", counts: { inFavour: 1, against: 0, abstain: 0 } }, now).ok).toBe(true);
    expect(parseMeetingVote({ meetingDate: "2026-12-03", minutesRef: "Minute book 3, page 41", counts: { inFavour: 1, against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { meetingDate: expect.stringContaining("future") } });
  });
  it("knows real calendar dates", () => {
    expect(calendarDate("2028-02-29")).not.toBeNull();
    expect(calendarDate("2026-02-29")).toBeNull();
    expect(calendarDate("1/12/2026")).toBeNull();
  });
  it("names the field that is wrong", () => {
    expect(parseMeetingVote({ meetingDate: "2026-11-30", counts: { inFavour: "three", against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { inFavour: expect.stringContaining("whole number") } });
    expect(parseMeetingVote({ meetingDate: "2026-11-30", perMember: [{ userId: "a", choice: "yes" }] }, now)).toMatchObject({ ok: false, errors: { perMember: expect.stringContaining("in favour") } });
    expect(parseMeetingVote({ counts: { inFavour: 1, against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { meetingDate: expect.any(String) } });
    // Where the minutes are is part of the record of a meeting's vote (common practice: a vote is evidenced by the minutes).
    expect(parseMeetingVote({ meetingDate: "2026-11-30", counts: { inFavour: 1, against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { minutesRef: expect.stringContaining("minutes") } });
    expect(parseMeetingVote({ meetingDate: "2026-11-30", minutesRef: "   ", counts: { inFavour: 1, against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { minutesRef: expect.any(String) } });
    expect(parseMeetingVote({ meetingDate: "2026-11-30", minutesRef: "x".repeat(501), counts: { inFavour: 1, against: 0, abstain: 0 } }, now)).toMatchObject({ ok: false, errors: { minutesRef: expect.stringContaining("500") } });
  });
});
