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
      {c.rulesEditable ? <RulesForm commissionId={c.id} rules={c.rules} /> : <p>The rules are fixed now that a ballot has been held.</p>}
    </Card>
  );
}
