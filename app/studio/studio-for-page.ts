import "server-only";
import { notFound } from "next/navigation";
import { viewerOrSignIn } from "@/lib/session";
import { getStudio } from "@/lib/dal/studio";
import { ForbiddenError } from "@/lib/errors";

/** The viewer's studio for a page; someone on no studio's staff gets "not found". */
export async function studioForPage(path: string) {
  const viewer = await viewerOrSignIn(path);
  try {
    return { viewer, studio: await getStudio(viewer) };
  } catch (err) {
    if (err instanceof ForbiddenError) notFound();
    throw err;
  }
}
