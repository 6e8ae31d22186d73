import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { commissionForPage } from "@/lib/page-data";
import { Card } from "@/components/ui/card";
import { RulesForm } from "./rules-form";

export const metadata: Metadata = { title: "Ballot rules" };

export default async function RulesPage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/rules`);
  if (!c.you.can["rules.edit"]) notFound();
  return (
    <Card title="The committee's rules for deciding" className="max-w-2xl">
      {c.rulesEditable
        ? <RulesForm commissionId={c.id} rules={c.rules} confirmed={c.rulesConfirmed} />
        : <p>The rules cannot change while the ballot on Revision {c.openBallot?.number} is open; change them once it has closed.</p>}
    </Card>
  );
}
