import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { commissionForPage, orNotFound, routeId } from "@/lib/page-data";
import { getRevisionByNumber } from "@/lib/dal/revisions-read";
import { settingsForCommission } from "@/lib/dal/studio";
import { DraftEditor } from "@/components/revision/DraftEditor";
import { DraftAttachments } from "@/components/revision/DraftAttachments";
import { defaultFontParameters, parseFontParameters } from "@/models/font";

export const metadata: Metadata = { title: "Edit draft" };

export default async function EditRevisionPage({ params }: { params: Promise<{ commissionId: string; number: string }> }) {
  const { commissionId, number } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/revisions/${number}/edit`);
  const rev = await orNotFound(getRevisionByNumber(viewer, c.id, routeId(number)));
  if (!rev.you.canEdit) {
    if (rev.state !== "draft") redirect(`/commissions/${c.id}/revisions/${rev.number}`);
    notFound();
  }
  const parsed = parseFontParameters(rev.params);
  const settings = await settingsForCommission(viewer, c.id);
  return (
    <div>
      <h2 className="mb-1 font-serif text-3xl font-semibold">Revision {rev.number} <span className="text-lg font-normal text-ink-soft">· draft, seen by the studio only</span></h2>
      <p className="mb-4 text-ink-soft">Changes save when you press Save; the figures update as you type.</p>
      <DraftEditor commissionId={c.id} number={rev.number} initialParams={parsed.ok ? parsed.params : defaultFontParameters}
        initialNote={rev.note} studioSettings={settings} units={viewer.units}
        committeeCount={c.people.filter((p) => p.side === "committee").length}
        attachments={<DraftAttachments revisionId={rev.id} initial={rev.attachments} />} />
    </div>
  );
}
