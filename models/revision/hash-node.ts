import { createHash } from "node:crypto";
import { contentHashInput, type RevisionContent } from "./content";

/** Lowercase hex SHA-256 of the revision's canonical content (server side). */
export function revisionContentHash(content: RevisionContent): string {
  return createHash("sha256").update(contentHashInput(content), "utf8").digest("hex");
}
