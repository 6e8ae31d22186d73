import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { commissionForPage } from "@/lib/page-data";
import { listTrail } from "@/lib/dal/trail";
import { Card } from "@/components/ui/card";
import { CopyHash } from "@/components/copy-hash";
import { buttonClass } from "@/components/ui/button";
import { ROLE_LABELS } from "@/models/permissions/policy";
import { formatHead } from "@/models/trail/head";

export const metadata: Metadata = { title: "Decision trail" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export default async function TrailPage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/trail`);
  const trail = await listTrail(viewer, c.id).catch(() => notFound());
  return (
    <div className="grid gap-4">
      <Card title="The record">
        <p className="mb-3 text-ink-soft">
          Every change to this commission is written here as it happens, each entry sealed with a hash of the one
          before it, so that no entry can be altered, removed or slipped in without the chain breaking.
        </p>
        {trail.finalHash && <p className="mb-3">Final hash now: <CopyHash hash={trail.finalHash} label="final hash" /></p>}
        <p className="mb-3" data-testid="trail-head">
          Trail head now: <span className="break-all font-mono text-sm">{formatHead(trail.head)}</span>
          <span className="block text-sm text-ink-soft">Held by the commission and moved with every entry; a downloaded record must reach it.</span>
        </p>
        <div className="flex flex-wrap gap-3">
          <a href={`/api/commissions/${c.id}/record.json`} className={buttonClass("secondary")} download>Download the record (JSON)</a>
          <a href={`/api/commissions/${c.id}/record.pdf`} className={buttonClass("secondary")} download>Download the decision record (PDF)</a>
          <Link href="/verify" className={buttonClass("quiet")}>Check a record</Link>
        </div>
      </Card>
      <ol className="grid gap-2" data-testid="trail">
        {[...trail.entries].reverse().map((e) => (
          <li key={e.seq} className="rounded-lg border border-line bg-card p-3 sm:p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-x-3 text-sm text-ink-soft">
              <span>#{e.seq} · <time dateTime={e.at}>{when.format(new Date(e.at))} UTC</time></span>
              <CopyHash hash={e.hash} label={`hash of entry ${e.seq}`} />
            </div>
            <p className="mt-1"><strong>{e.actorName}</strong> <span className="text-sm text-ink-soft">({ROLE_LABELS[e.actorRole as keyof typeof ROLE_LABELS]?.toLowerCase() ?? e.actorRole})</span></p>
            <p>{e.sentence}</p>
          </li>
        ))}
      </ol>
    </div>
  );
}
