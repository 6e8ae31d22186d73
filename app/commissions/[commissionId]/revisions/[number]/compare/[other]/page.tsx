import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { commissionForPage, orNotFound, routeId } from "@/lib/page-data";
import { getRevisionByNumber, listRevisions, type RevisionDto } from "@/lib/dal/revisions-read";
import { parseFontParameters } from "@/models/font";
import { CompareView } from "@/components/compare/CompareView";
import type { CompareSide } from "@/components/compare/types";
import { buttonClass } from "@/components/ui/button";

export const metadata: Metadata = { title: "Compare revisions" };

function side(r: RevisionDto): CompareSide {
  const parsed = parseFontParameters(r.params);
  return {
    number: r.number, state: r.state, stateLabel: r.stateLabel, contentHash: r.contentHash, circulatedAt: r.circulatedAt,
    params: r.params, validParams: parsed.ok ? parsed.params : null, figures: r.figures,
    attachments: r.attachments.map((a) => ({ id: a.id, sha256: a.sha256, name: a.name, kind: a.kind, url: a.url })),
  };
}

type Params = { commissionId: string; number: string; other: string };

export default async function ComparePage({ params }: { params: Promise<Params> }) {
  const { commissionId, number, other } = await params;
  const path = `/commissions/${commissionId}/revisions/${number}/compare/${other}`;
  const { viewer, commission: c } = await commissionForPage(commissionId, path);
  const a = routeId(number);
  const b = routeId(other);
  if (a === b) redirect(`/commissions/${c.id}/revisions/${a}`);
  // Both go through the data-access layer: a draft is found only by the studio; anything else is not found.
  const load = (n: number) => getRevisionByNumber(viewer, c.id, n);
  const [x, y] = await orNotFound(Promise.all([load(a), load(b)]));
  const [older, newer] = x.number < y.number ? [x, y] : [y, x];
  const base = `/commissions/${c.id}/revisions`;
  const others = (await listRevisions(viewer, c.id)).filter((r) => r.number !== older.number && r.number !== newer.number);

  return (
    <div className="grid gap-4">
      <nav className="flex flex-wrap gap-2 text-sm" aria-label="Revisions">
        <Link href={`${base}/${newer.number}`} className={buttonClass("secondary")}>Open Revision {newer.number}</Link>
        <Link href={`${base}/${older.number}`} className={buttonClass("secondary")}>Open Revision {older.number}</Link>
        <Link href={base} className={buttonClass("quiet")}>All revisions</Link>
      </nav>
      <CompareView older={side(older)} newer={side(newer)} initialUnits={viewer.units} />
      {others.length > 0 && (
        <nav aria-label="Compare with another revision" className="text-sm">
          <p className="mb-1 font-medium">Compare Revision {newer.number} with another revision instead</p>
          <ul className="flex flex-wrap gap-x-4">
            {others.map((r) => (
              <li key={r.id}><Link href={`${base}/${newer.number}/compare/${r.number}`} className="inline-block min-h-11 py-2">Revision {r.number} ({r.stateLabel.toLowerCase()})</Link></li>
            ))}
          </ul>
        </nav>
      )}
    </div>
  );
}
