import "server-only";
import path from "node:path";
import { LocalStorage } from "./local";
import { S3Storage } from "./s3";
import type { Storage } from "./types";

export { LocalStorage } from "./local";
export { S3Storage, type S3StorageConfig } from "./s3";
export { KEY_PATTERN, StorageKeyError, assertKey, isValidKey, type Storage } from "./types";

type Env = Record<string, string | undefined>;

/** Thrown when the storage settings in the environment are missing or wrong. */
export class StorageConfigError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "StorageConfigError";
  }
}

const S3_VARS = ["S3_ENDPOINT", "S3_BUCKET", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY"] as const;

/**
 * Builds the storage the environment asks for: STORAGE_DRIVER "local" (default, files under
 * STORAGE_DIR or `<cwd>/.data/files`) or "s3" (S3_ENDPOINT, S3_BUCKET, S3_ACCESS_KEY_ID,
 * S3_SECRET_ACCESS_KEY, and S3_REGION defaulting to us-east-1).
 */
export function createStorage(env: Env = process.env): Storage {
  const driver = (env.STORAGE_DRIVER ?? "local").trim() || "local";
  if (driver === "local") {
    return new LocalStorage(env.STORAGE_DIR?.trim() || path.join(process.cwd(), ".data", "files"));
  }
  if (driver === "s3") {
    const missing = S3_VARS.filter((name) => !env[name]?.trim());
    if (missing.length) throw new StorageConfigError(`STORAGE_DRIVER is "s3" but these are not set: ${missing.join(", ")}.`);
    return new S3Storage({
      endpoint: env.S3_ENDPOINT!.trim(),
      bucket: env.S3_BUCKET!.trim(),
      accessKeyId: env.S3_ACCESS_KEY_ID!.trim(),
      secretAccessKey: env.S3_SECRET_ACCESS_KEY!.trim(),
      region: env.S3_REGION?.trim() || "us-east-1",
    });
  }
  throw new StorageConfigError(`STORAGE_DRIVER must be "local" or "s3", not ${JSON.stringify(driver)}.`);
}

let cached: Storage | undefined;

/** The process-wide storage, built once from process.env. */
export function getStorage(): Storage {
  cached ??= createStorage(process.env);
  return cached;
}

/** Forget the cached storage (tests that change the environment). */
export function resetStorage(): void {
  cached = undefined;
}
