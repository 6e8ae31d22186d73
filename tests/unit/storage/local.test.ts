import { mkdtemp, readdir, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { LocalStorage, createStorage } from "@/lib/storage";
import { storageContract } from "./contract";

let root: string;
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), "placet-local-"));
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe("LocalStorage", () => {
  storageContract(() => new LocalStorage(root));

  it("keeps files under its root, in folders named by the key", async () => {
    const storage = new LocalStorage(root);
    await storage.put("c/7/file-1", new Uint8Array([1, 2, 3]), "image/png");
    expect((await stat(path.join(root, "c", "7", "file-1"))).size).toBe(3);
  });

  it("leaves no temporary files behind after writing", async () => {
    const storage = new LocalStorage(root);
    await Promise.all(
      Array.from({ length: 20 }, (_, i) => storage.put("race/same", new Uint8Array(1000).fill(i), "image/png")),
    );
    const names = await readdir(path.join(root, "race"));
    expect(names).toEqual(["same"]);
    const got = (await storage.get("race/same"))!;
    expect(new Set(got).size).toBe(1); // one whole write won, never a mix
  });

  it("treats a key below an existing file as missing", async () => {
    const storage = new LocalStorage(root);
    await storage.put("leaf", new Uint8Array([9]), "image/png");
    expect(await storage.get("leaf/child")).toBeNull();
    expect(await storage.exists("leaf/child")).toBe(false);
    await expect(storage.delete("leaf/child")).resolves.toBeUndefined();
  });

  it("treats a folder as not a stored file", async () => {
    const storage = new LocalStorage(root);
    await storage.put("dir/inner", new Uint8Array([1]), "image/png");
    expect(await storage.exists("dir")).toBe(false);
    expect(await storage.get("dir")).toBeNull();
  });
});

describe("createStorage", () => {
  it("defaults to local disk under .data/files", () => {
    const storage = createStorage({});
    expect(storage).toBeInstanceOf(LocalStorage);
    expect((storage as LocalStorage).root).toBe(path.join(process.cwd(), ".data", "files"));
  });

  it("uses STORAGE_DIR for the local root", () => {
    const storage = createStorage({ STORAGE_DRIVER: "local", STORAGE_DIR: root });
    expect((storage as LocalStorage).root).toBe(root);
  });

  it("names the missing settings for s3 and refuses unknown drivers", () => {
    expect(() => createStorage({ STORAGE_DRIVER: "s3", S3_BUCKET: "b" })).toThrow(
      /S3_ENDPOINT, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY/,
    );
    expect(() => createStorage({ STORAGE_DRIVER: "ftp" })).toThrow(/"local" or "s3"/);
  });
});
