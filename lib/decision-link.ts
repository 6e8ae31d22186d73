import "server-only";
import { signIn } from "./auth";
import { decisionSignInTarget } from "./dal/decisions";
import type { Viewer } from "./dal/viewer";
import { ValidationError } from "./errors";
import { signInLinksRecently, SIGN_IN_LINKS_PER_WINDOW } from "./rate-limit";
import { logSecurity } from "./security-log";

/**
 * E-mails the chair a fresh sign-in link leading back to the revision, so they can confirm who they are
 * before recording a decision. Only the commission's chair may ask; the link goes to their own address.
 */
export async function sendDecisionSignInLink(viewer: Viewer, revisionId: number): Promise<{ email: string }> {
  const { email, path } = await decisionSignInTarget(viewer, revisionId);
  if ((await signInLinksRecently(email)) >= SIGN_IN_LINKS_PER_WINDOW) {
    throw new ValidationError({ _form: "Several links have been sent to you in the last few minutes. Use the newest one in your inbox, or try again in a quarter of an hour." });
  }
  try {
    await signIn("nodemailer", { email, redirect: false, redirectTo: path });
  } catch (err) {
    console.error("confirmation link could not be sent", err);
    throw new ValidationError({ _form: "The link could not be sent just now. Please try again in a minute." });
  }
  await logSecurity({ userId: viewer.id, email, action: "sign-in link sent", detail: { reason: "confirm identity before a decision", revisionId } });
  return { email };
}
