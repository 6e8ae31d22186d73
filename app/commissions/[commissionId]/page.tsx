import type { Metadata } from "next";
import Link from "next/link";
import { commissionForPage } from "@/lib/page-data";
import { Card } from "@/components/ui/card";
import { RulesSummary } from "@/components/rules-summary";
import { NextSteps } from "@/components/next-steps";
import { ROLE_LABELS } from "@/models/permissions/policy";
import { listRevisions } from "@/lib/dal/revisions-read";
import { getBallotState } from "@/lib/dal/ballots";
import { CurrentRevision } from "@/components/current-revision";
import { getReleaseStatus } from "@/lib/dal/release";
import { ReleaseCard } from "@/components/release/ReleaseCard";

export const metadata: Metadata = { title: "Commission" };

export default async function CommissionPage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}`);
  const revisions = await listRevisions(viewer, c.id);
  const current = revisions.find((r) => r.state === "circulated" || r.state === "decided") ?? null;
  const draft = revisions.find((r) => r.state === "draft") ?? null;
  const ballot = current ? await getBallotState(viewer, current.id) : null;
  const release = await getReleaseStatus(viewer, c.id);
  const committee = c.people.filter((p) => p.side === "committee");
  return (
    <div className="grid gap-4 lg:grid-cols-3">
      <div className="grid gap-4 lg:col-span-2">
        <NextSteps commission={c} current={current} ballot={ballot} />
        <CurrentRevision commissionId={c.id} revision={current} ballot={ballot} draft={draft} />
        <ReleaseCard commissionId={c.id} status={release} mayRelease={Boolean(c.you.can["release.release"])} linkToDetails />
        <Card title="How this committee decides" action={c.rulesEditable ? <Link href={`/commissions/${c.id}/rules`} className="min-h-11 py-2">{c.rulesConfirmed ? "Change the rules" : "Confirm the rules"}</Link> : undefined}>
          <RulesSummary rules={c.rules} />
          {!c.rulesConfirmed && <p className="mt-2 text-sm text-ink-soft" data-testid="rules-proposed">Proposed by the studio; the chair confirms or changes them before the first vote.</p>}
          {c.openBallot && c.you.can["rules.edit"] && <p className="mt-2 text-sm text-ink-soft">The rules cannot change while the ballot on Revision {c.openBallot.number} is open.</p>}
          {!c.you.can["rules.edit"] && <p className="mt-2 text-sm text-ink-soft">The rules are the committee&apos;s: only its chair changes them, and every change is in the trail.</p>}
        </Card>
      </div>
      <Card title="People" action={<Link href={`/commissions/${c.id}/people`} className="min-h-11 py-2">All people</Link>}>
        <ul className="space-y-2">
          {committee.map((p) => (
            <li key={p.userId} className="flex justify-between gap-2">
              <span>{p.name}</span>
              <span className="text-sm text-ink-soft">{ROLE_LABELS[p.role]}{p.treasurer ? " · treasurer" : ""}</span>
            </li>
          ))}
          {!committee.length && <li className="text-ink-soft">No committee members yet.</li>}
        </ul>
        <p className="mt-3 text-sm text-ink-soft">You take part as {ROLE_LABELS[c.yourRole as keyof typeof ROLE_LABELS]?.toLowerCase()}.</p>
      </Card>
    </div>
  );
}
