import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { exportRecord } from "@/lib/dal/trail";
import { idParam } from "@/lib/route-ids";

export const dynamic = "force-dynamic";

/** The commission's decision trail as a JSON record anyone can verify offline. */
export const GET = handle(async (_req: Request, ctx: { params: Promise<{ commissionId: string }> }) => {
  const { commissionId } = await ctx.params;
  const record = await exportRecord(await requireViewer(), idParam(commissionId));
  return new Response(JSON.stringify(record, null, 2), {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="placet-record-commission-${record.commission.id}.json"`,
      "cache-control": "private, no-store",
    },
  });
});
