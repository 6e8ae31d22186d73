import "server-only";
import { headers } from "next/headers";
import { requestSignInLink } from "./auth";
import { decisionSignInTarget } from "./dal/decisions";
import type { Viewer } from "./dal/viewer";
import { ValidationError } from "./errors";
import { clientIp } from "./request-info";

/**
 * E-mails the chair a fresh sign-in link leading back to the revision, so they can confirm who they are
 * before recording a decision. Only the commission's chair may ask; the link goes to their own address,
 * through the same limits and outbox as every other sign-in link.
 */
export async function sendDecisionSignInLink(viewer: Viewer, revisionId: number): Promise<{ email: string }> {
  const { email, path } = await decisionSignInTarget(viewer, revisionId);
  let outcome;
  try {
    outcome = await requestSignInLink({ email, ip: clientIp(await headers()), next: path, reason: `confirm identity before a decision on revision ${revisionId}` });
  } catch (err) {
    console.error("confirmation link could not be queued", err);
    throw new ValidationError({ _form: "The link could not be sent just now. Please try again in a minute." });
  }
  if (outcome !== "queued") {
    throw new ValidationError({ _form: "Several links have been sent to you in the last few minutes. Use the newest one in your inbox, or try again in a quarter of an hour." });
  }
  return { email };
}
