import { describe, expect, it } from "vitest";
import sharp from "sharp";
import { demoImages } from "@/db/demo-images";
import { inspectUpload } from "@/lib/uploads";
import { defaultFontParameters, type FontParameters } from "@/models/font";

const second: FontParameters = { ...defaultFontParameters, rimRadius: 300, depth: 170, engravingCount: 4, engravingStartAngle: 45 };

describe("demo drawings", () => {
  it("draws a section elevation and a plan as PNG and a soft render as JPEG, each accepted by the upload checks", async () => {
    const images = await demoImages(defaultFontParameters);
    expect(images.map((i) => i.name)).toEqual(["section-elevation.png", "engraving-plan.png", "render.jpg"]);
    const formats = await Promise.all(images.map(async (i) => (await sharp(i.bytes).metadata()).format));
    expect(formats).toEqual(["png", "png", "jpeg"]);
    for (const i of images) {
      const r = await inspectUpload({ name: i.name, bytes: new Uint8Array(i.bytes) });
      expect(r.ok, r.ok ? "" : r.message).toBe(true);
      expect(i.caption.length).toBeGreaterThan(0);
      expect(i.caption.length).toBeLessThanOrEqual(500);
    }
  });

  it("draws each revision's own shape: different parameters give different drawings and captions", async () => {
    const [a, b] = await Promise.all([demoImages(defaultFontParameters), demoImages(second)]);
    for (let k = 0; k < 3; k++) expect(a[k].bytes.equals(b[k].bytes)).toBe(false);
    expect(a[0].caption).toContain("560 mm");
    expect(b[0].caption).toContain("600 mm");
    expect(b[1].caption).toContain("4 engravings");
  });

  it("copes with a font without engravings", async () => {
    const images = await demoImages({ ...defaultFontParameters, engravingCount: 0 });
    expect(images[1].caption).toBe("Plan: no engravings");
  });
});
