"use client";
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import type { CommissionSummary } from "@/lib/dal/commissions";
import { Badge } from "./ui/card";
import { ROLE_LABELS } from "@/models/permissions/policy";

async function fetchCommissions(): Promise<CommissionSummary[]> {
  const res = await fetch("/api/commissions", { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error("Could not load your commissions.");
  return (await res.json()).commissions;
}

export function CommissionList({ initial }: { initial: CommissionSummary[] }) {
  const { data, isError } = useQuery({ queryKey: ["commissions"], queryFn: fetchCommissions, initialData: initial });
  if (isError) return <p role="alert" className="text-danger">Could not refresh the list. Showing what was loaded.</p>;
  if (!data.length) return <p className="text-ink-soft">No commissions yet. When the studio or a chair invites you, they appear here.</p>;
  return (
    <ul className="grid gap-3 sm:grid-cols-2" data-testid="commission-list">
      {data.map((c) => (
        <li key={c.id}>
          <Link href={`/commissions/${c.id}`} className="block rounded-lg border border-line bg-card p-4 text-ink no-underline shadow-sm hover:border-action">
            <div className="mb-1 flex items-center justify-between gap-2">
              <Badge tone="record">{c.stageLabel}</Badge>
              <span className="text-xs text-ink-soft">{ROLE_LABELS[c.yourRole as keyof typeof ROLE_LABELS] ?? ""}</span>
            </div>
            <h2 className="text-xl font-semibold">{c.title}</h2>
            <p className="text-sm text-ink-soft">{c.clientBody} · {c.site}</p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
