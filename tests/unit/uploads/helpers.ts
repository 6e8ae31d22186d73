import { expect } from "vitest";
import { inspectUpload, type UploadAccepted, type UploadRefusalCode, type UploadResult } from "@/lib/uploads";

/** Inspects a file and asserts it is refused with `code`, a message naming it, and `pattern`. */
export async function expectRefused(name: string, bytes: Uint8Array, code: UploadRefusalCode, pattern?: RegExp) {
  const result: UploadResult = await inspectUpload({ name, bytes });
  if (result.ok) throw new Error(`expected ${name} to be refused with ${code}, but it was accepted`);
  expect(result.field).toBe("file");
  expect(result.code, result.message).toBe(code);
  expect(result.safeName).not.toMatch(/[\u0000-\u001f\u202a-\u202e\u2066-\u2069/\\]/u);
  if (code !== "bad_name" || result.safeName !== "file") expect(result.message).toContain(`“${result.safeName}”`);
  if (pattern) expect(result.message).toMatch(pattern);
  return result;
}

export async function expectAccepted(name: string, bytes: Uint8Array): Promise<UploadAccepted> {
  const result = await inspectUpload({ name, bytes });
  if (!result.ok) throw new Error(`expected ${name} to be accepted, got ${result.code}: ${result.message}`);
  return result;
}
