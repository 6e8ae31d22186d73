import type { Metadata } from "next";
import { commissionForPage } from "@/lib/page-data";
import { Card } from "@/components/ui/card";
import { ROLE_LABELS } from "@/models/permissions/policy";
import { InviteForm } from "./invite-form";

export const metadata: Metadata = { title: "People" };

export default async function PeoplePage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/people`);
  const groups = [
    { title: "The committee", people: c.people.filter((p) => p.side === "committee" && p.role !== "adviser") },
    { title: "Advisers (comment, no vote)", people: c.people.filter((p) => p.role === "adviser") },
    { title: `The studio — ${c.studioName}`, people: c.people.filter((p) => p.side === "studio") },
  ];
  return (
    <div className="grid gap-4 lg:grid-cols-3">
      <div className="grid gap-4 lg:col-span-2">
        {groups.map((g) => (
          <Card key={g.title} title={g.title}>
            <ul className="divide-y divide-line" data-testid={`people-${g.title.split(" ")[1]}`}>
              {g.people.map((p) => (
                <li key={p.userId} className="flex flex-wrap items-baseline justify-between gap-x-3 py-2">
                  <span className="font-medium">{p.name}</span>
                  <span className="text-sm text-ink-soft">{ROLE_LABELS[p.role]}{p.treasurer ? " · treasurer" : ""} · <span className="break-all">{p.email}</span></span>
                </li>
              ))}
              {!g.people.length && <li className="py-2 text-ink-soft">Nobody yet.</li>}
            </ul>
          </Card>
        ))}
      </div>
      {c.you.invitable.length > 0 && (
        <Card title="Invite someone">
          {c.openBallot && (
            <p className="mb-3 rounded-md border border-line bg-paper-deep p-3 text-sm" data-testid="roll-fixed-note">
              A ballot on Revision {c.openBallot.number} is open. Who may vote is fixed until it closes: inviting a member or chair,
              or changing anyone&apos;s role to or from member or chair, is refused until then (not queued). Advisers may still be invited.
            </p>
          )}
          <InviteForm commissionId={c.id} roles={c.you.invitable} />
        </Card>
      )}
    </div>
  );
}
