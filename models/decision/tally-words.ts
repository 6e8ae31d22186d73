import type { DecisionTallyDto } from "./index";

/** How the vote behind a decision was taken, in words shared by the decision mail and the PDF record. */
export function howVoted(t: DecisionTallyDto): string {
  if (t.kind !== "meeting") return "the electronic ballot";
  const minutes = t.minutesRef ? `; minutes: ${t.minutesRef}` : "";
  return `the vote taken at the meeting of ${t.meetingDate ?? "a date not recorded"} (recorded by the chair from a meeting${minutes})`;
}

/** The roll the vote was counted on: "Ann Lee, Ben Ode (chair)", or a note that none was recorded. */
export function rollWords(t: DecisionTallyDto): string {
  if (!t.roll.length) return "not recorded with this ballot";
  return `${t.roll.map((p) => `${p.name}${p.role === "chair" ? " (chair)" : ""}`).join(", ")} (${t.roll.length} voting member${t.roll.length === 1 ? "" : "s"}, fixed when the ballot opened)`;
}
