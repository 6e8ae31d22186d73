"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { CHOICE_LABELS, CHOICE_PAST, VOTE_CHOICES, type VoteChoice } from "@/models/ballot/state";
import { api, ballotKey, showTime } from "./api";

const tone: Record<VoteChoice, string> = {
  "in-favour": "aria-pressed:bg-ok aria-pressed:text-white aria-pressed:border-ok",
  against: "aria-pressed:bg-danger aria-pressed:text-white aria-pressed:border-danger",
  abstain: "aria-pressed:bg-ink aria-pressed:text-paper aria-pressed:border-ink",
};

/** Three large buttons; the voter's current choice is pressed, and they may change it until the close. */
export function VoteButtons({ revisionId, ballotId, yourVote, closesAt }: { revisionId: number; ballotId: number; yourVote: VoteChoice | null; closesAt: string | null }) {
  const qc = useQueryClient();
  const vote = useMutation({
    mutationFn: (choice: VoteChoice) => api<{ choice: VoteChoice }>(`/api/ballots/${ballotId}/votes`, { choice }),
    onSettled: () => qc.invalidateQueries({ queryKey: ballotKey(revisionId) }),
  });
  const shown = vote.isPending ? vote.variables : yourVote;
  return (
    <fieldset className="grid gap-2" data-testid="vote-buttons">
      <legend className="mb-1 font-medium">Your vote</legend>
      <div className="grid grid-cols-1 gap-2 sm:grid-cols-3">
        {VOTE_CHOICES.map((c) => (
          <button
            key={c}
            type="button"
            aria-pressed={shown === c}
            disabled={vote.isPending}
            onClick={() => vote.mutate(c)}
            className={`min-h-14 rounded-md border-2 border-action bg-card px-4 text-lg font-semibold text-action transition-colors hover:bg-paper-deep disabled:opacity-60 ${tone[c]}`}
          >
            {CHOICE_LABELS[c]}{shown === c ? " ✓" : ""}
          </button>
        ))}
      </div>
      <p className="text-sm text-ink-soft" role="status">
        {vote.isPending ? "Saving your vote…" : yourVote ? `You ${CHOICE_PAST[yourVote]}.` : "You have not voted yet."}
        {closesAt && !vote.isPending ? ` You can change your vote until ${showTime(closesAt)}.` : ""}
      </p>
      {vote.isError && <p role="alert" className="text-sm font-medium text-danger">{vote.error.message}</p>}
    </fieldset>
  );
}
