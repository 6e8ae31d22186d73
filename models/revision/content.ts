import canonicalize from "canonicalize";

/** What a circulated revision freezes; the content hash is SHA-256 over its RFC 8785 canonical JSON. */
export interface RevisionContent {
  commissionId: number;
  number: number;
  kind: "font";
  params: Record<string, unknown>;
  figures: Record<string, unknown>;
  note: string;
  attachments: { name: string; caption: string; kind: string; sha256: string; position: number }[];
}

export function revisionContent(input: RevisionContent): RevisionContent {
  return {
    commissionId: input.commissionId,
    number: input.number,
    kind: input.kind,
    params: input.params,
    figures: input.figures,
    note: input.note,
    attachments: [...input.attachments]
      .sort((a, b) => a.position - b.position || a.sha256.localeCompare(b.sha256))
      .map((a) => ({ name: a.name, caption: a.caption, kind: a.kind, sha256: a.sha256, position: a.position })),
  };
}

/** The exact text hashed for a revision's content hash. */
export function contentHashInput(content: RevisionContent): string {
  const text = canonicalize(revisionContent(content));
  if (text === undefined) throw new Error("revision content cannot be canonicalised");
  return text;
}
