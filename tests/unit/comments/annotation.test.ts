import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  ANNO_CONTENT_TYPE, MEDIA_FRAGS, formatModelPoint, modelPointTarget, parseModelPoint, parsePercentSelector, tapTarget,
  toAnnotationCollection, type AnnotatableThread, type ModelPoint,
} from "@/models/comments";

const BASE = "https://placet.example.test/";
const rev = { id: 31, commissionId: 5, number: 2 };
const ruth = { id: "0b7e4c1a-2f1d-4c3b-9a8e-6d5f4e3c2b1a", name: "Ruth Penhallow" };
const elias = { id: "b1c2d3e4-f5a6-4b7c-8d9e-0f1a2b3c4d5e", name: "Elias Brandt" };

const threads: AnnotatableThread[] = [
  {
    id: 11, body: "Is the rim <b>too thin</b>?", author: ruth, createdAt: "2026-12-01T10:00:00.000Z", editedAt: "2026-12-01T10:04:00.000Z",
    target: tapTarget(7, 25, 40), resolved: false,
    replies: [{ id: 14, body: "It is 12 mm; we can go to 15.", author: elias, createdAt: "2026-12-01T11:00:00.000Z", editedAt: null }],
  },
  { id: 12, body: "Happy with the proportions.", author: elias, createdAt: "2026-12-01T10:30:00.000Z", editedAt: null, target: { kind: "revision" }, resolved: true, replies: [] },
  { id: 13, body: "Chip risk here.", author: ruth, createdAt: "2026-12-01T12:00:00.000Z", editedAt: null, target: modelPointTarget("bowl", [210, -35.5, 830]), resolved: false, replies: [] },
];

describe("comments as a Web Annotation collection (Web Annotation Data Model, W3C Recommendation 2017)", () => {
  const c = toAnnotationCollection(rev, threads, BASE);
  const items = c.first.items;

  it("§5.1/§5.2: an AnnotationCollection with the anno.jsonld context and its first page embedded, as in the model's collection example", () => {
    expect(c["@context"]).toBe("http://www.w3.org/ns/anno.jsonld");
    expect(c.type).toBe("AnnotationCollection");
    expect(c.id).toBe("https://placet.example.test/api/revisions/31/annotations");
    expect(c.total).toBe(4);
    expect(c.first).toMatchObject({ type: "AnnotationPage", startIndex: 0 });
    expect(items.map((a) => a.type)).toEqual(["Annotation", "Annotation", "Annotation", "Annotation"]);
    expect(new Set(items.map((a) => a.id)).size).toBe(4);
    expect(ANNO_CONTENT_TYPE).toBe('application/ld+json; profile="http://www.w3.org/ns/anno.jsonld"');
  });

  it("§3.2.4/§3.3.5: the text is an embedded TextualBody in text/plain with the purpose commenting — HTML kept as text", () => {
    expect(items[0].body).toEqual({ type: "TextualBody", value: "Is the rim <b>too thin</b>?", format: "text/plain", purpose: "commenting" });
    expect(items[0].motivation).toBe("commenting");
  });

  it("§3.3.1/§3.3.2: creator as a Person with a name, created and modified times", () => {
    expect(items[0].creator).toEqual({ id: "urn:uuid:0b7e4c1a-2f1d-4c3b-9a8e-6d5f4e3c2b1a", type: "Person", name: "Ruth Penhallow" });
    expect(items[0].created).toBe("2026-12-01T10:00:00.000Z");
    expect(items[0].modified).toBe("2026-12-01T10:04:00.000Z");
    expect("modified" in items[1]).toBe(false);
  });

  it("§4.2.1: a place on a drawing is the file refined by a FragmentSelector conforming to Media Fragments", () => {
    // The model's Fragment Selector example has this shape: { source, selector: { type, conformsTo, value } }.
    expect(items[0].target).toEqual({
      source: "https://placet.example.test/api/attachments/7/file",
      selector: { type: "FragmentSelector", conformsTo: MEDIA_FRAGS, value: "xywh=percent:24,39,2,2" },
      scope: "https://placet.example.test/commissions/5/revisions/2",
    });
    expect(MEDIA_FRAGS).toBe("http://www.w3.org/TR/media-frags/");
  });

  it("a reply targets the annotation it answers, with the purpose replying", () => {
    expect(items[1]).toMatchObject({
      id: "https://placet.example.test/commissions/5/revisions/2#comment-14",
      motivation: "replying",
      target: items[0].id,
      body: { type: "TextualBody", value: "It is 12 mm; we can go to 15.", format: "text/plain", purpose: "replying" },
    });
  });

  it("the whole revision is targeted by its address; a resolved thread carries a 'resolved' tag body", () => {
    expect(items[2].target).toEqual({ source: "https://placet.example.test/commissions/5/revisions/2" });
    expect(items[2].body).toEqual([
      { type: "TextualBody", value: "Happy with the proportions.", format: "text/plain", purpose: "commenting" },
      { type: "TextualBody", value: "resolved", format: "text/plain", purpose: "tagging" },
    ]);
  });

  it("a point on the model is the revision refined by a model-point FragmentSelector", () => {
    expect(items[3].target).toEqual({
      source: "https://placet.example.test/commissions/5/revisions/2",
      selector: { type: "FragmentSelector", conformsTo: "https://placet.example.test/api/formats/model-point", value: "part=bowl&xyz=210,-35.5,830" },
    });
  });

  it("uses only terms the anno.jsonld context defines", () => {
    const terms = new Set(["@context", "id", "type", "label", "total", "first", "startIndex", "items", "motivation", "creator", "name", "created",
      "modified", "body", "value", "format", "purpose", "target", "source", "selector", "conformsTo", "scope"]);
    const walk = (v: unknown): void => {
      if (Array.isArray(v)) return v.forEach(walk);
      if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) { expect(terms).toContain(k); walk(x); }
    };
    walk(c);
  });

  it("every drawing selector in the output parses back to the stored place", () => {
    for (const a of items) {
      const t = a.target;
      if (typeof t !== "string" && t.selector?.conformsTo === MEDIA_FRAGS) expect(parsePercentSelector(t.selector.value)).not.toBeNull();
    }
  });
});

describe("model-point fragments", () => {
  it("format ∘ parse round-trips", () => {
    const n = fc.integer({ min: -30000, max: 30000 }).map((v) => v / 10);
    fc.assert(fc.property(fc.constantFrom("bowl", "foot", "pedestal") as fc.Arbitrary<"bowl" | "foot" | "pedestal">, n, n, n, (part, x, y, z) => {
      const point: ModelPoint = [x, y, z];
      const s = formatModelPoint(part, point);
      expect(parseModelPoint(s)).toEqual({ part, point: point.map((v) => v + 0) });
      expect(formatModelPoint(part, parseModelPoint(s)!.point)).toBe(s);
    }), { numRuns: 500 });
  });
  it.each(["part=lid&xyz=1,2,3", "part=bowl&xyz=1,2", "part=bowl&xyz=1,2,3.25", "part=bowl&xyz=1,2,3001", "xyz=1,2,3&part=bowl"])("refuses %j", (s) => {
    expect(parseModelPoint(s)).toBeNull();
  });
});
