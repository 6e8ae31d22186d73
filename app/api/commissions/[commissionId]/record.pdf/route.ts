import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { decisionRecordFor } from "@/lib/dal/record";
import { env } from "@/lib/env";
import { renderDecisionRecordPdf } from "@/lib/record-pdf";
import { idParam } from "@/lib/route-ids";

export const dynamic = "force-dynamic";

/** The printable decision record (PDF) for the minutes and advisory bodies. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ commissionId: string }> }) => {
  const { commissionId } = await ctx.params;
  const record = await decisionRecordFor(await requireViewer(), idParam(commissionId));
  const pdf = await renderDecisionRecordPdf(record, { verifyUrl: `${env.appUrl}/verify` });
  return new Response(Buffer.from(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="placet-decision-record-commission-${record.commission.id}.pdf"`,
      "content-length": String(pdf.byteLength),
      "cache-control": "private, no-store",
    },
  });
});
