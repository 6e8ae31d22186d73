import { handle, readJson } from "@/lib/http";
import { requireViewer } from "@/lib/session";
import { setNoticePreference } from "@/lib/dal/comments";

export const dynamic = "force-dynamic";

/** The signed-in person's choice of notices: { notices: "immediate" | "digest" }. */
export const PATCH = handle(async (req: Request) => {
  const viewer = await requireViewer();
  return Response.json(await setNoticePreference(viewer, await readJson(req)), { headers: { "cache-control": "private, no-store" } });
});
