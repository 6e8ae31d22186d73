import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { S3Storage, createStorage } from "@/lib/storage";
import { storageContract } from "./contract";

// s3rver accepts only its built-in account.
const env = {
  STORAGE_DRIVER: "s3",
  S3_BUCKET: "placet-test",
  S3_ACCESS_KEY_ID: "S3RVER",
  S3_SECRET_ACCESS_KEY: "S3RVER",
  S3_REGION: "us-east-1",
  S3_ENDPOINT: "",
};
let server: S3rver;
let dir: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "placet-s3-"));
  server = new S3rver({
    address: "127.0.0.1",
    port: 0,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: env.S3_BUCKET }],
  });
  const { port } = await server.run();
  env.S3_ENDPOINT = `http://127.0.0.1:${port}`;
});

afterAll(async () => {
  await server?.close();
  await rm(dir, { recursive: true, force: true });
});

describe("S3Storage against a local S3 server", () => {
  storageContract(() => createStorage(env));

  it("is what createStorage builds for STORAGE_DRIVER=s3", () => {
    expect(createStorage(env)).toBeInstanceOf(S3Storage);
  });

  it("records the content type on the object", async () => {
    const storage = createStorage(env) as S3Storage;
    await storage.put("typed/object", new Uint8Array([1, 2]), "image/webp");
    const res = await fetch(`${env.S3_ENDPOINT}/${env.S3_BUCKET}/typed/object`);
    expect(res.headers.get("content-type")).toBe("image/webp");
  });

  it("fails loudly, not with null, when the bucket does not exist", async () => {
    const storage = createStorage({ ...env, S3_BUCKET: "no-such-bucket" });
    await expect(storage.put("x", new Uint8Array([1]), "image/png")).rejects.toThrow();
  });
});
