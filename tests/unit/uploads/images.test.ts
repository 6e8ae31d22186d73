import sharp from "sharp";
import { describe, expect, it } from "vitest";
import * as f from "./fixtures";
import { expectAccepted, expectRefused } from "./helpers";

describe("broken images", () => {
  it("refuses a truncated PNG", async () => {
    const bytes = await f.png();
    await expectRefused("elevation.png", bytes.subarray(0, Math.floor(bytes.length / 2)), "corrupt", /damaged or cut short/);
  });

  it("refuses a PNG cut just before its end chunk", async () => {
    const bytes = await f.png();
    await expectRefused("elevation.png", bytes.subarray(0, bytes.length - 12), "corrupt");
  });

  it("refuses a truncated JPEG", async () => {
    const bytes = await f.jpeg();
    await expectRefused("site.jpg", bytes.subarray(0, Math.floor(bytes.length * 0.6)), "corrupt", /damaged or cut short/);
  });

  it("refuses a JPEG missing only its end marker", async () => {
    const bytes = await f.jpeg();
    await expectRefused("site.jpg", bytes.subarray(0, bytes.length - 2), "corrupt");
  });

  it("refuses a truncated WebP", async () => {
    const bytes = await f.webp();
    await expectRefused("render.webp", bytes.subarray(0, bytes.length - 100), "corrupt");
  });

  it("refuses a PNG whose pixel data was scrambled", async () => {
    const bytes = await f.png();
    for (let i = 200; i < 260; i++) bytes[i] = bytes[i]! ^ 0x5a;
    await expectRefused("elevation.png", bytes, "corrupt");
  });

  it("refuses a PNG header claiming 100000 × 100000 pixels without decoding it", async () => {
    const started = Date.now();
    await expectRefused("bomb.png", f.pngClaiming(100_000, 100_000), "too_many_pixels", /100,000 × 100,000 pixels.*40 megapixels/);
    expect(Date.now() - started).toBeLessThan(2000);
  });

  it("refuses a real image just over 40 megapixels", async () => {
    const big = await sharp({ create: { width: 8000, height: 5001, channels: 3, background: "#fff" } }).png().toBuffer();
    await expectRefused("huge.png", new Uint8Array(big), "too_many_pixels", /8,000 × 5,001/);
  });
});

describe("polyglots", () => {
  it("refuses a PNG with a web page appended after IEND", async () => {
    const bytes = f.cat(await f.png(), f.enc("<html><script>alert(1)</script></html>"));
    await expectRefused("drawing.png", bytes, "polyglot", /web page or script/);
  });

  it("refuses a PNG with a ZIP appended after IEND", async () => {
    await expectRefused("drawing.png", f.zipAfter(await f.png()), "polyglot", /ZIP archive/);
  });

  it("refuses a PNG that hides a readable ZIP in a chunk before IEND", async () => {
    const base = await f.png(32, 32);
    const hidden = f.withChunk(base, f.pngChunk("zIPp", f.zipAt(8 + 12 + 13 + 8)));
    await expectRefused("drawing.png", hidden, "polyglot", /ZIP archive/);
  });

  it("accepts a PNG with a private chunk, and drops the chunk on re-encoding", async () => {
    const base = await f.png(32, 32);
    const marked = f.withChunk(base, f.pngChunk("prVt", f.enc("studio-private-note")));
    const ok = await expectAccepted("drawing.png", marked);
    expect(Buffer.from(ok.normalized).includes(Buffer.from("studio-private-note"))).toBe(false);
  });

  it("refuses a JPEG with a ZIP appended", async () => {
    await expectRefused("site.jpg", f.zipAfter(await f.jpeg()), "polyglot", /ZIP archive/);
  });

  it("refuses a JPEG with a script appended", async () => {
    await expectRefused("site.jpg", f.cat(await f.jpeg(), f.enc("<?php system($_GET['c']); ?>")), "polyglot", /script/);
  });

  it("refuses a JPEG carrying a video clip after its end", async () => {
    const clip = f.cat(new Uint8Array([0, 0, 0, 0x18]), f.enc("ftypmp42"), new Uint8Array(64).fill(7));
    await expectRefused("motion.jpg", f.cat(await f.jpeg(), clip), "polyglot", /motion-photo/);
  });

  it("refuses a WebP with data after its RIFF end", async () => {
    await expectRefused("render.webp", f.cat(await f.webp(), f.enc("<svg onload=alert(1)>")), "polyglot");
  });

  it("accepts a JPEG followed by a second embedded picture, as phones write", async () => {
    const ok = await expectAccepted("phone.jpg", f.cat(await f.jpeg(), await f.jpeg(64, 48)));
    expect(ok.width).toBe(640);
  });
});
