import type { Metadata } from "next";
import Link from "next/link";
import { commissionForPage } from "@/lib/page-data";
import { listRevisions } from "@/lib/dal/revisions-read";
import { Badge, Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { CopyHash } from "@/components/copy-hash";

export const metadata: Metadata = { title: "Revisions" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
const tone = { draft: "neutral", circulated: "action", superseded: "neutral", decided: "ok" } as const;

export default async function RevisionsPage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/revisions`);
  const revs = await listRevisions(viewer, c.id);
  const base = `/commissions/${c.id}/revisions`;
  return (
    <div className="grid gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-2xl font-semibold">Revision history</h2>
        {c.you.can["revision.draft"] && <Link href={`${base}/new`} className={buttonClass("primary")}>Draft the next revision</Link>}
      </div>
      {!revs.length && <Card><p className="text-ink-soft">No revisions yet{c.you.can["revision.draft"] ? "." : ". The studio will circulate the first one here."}</p></Card>}
      <ol className="grid gap-3" data-testid="revision-history">
        {revs.map((r, i) => (
          <li key={r.id} className="rounded-lg border border-line bg-card p-4">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <Link href={r.state === "draft" ? `${base}/${r.number}/edit` : `${base}/${r.number}`} className="font-serif text-xl font-semibold">Revision {r.number}</Link>
              <Badge tone={tone[r.state]}>{r.stateLabel}</Badge>
            </div>
            <p className="mt-1 line-clamp-2 text-ink-soft">{r.note || "No note yet."}</p>
            <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-ink-soft">
              {r.circulatedAt && <span>Circulated {when.format(new Date(r.circulatedAt))}</span>}
              {r.contentHash && <span className="inline-flex items-center gap-1">Content hash <CopyHash hash={r.contentHash} label="content hash" /></span>}
              {revs[i + 1] && r.state !== "draft" && revs[i + 1].state !== "draft" && (
                <Link href={`${base}/${r.number}/compare/${revs[i + 1].number}`} className="min-h-11 py-2">Compare with Revision {revs[i + 1].number}</Link>
              )}
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
