"use server";
import { requireViewer } from "@/lib/session";
import { castVote, closeBallot, openBallot, recordMeetingVote } from "@/lib/dal/ballots";
import { recordDecision } from "@/lib/dal/decisions";
import { sendDecisionSignInLink } from "@/lib/decision-link";
import { isKnownError, ValidationError } from "@/lib/errors";

/** What every action here answers: the data, or a plain message (per field where there is one). */
export type BallotActionResult<T = null> =
  | { ok: true; data: T }
  | { ok: false; error: string; fields?: Record<string, string>; code?: string };

async function run<T>(fn: () => Promise<T>): Promise<BallotActionResult<T>> {
  try {
    const data = await fn();
    return { ok: true, data };
  } catch (err) {
    if (isKnownError(err)) {
      return { ok: false, error: err.message, ...(err instanceof ValidationError ? { fields: err.fields } : {}), ...("code" in err ? { code: err.code } : {}) };
    }
    console.error(err);
    return { ok: false, error: "Something went wrong on our side. Nothing was changed." };
  }
}

export async function openBallotAction(revisionId: number, input: { closesAt: string; motion?: string }) {
  return run(async () => openBallot(await requireViewer(), revisionId, input));
}

export async function castVoteAction(ballotId: number, choice: string) {
  return run(async () => castVote(await requireViewer(), ballotId, choice));
}

export async function closeBallotAction(ballotId: number) {
  return run(async () => closeBallot(await requireViewer(), ballotId));
}

export async function recordMeetingVoteAction(revisionId: number, input: unknown) {
  return run(async () => recordMeetingVote(await requireViewer(), revisionId, input));
}

export async function recordDecisionAction(revisionId: number, input: { outcome: string; conditions?: string; statement?: string }) {
  return run(async () => recordDecision(await requireViewer(), revisionId, input));
}

/** E-mails the chair a fresh sign-in link back to the revision, to confirm who they are before a decision. */
export async function sendDecisionSignInLinkAction(revisionId: number) {
  return run(async () => sendDecisionSignInLink(await requireViewer(), revisionId));
}
