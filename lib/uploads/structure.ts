import "server-only";

/**
 * Where each container format says it ends, so that anything after the end — the usual way to
 * make a file that is also a ZIP, a web page or a script — can be refused.
 * Each returns the offset just past the image's last byte, or "truncated" when the structure
 * runs off the end of the data.
 */
export type End = number | "truncated";

const u32be = (b: Uint8Array, i: number) => ((b[i]! << 24) | (b[i + 1]! << 16) | (b[i + 2]! << 8) | b[i + 3]!) >>> 0;
const u32le = (b: Uint8Array, i: number) => (b[i]! | (b[i + 1]! << 8) | (b[i + 2]! << 16) | (b[i + 3]! << 24)) >>> 0;
const u16le = (b: Uint8Array, i: number) => b[i]! | (b[i + 1]! << 8);

export function pngEnd(b: Uint8Array): End {
  let i = 8;
  while (i + 12 <= b.length) {
    const length = u32be(b, i);
    const type = String.fromCharCode(b[i + 4]!, b[i + 5]!, b[i + 6]!, b[i + 7]!);
    const next = i + 12 + length;
    if (length > 0x7fffffff || next > b.length) return "truncated";
    if (type === "IEND") return next;
    i = next;
  }
  return "truncated";
}

export function jpegEnd(b: Uint8Array): End {
  if (b[0] !== 0xff || b[1] !== 0xd8) return "truncated";
  let i = 2;
  while (i < b.length) {
    while (i < b.length && b[i] !== 0xff) i++; // stray bytes between segments, which decoders skip
    while (b[i] === 0xff) i++; // fill bytes
    const marker = b[i++];
    if (marker === undefined) return "truncated";
    if (marker === 0xd9) return i; // end of image
    if (marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) continue; // no length
    if (i + 2 > b.length) return "truncated";
    const length = (b[i]! << 8) | b[i + 1]!;
    if (length < 2) return "truncated";
    i += length;
    if (marker !== 0xda) continue;
    // Entropy-coded data follows a start-of-scan: skip to the next real marker.
    while (i + 1 < b.length && !(b[i] === 0xff && b[i + 1] !== 0x00 && !(b[i + 1]! >= 0xd0 && b[i + 1]! <= 0xd7))) i++;
    if (i + 1 >= b.length) return "truncated";
  }
  return "truncated";
}

export function webpEnd(b: Uint8Array): End {
  if (b.length < 12) return "truncated";
  const end = 8 + u32le(b, 4);
  return end > b.length ? "truncated" : end;
}

/** True when a ZIP reader would find an archive directory at the end of the data. */
export function hasZipDirectory(b: Uint8Array): boolean {
  const from = Math.max(0, b.length - 65_557);
  for (let i = b.length - 22; i >= from; i--) {
    if (b[i] !== 0x50 || b[i + 1] !== 0x4b || b[i + 2] !== 0x05 || b[i + 3] !== 0x06) continue;
    const entries = u16le(b, i + 10);
    const size = u32le(b, i + 12);
    const offset = u32le(b, i + 16);
    const comment = u16le(b, i + 20);
    if (entries === 0 && size === 0 && i + 22 + comment === b.length) return true;
    if (offset + size <= i && b[offset] === 0x50 && b[offset + 1] === 0x4b && b[offset + 2] === 0x01 && b[offset + 3] === 0x02) {
      return true;
    }
  }
  return false;
}

const SIGNATURES: [RegExp, string][] = [
  [/pk\x03\x04|pk\x05\x06/u, "it looks like a ZIP archive"],
  [/<(script|html|svg|iframe|body|!doctype)|<\?php|javascript:/u, "it looks like a web page or script"],
  [/%pdf-/u, "it looks like a PDF"],
  [/^....ftyp/su, "such as a motion-photo video clip"],
];

/** A plain description of what trailing data looks like. */
export function describeTrailing(tail: Uint8Array): string {
  const text = Buffer.from(tail.buffer, tail.byteOffset, tail.byteLength).toString("latin1").toLowerCase();
  for (const [pattern, label] of SIGNATURES) if (pattern.test(text)) return label;
  return "data that is not part of the picture";
}

/** Zero padding after the end is harmless and some tools write it. */
export function isPadding(tail: Uint8Array): boolean {
  return tail.every((byte) => byte === 0x00);
}
