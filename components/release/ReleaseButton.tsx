"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { api } from "@/components/ballot/api";

/** The studio owner releases to fabrication, after confirming: the approved revision is frozen into the release. */
export function ReleaseButton({ commissionId }: { commissionId: number }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const release = useMutation({
    mutationFn: () => api(`/api/commissions/${commissionId}/release`, {}),
    onSuccess: () => router.refresh(),
    onSettled: () => setAsking(false),
  });
  if (!asking) return <Button onClick={() => setAsking(true)}>Release to fabrication</Button>;
  return (
    <div className="grid gap-2 rounded-md border border-line bg-paper p-3" role="group" aria-label="Confirm the release">
      <p>Release to fabrication now? The workshop will work from the approved revision as it stands; it cannot be changed afterwards.</p>
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => release.mutate()} disabled={release.isPending}>{release.isPending ? "Releasing…" : "Yes, release it"}</Button>
        <Button variant="quiet" onClick={() => setAsking(false)}>Not yet</Button>
      </div>
      {release.isError && <p role="alert" className="text-sm font-medium text-danger">{release.error.message}</p>}
    </div>
  );
}
