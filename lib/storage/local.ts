import "server-only";
import { randomBytes } from "node:crypto";
import { mkdir, open, readFile, rename, rm, stat, unlink } from "node:fs/promises";
import path from "node:path";
import { assertBytes, assertContentType, assertKey, type Storage } from "./types";

/** Errors that mean "nothing is stored there" (including a key whose parent is a file). */
const MISSING = new Set(["ENOENT", "ENOTDIR"]);
const isMissing = (err: unknown) => MISSING.has((err as NodeJS.ErrnoException)?.code ?? "");

/**
 * Files on local disk under `root`, one file per key (`a/b` → `<root>/a/b`). The content type is
 * not kept: the database records it beside the key. Writes go to a temporary file in the same
 * directory (its name has a dot, which no key can have) and are renamed into place, so a reader
 * never sees half a file.
 */
export class LocalStorage implements Storage {
  readonly root: string;

  constructor(root: string) {
    this.root = path.resolve(root);
  }

  /** The file for a key; refuses anything that would land outside the root. */
  pathFor(key: string): string {
    assertKey(key);
    const full = path.resolve(this.root, key);
    if (!full.startsWith(this.root + path.sep)) throw new Error("Storage key escapes the storage root.");
    return full;
  }

  async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
    const target = this.pathFor(key);
    assertBytes(bytes);
    assertContentType(contentType);
    const dir = path.dirname(target);
    await mkdir(dir, { recursive: true });
    const temp = path.join(dir, `.${path.basename(target)}.${randomBytes(8).toString("hex")}.tmp`);
    try {
      const handle = await open(temp, "wx", 0o640);
      try {
        await handle.writeFile(bytes);
        await handle.sync();
      } finally {
        await handle.close();
      }
      await rename(temp, target);
    } catch (err) {
      await rm(temp, { force: true }).catch(() => undefined);
      throw err;
    }
  }

  async get(key: string): Promise<Uint8Array | null> {
    const target = this.pathFor(key);
    try {
      return new Uint8Array(await readFile(target));
    } catch (err) {
      if (isMissing(err) || (err as NodeJS.ErrnoException).code === "EISDIR") return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    const target = this.pathFor(key);
    try {
      await unlink(target);
    } catch (err) {
      if (!isMissing(err)) throw err;
    }
  }

  async exists(key: string): Promise<boolean> {
    const target = this.pathFor(key);
    try {
      return (await stat(target)).isFile();
    } catch (err) {
      if (isMissing(err)) return false;
      throw err;
    }
  }
}
