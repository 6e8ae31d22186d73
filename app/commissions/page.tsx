import type { Metadata } from "next";
import Link from "next/link";
import { viewerOrSignIn } from "@/lib/session";
import { listCommissions } from "@/lib/dal/commissions";
import { CommissionList } from "@/components/commission-list";
import { buttonClass } from "@/components/ui/button";

export const metadata: Metadata = { title: "Your commissions" };

export default async function CommissionsPage() {
  const viewer = await viewerOrSignIn("/commissions");
  const initial = await listCommissions(viewer);
  const studio = viewer.studios[0];
  return (
    <div>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold">Your commissions</h1>
          <p className="text-ink-soft">{studio ? `${studio.studioName} — studio view` : "The commissions your committees are deciding"}</p>
        </div>
        {studio && <Link href="/commissions/new" className={buttonClass("primary")}>New commission</Link>}
      </div>
      <CommissionList initial={initial} />
    </div>
  );
}
