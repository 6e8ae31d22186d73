import { createHash } from "node:crypto";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import * as f from "./fixtures";
import { expectAccepted } from "./helpers";

const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

describe("good files", () => {
  it("accepts a PNG, re-encodes it and makes a 480 px WebP thumbnail", async () => {
    const input = await f.png(1200, 800);
    const ok = await expectAccepted("Elevation A.png", input);
    expect(ok).toMatchObject({ kind: "png", mime: "image/png", width: 1200, height: 800, safeName: "Elevation A.png" });
    expect(ok.sha256).toBe(sha(ok.normalized));
    expect(ok.originalSha256).toBe(sha(input));
    expect((await sharp(ok.normalized).metadata()).format).toBe("png");
    const thumb = await sharp(ok.thumbnail!).metadata();
    expect(thumb).toMatchObject({ format: "webp", width: 480, height: 320 });
  });

  it("does not enlarge a small image for its thumbnail", async () => {
    const ok = await expectAccepted("detail.png", await f.png(200, 100));
    expect((await sharp(ok.thumbnail!).metadata()).width).toBe(200);
  });

  it("accepts a JPEG, applies its orientation and strips its metadata", async () => {
    const input = await f.orientedJpeg();
    expect((await sharp(input).metadata()).orientation).toBe(6);
    expect(Buffer.from(input).includes(Buffer.from("Secret Studio Archive"))).toBe(true);
    const ok = await expectAccepted("site photo.jpeg", input);
    expect(ok).toMatchObject({ kind: "jpeg", mime: "image/jpeg", width: 100, height: 300 });
    const meta = await sharp(ok.normalized).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    expect(Buffer.from(ok.normalized).includes(Buffer.from("Secret Studio Archive"))).toBe(false);
    expect((await sharp(ok.thumbnail!).metadata()).width).toBe(100);
  });

  it("accepts a WebP", async () => {
    const ok = await expectAccepted("render.webp", await f.webp(960, 540));
    expect(ok).toMatchObject({ kind: "webp", mime: "image/webp", width: 960, height: 540 });
    expect((await sharp(ok.normalized).metadata()).format).toBe("webp");
    expect((await sharp(ok.thumbnail!).metadata()).width).toBe(480);
  });

  it("accepts a hand-built PDF with a correct cross-reference table, kept byte for byte", async () => {
    const input = f.plainHandPdf();
    const ok = await expectAccepted("specification.pdf", input);
    expect(ok).toMatchObject({ kind: "pdf", mime: "application/pdf", pages: 1 });
    expect(ok.normalized).toBe(input);
    expect(ok.sha256).toBe(sha(input));
    expect(ok.thumbnail).toBeUndefined();
  });

  it("accepts a two-page PDF from pdf-lib, with and without object streams", async () => {
    for (const streams of [true, false]) {
      const ok = await expectAccepted("drawings.pdf", await f.libPdf(undefined, streams));
      expect(ok.pages).toBe(2);
    }
  });

  it("accepts bytes given as an ArrayBuffer", async () => {
    const bytes = await f.png(20, 20);
    const buffer = bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
    const { inspectUpload } = await import("@/lib/uploads");
    expect((await inspectUpload({ name: "a.png", bytes: buffer })).ok).toBe(true);
  });
});
