/**
 * Comments as a W3C Web Annotation collection (Web Annotation Data Model, W3C Recommendation
 * 23 February 2017), so they can leave Placet in an open format:
 * - §5.1 Annotation Collection with its first (and only) §5.2 Annotation Page embedded, holding the items;
 * - each comment an Annotation (§3.1) with an embedded TextualBody (§3.2.4) in text/plain, whose purpose
 *   is "commenting", or "replying" for a reply (§3.3.5 Motivation and Purpose); creator, created and
 *   modified as in §3.3.1 Lifecycle Information and §3.3.2 Agents;
 * - a thread's first comment targets what it is pinned to (§4 Specific Resources): the revision itself;
 *   an attachment's file refined by a FragmentSelector conforming to Media Fragments (§4.2.1), scoped to
 *   the revision (§4.6); or the revision refined by a FragmentSelector in Placet's model-point syntax;
 * - a reply targets the annotation it answers;
 * - a resolved thread carries a second TextualBody, "resolved", with the purpose "tagging".
 */
import { MODEL_POINT_FORMAT_PATH, formatModelPoint } from "./model-point";
import type { CommentDto, ThreadDto } from "./dto";

export const ANNO_CONTEXT = "http://www.w3.org/ns/anno.jsonld";
export const MEDIA_FRAGS = "http://www.w3.org/TR/media-frags/";
export const ANNO_CONTENT_TYPE = `application/ld+json; profile="${ANNO_CONTEXT}"`;

export interface AnnotatedRevision {
  id: number;
  commissionId: number;
  number: number;
}

type Person = Pick<CommentDto["author"], "id" | "name">;
export type AnnotatableComment = Pick<CommentDto, "id" | "body" | "createdAt" | "editedAt"> & { author: Person };
export type AnnotatableThread = AnnotatableComment & Pick<ThreadDto, "target" | "resolved"> & { replies: AnnotatableComment[] };

export interface TextualBody {
  type: "TextualBody";
  value: string;
  format: "text/plain";
  purpose: "commenting" | "replying" | "tagging";
}
export interface FragmentSelector {
  type: "FragmentSelector";
  conformsTo: string;
  value: string;
}
export interface AnnotationTarget {
  source: string;
  selector?: FragmentSelector;
  scope?: string;
}
export interface Annotation {
  id: string;
  type: "Annotation";
  motivation: "commenting" | "replying";
  creator: { id: string; type: "Person"; name: string };
  created: string;
  modified?: string;
  body: TextualBody | TextualBody[];
  target: AnnotationTarget | string;
}
export interface AnnotationCollection {
  "@context": typeof ANNO_CONTEXT;
  id: string;
  type: "AnnotationCollection";
  label: string;
  total: number;
  first: { id: string; type: "AnnotationPage"; startIndex: 0; items: Annotation[] };
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function revisionUrl(baseUrl: string, r: AnnotatedRevision): string {
  return `${trim(baseUrl)}/commissions/${r.commissionId}/revisions/${r.number}`;
}
export function attachmentFileUrl(baseUrl: string, attachmentId: number): string {
  return `${trim(baseUrl)}/api/attachments/${attachmentId}/file`;
}
export function annotationId(baseUrl: string, r: AnnotatedRevision, commentId: number): string {
  return `${revisionUrl(baseUrl, r)}#comment-${commentId}`;
}
const trim = (u: string) => u.replace(/\/+$/, "");

function personIri(baseUrl: string, id: string): string {
  return UUID.test(id) ? `urn:uuid:${id.toLowerCase()}` : `${trim(baseUrl)}/people/${encodeURIComponent(id)}`;
}

function text(value: string, purpose: TextualBody["purpose"]): TextualBody {
  return { type: "TextualBody", value, format: "text/plain", purpose };
}

function common(baseUrl: string, c: AnnotatableComment) {
  return {
    creator: { id: personIri(baseUrl, c.author.id), type: "Person" as const, name: c.author.name },
    created: c.createdAt,
    ...(c.editedAt ? { modified: c.editedAt } : {}),
  };
}

function threadTarget(baseUrl: string, r: AnnotatedRevision, t: AnnotatableThread): AnnotationTarget {
  const page = revisionUrl(baseUrl, r);
  switch (t.target.kind) {
    case "revision":
      return { source: page };
    case "attachment":
      return {
        source: attachmentFileUrl(baseUrl, t.target.attachmentId),
        selector: { type: "FragmentSelector", conformsTo: MEDIA_FRAGS, value: t.target.selector },
        scope: page,
      };
    case "model":
      return {
        source: page,
        selector: { type: "FragmentSelector", conformsTo: `${trim(baseUrl)}${MODEL_POINT_FORMAT_PATH}`, value: formatModelPoint(t.target.part, t.target.point) },
      };
  }
}

export function toAnnotationCollection(revision: AnnotatedRevision, threads: AnnotatableThread[], baseUrl: string): AnnotationCollection {
  const items: Annotation[] = [];
  for (const t of threads) {
    const id = annotationId(baseUrl, revision, t.id);
    const body = text(t.body, "commenting");
    items.push({
      id, type: "Annotation", motivation: "commenting", ...common(baseUrl, t),
      body: t.resolved ? [body, text("resolved", "tagging")] : body,
      target: threadTarget(baseUrl, revision, t),
    });
    for (const r of t.replies) {
      items.push({
        id: annotationId(baseUrl, revision, r.id), type: "Annotation", motivation: "replying", ...common(baseUrl, r),
        body: text(r.body, "replying"), target: id,
      });
    }
  }
  const collection = `${trim(baseUrl)}/api/revisions/${revision.id}/annotations`;
  return {
    "@context": ANNO_CONTEXT,
    id: collection,
    type: "AnnotationCollection",
    label: `Comments on Revision ${revision.number}`,
    total: items.length,
    first: { id: `${collection}#page-1`, type: "AnnotationPage", startIndex: 0, items },
  };
}
