import { describe, expect, it } from "vitest";
import { findMentions, type MentionablePerson } from "@/models/comments";

const people: MentionablePerson[] = [
  { id: "m", name: "Margaret Ellery", email: "margaret@stwenna.test" },
  { id: "r", name: "Ruth Penhallow", email: "ruth@stwenna.test" },
  { id: "r2", name: "Ruth Marsh", email: "ruth.marsh@stwenna.test" },
  { id: "c", name: "Colin Marsh", email: "colin@stwenna.test" },
  { id: "p", name: "Dr Priya Nandakumar", email: "priya@stwenna.test" },
  { id: "e", name: "Elias Brandt", email: "elias@hollowmere.test" },
];

describe("mentions", () => {
  it("by a first name or surname that only one person has", () => {
    expect(findMentions("@Margaret what do you think?", people)).toEqual(["m"]);
    expect(findMentions("Over to @brandt.", people)).toEqual(["e"]);
    expect(findMentions("@Priya, is the step safe?", people)).toEqual(["p"]);
  });
  it("a shared word mentions nobody; the full name or address does", () => {
    expect(findMentions("@Ruth and @Marsh", people)).toEqual([]);
    expect(findMentions("@Ruth Penhallow and @ruth.marsh@stwenna.test", people)).toEqual(["r", "r2"]);
    expect(findMentions("@Colin  Marsh", people)).toEqual(["c"]);
  });
  it("by e-mail address, ignoring case", () => {
    expect(findMentions("cc @COLIN@stwenna.test", people)).toEqual(["c"]);
  });
  it("each person once, in order of first mention", () => {
    expect(findMentions("@Elias @Margaret @elias@hollowmere.test @Elias Brandt", people)).toEqual(["e", "m"]);
  });
  it("not inside words or addresses, and not a longer word", () => {
    expect(findMentions("write to margaret@stwenna.test", people)).toEqual([]);
    expect(findMentions("@Margaretta", people)).toEqual([]);
    expect(findMentions("@ Margaret", people)).toEqual([]);
    expect(findMentions("no mentions here", people)).toEqual([]);
  });
  it("the same full name twice is too ambiguous to guess", () => {
    const twins = [...people, { id: "x", name: "Ruth Penhallow", email: "other@example.test" }];
    expect(findMentions("@Ruth Penhallow", twins)).toEqual([]);
  });
});
