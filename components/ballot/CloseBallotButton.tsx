"use client";
import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { api, ballotKey, decisionKey } from "./api";

/** The chair closes the ballot before its time, after saying so twice: the result is frozen then. */
export function CloseBallotButton({ revisionId, ballotId }: { revisionId: number; ballotId: number }) {
  const qc = useQueryClient();
  const [asking, setAsking] = useState(false);
  const close = useMutation({
    mutationFn: () => api(`/api/ballots/${ballotId}/close`, {}),
    onSettled: () => {
      setAsking(false);
      qc.invalidateQueries({ queryKey: ballotKey(revisionId) });
      qc.invalidateQueries({ queryKey: decisionKey(revisionId) });
    },
  });
  return (
    <div className="grid gap-2">
      {!asking ? (
        <Button variant="secondary" onClick={() => setAsking(true)}>Close the ballot now</Button>
      ) : (
        <div className="grid gap-2 rounded-md border border-line bg-paper p-3" role="group" aria-label="Confirm closing the ballot">
          <p>Close the ballot now? No one can vote or change their vote afterwards, and the result is counted as it stands.</p>
          <div className="flex flex-wrap gap-2">
            <Button onClick={() => close.mutate()} disabled={close.isPending}>{close.isPending ? "Closing…" : "Yes, close it"}</Button>
            <Button variant="quiet" onClick={() => setAsking(false)}>Keep it open</Button>
          </div>
        </div>
      )}
      {close.isError && <p role="alert" className="text-sm font-medium text-danger">{close.error.message}</p>}
    </div>
  );
}
