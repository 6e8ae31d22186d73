import type { ReactNode } from "react";
import { commissionForPage } from "@/lib/page-data";
import { CommissionTabs } from "@/components/commission-tabs";
import { Badge } from "@/components/ui/card";

export default async function CommissionLayout({ children, params }: { children: ReactNode; params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}`);
  return (
    <div>
      <div className="mb-4">
        <p className="text-sm text-ink-soft">{c.clientBody} · {c.studioName}</p>
        <h1 className="text-3xl font-semibold" data-testid="commission-title">{c.title}</h1>
        <div className="mt-1 flex flex-wrap items-center gap-2 text-sm text-ink-soft">
          <Badge tone="record">{c.stageLabel}</Badge>
          <span>{c.site}</span>
        </div>
      </div>
      <CommissionTabs id={c.id} />
      <div className="mt-5">{children}</div>
    </div>
  );
}
