import "server-only";
import sharp, { type Sharp } from "sharp";
import { MAX_PIXELS, THUMBNAIL_WIDTH } from "./limits";
import { describeTrailing, hasZipDirectory, isPadding, jpegEnd, pngEnd, webpEnd, type End } from "./structure";
import type { Problem } from "./types";

export type ImageKind = "png" | "jpeg" | "webp";

export type NormalizedImage = { normalized: Uint8Array; thumbnail: Uint8Array; width: number; height: number };

const END: Record<ImageKind, (b: Uint8Array) => End> = { png: pngEnd, jpeg: jpegEnd, webp: webpEnd };

const corrupt = (shown: string): NonNullable<Problem> => ({
  code: "corrupt",
  message: `${shown} seems to be damaged or cut short, so the picture cannot be read in full. Export or copy it again and retry.`,
});

/** Refuses data after the image's end, except zero padding and (JPEG) further embedded pictures. */
export function checkTrailing(kind: ImageKind, bytes: Uint8Array, shown: string): Problem {
  const end = END[kind](bytes);
  if (end === "truncated") return corrupt(shown);
  const hidden = (what: string): Problem => ({
    code: "polyglot",
    message: `${shown} has another file hidden in it (${what}). Files like this can be read as two different things, so it is refused; open the picture and save it again.`,
  });
  if (hasZipDirectory(bytes)) return hidden("it looks like a ZIP archive");
  const tail = bytes.subarray(end);
  if (tail.length === 0 || isPadding(tail)) return null;
  const what = describeTrailing(tail);
  const extraPictures = kind === "jpeg" && tail[0] === 0xff && tail[1] === 0xd8 && tail[2] === 0xff;
  if (extraPictures && what === "data that is not part of the picture") return null;
  return hidden(`after the end of the picture: ${what}`);
}

function encoder(kind: ImageKind, image: Sharp): Sharp {
  if (kind === "png") return image.png({ compressionLevel: 6 });
  if (kind === "jpeg") return image.jpeg({ quality: 90 });
  return image.webp({ quality: 90 });
}

/**
 * Decodes the whole image (refusing truncated or corrupt pixel data and more than MAX_PIXELS),
 * applies its orientation, and re-encodes it in the same format without any metadata; then
 * makes a WebP thumbnail about THUMBNAIL_WIDTH wide.
 */
export async function normalizeImage(
  kind: ImageKind,
  bytes: Uint8Array,
  shown: string,
): Promise<{ problem: NonNullable<Problem> } | { image: NormalizedImage }> {
  let meta: sharp.Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    return { problem: corrupt(shown) };
  }
  if (meta.format !== kind || !meta.width || !meta.height) return { problem: corrupt(shown) };
  if (meta.width * meta.height > MAX_PIXELS) {
    const megapixels = Math.round((meta.width * meta.height) / 1e6).toLocaleString("en-GB");
    return {
      problem: {
        code: "too_many_pixels",
        message: `${shown} is ${meta.width.toLocaleString("en-GB")} × ${meta.height.toLocaleString("en-GB")} pixels (${megapixels} megapixels), over the limit of ${MAX_PIXELS / 1e6} megapixels. Scale it down and try again.`,
      },
    };
  }
  try {
    const input = sharp(bytes, { failOn: "error", limitInputPixels: MAX_PIXELS }).rotate();
    const { data, info } = await encoder(kind, input).toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(data)
      .resize({ width: THUMBNAIL_WIDTH, height: THUMBNAIL_WIDTH * 3, fit: "inside", withoutEnlargement: true })
      .webp({ quality: 80 })
      .toBuffer();
    return { image: { normalized: new Uint8Array(data), thumbnail: new Uint8Array(thumbnail), width: info.width, height: info.height } };
  } catch {
    return { problem: corrupt(shown) };
  }
}
