import { handle } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { listCommissions } from "@/lib/dal/commissions";

export const dynamic = "force-dynamic";

/** The signed-in person's commissions, for the client-side list. */
export const GET = handle(async () => {
  const viewer = await requireViewer();
  return Response.json({ commissions: await listCommissions(viewer) });
});
