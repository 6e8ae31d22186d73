import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { commissionForPage } from "@/lib/page-data";
import { listRevisions } from "@/lib/dal/revisions-read";
import { Card } from "@/components/ui/card";
import { NewDraftForm } from "./new-draft-form";

export const metadata: Metadata = { title: "Draft a revision" };

export default async function NewRevisionPage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/revisions/new`);
  if (!c.you.can["revision.draft"]) notFound();
  const revs = await listRevisions(viewer, c.id);
  const draft = revs.find((r) => r.state === "draft");
  return (
    <Card title={`Draft Revision ${(revs[0]?.number ?? 0) + 1}`} className="max-w-2xl">
      {draft ? <p>Revision {draft.number} is still a draft. <a href={`/commissions/${c.id}/revisions/${draft.number}/edit`}>Carry on with it</a>.</p> : <NewDraftForm commissionId={c.id} basedOn={revs[0]?.number ?? null} />}
    </Card>
  );
}
