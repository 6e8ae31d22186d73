/** Limits on attachments. Free of server-only imports so the upload form can check early too. */
export const MAX_FILE_BYTES = 25 * 1024 * 1024;
export const MAX_FILES_PER_REVISION = 40;
/** Largest image we decode: 40 megapixels (a 7,300 × 5,500 photo is about that). */
export const MAX_PIXELS = 40_000_000;
export const THUMBNAIL_WIDTH = 480;
export const MAX_NAME_LENGTH = 200;

export type CountCheck =
  | { ok: true; remaining: number }
  | { ok: false; field: "file"; code: "too_many_files"; message: string; remaining: number };

/** May `adding` more files join a revision that already holds `existingCount`? */
export function countCheck(existingCount: number, adding: number): CountCheck {
  const valid = (n: number) => Number.isInteger(n) && n >= 0;
  if (!valid(existingCount) || !valid(adding)) {
    return {
      ok: false,
      field: "file",
      code: "too_many_files",
      message: "The number of files could not be counted; try the upload again.",
      remaining: 0,
    };
  }
  const remaining = Math.max(0, MAX_FILES_PER_REVISION - existingCount);
  if (adding <= remaining) return { ok: true, remaining: remaining - adding };
  const room =
    remaining === 0 ? "it is full" : `there is room for ${remaining} more file${remaining === 1 ? "" : "s"}`;
  return {
    ok: false,
    field: "file",
    code: "too_many_files",
    message: `A revision can hold at most ${MAX_FILES_PER_REVISION} files. This one has ${existingCount}, so ${room}; you tried to add ${adding}.`,
    remaining,
  };
}
