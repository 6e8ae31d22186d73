import type { Metadata } from "next";
import Link from "next/link";
import { commissionForPage, orNotFound, routeId } from "@/lib/page-data";
import { getRevisionByNumber, listRevisions } from "@/lib/dal/revisions-read";
import { RevisionView } from "@/components/revision/RevisionView";
import { buttonClass } from "@/components/ui/button";

export const metadata: Metadata = { title: "Revision" };

export default async function RevisionPage({ params }: { params: Promise<{ commissionId: string; number: string }> }) {
  const { commissionId, number } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/revisions/${number}`);
  const rev = await orNotFound(getRevisionByNumber(viewer, c.id, routeId(number)));
  const others = (await listRevisions(viewer, c.id)).filter((r) => r.number !== rev.number && r.state !== "draft");
  const base = `/commissions/${c.id}/revisions`;
  return (
    <div className="grid gap-4">
      <nav className="flex flex-wrap gap-2 text-sm" aria-label="Revision">
        {rev.you.canEdit && <Link href={`${base}/${rev.number}/edit`} className={buttonClass("primary")}>Edit the draft</Link>}
        {others[0] && <Link href={`${base}/${rev.number}/compare/${others.find((o) => o.number < rev.number)?.number ?? others[0].number}`} className={buttonClass("secondary")}>Compare with another revision</Link>}
        <Link href={base} className={buttonClass("quiet")}>All revisions</Link>
      </nav>
      <RevisionView initial={rev} commissionId={c.id} />
    </div>
  );
}
