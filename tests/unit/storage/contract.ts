import { expect, it } from "vitest";
import { StorageKeyError, type Storage } from "@/lib/storage";

/** Behaviour every storage adapter must show; each adapter's test file runs it. */
export function storageContract(make: () => Storage) {
  const bytes = (n: number) => Uint8Array.from({ length: n }, (_, i) => (i * 7 + 3) & 0xff);

  it("stores, reads back, reports and deletes a file", async () => {
    const storage = make();
    const key = "commissions/1/attachments/a1b2c3";
    const data = bytes(5000);
    expect(await storage.exists(key)).toBe(false);
    await storage.put(key, data, "image/png");
    expect(await storage.exists(key)).toBe(true);
    const back = await storage.get(key);
    expect(back).toBeInstanceOf(Uint8Array);
    expect(Buffer.from(back!).equals(Buffer.from(data))).toBe(true);
    await storage.delete(key);
    expect(await storage.exists(key)).toBe(false);
    expect(await storage.get(key)).toBeNull();
  });

  it("overwrites a key with new bytes", async () => {
    const storage = make();
    await storage.put("over/write", bytes(10), "application/pdf");
    await storage.put("over/write", bytes(3), "application/pdf");
    expect(Array.from((await storage.get("over/write"))!)).toEqual(Array.from(bytes(3)));
  });

  it("stores an empty file and a binary file with every byte value", async () => {
    const storage = make();
    await storage.put("empty-file", new Uint8Array(0), "application/octet-stream");
    expect((await storage.get("empty-file"))!.byteLength).toBe(0);
    const all = Uint8Array.from({ length: 256 }, (_, i) => i);
    await storage.put("all_bytes", all, "application/octet-stream");
    expect(Array.from((await storage.get("all_bytes"))!)).toEqual(Array.from(all));
  });

  it("answers null/false for missing keys and deletes them quietly", async () => {
    const storage = make();
    expect(await storage.get("never/stored")).toBeNull();
    expect(await storage.exists("never/stored")).toBe(false);
    await expect(storage.delete("never/stored")).resolves.toBeUndefined();
  });

  const badKeys = [
    "", "../etc/passwd", "a/../../b", "/abs/path", "Upper", "has space", "dot.png", "a//b", "trailing/",
    "back\\slash", "nul\u0000byte", "-leading", "_leading", "ünï", "x".repeat(202),
  ];

  it.each(badKeys)("refuses the key %j for every operation", async (key) => {
    const storage = make();
    await expect(storage.put(key, bytes(1), "image/png")).rejects.toBeInstanceOf(StorageKeyError);
    await expect(storage.get(key)).rejects.toBeInstanceOf(StorageKeyError);
    await expect(storage.exists(key)).rejects.toBeInstanceOf(StorageKeyError);
    await expect(storage.delete(key)).rejects.toBeInstanceOf(StorageKeyError);
  });

  it("refuses a bad content type or non-byte contents", async () => {
    const storage = make();
    await expect(storage.put("ok-key", bytes(1), "text/html\r\nX-Evil: 1")).rejects.toBeInstanceOf(StorageKeyError);
    await expect(storage.put("ok-key", "text" as unknown as Uint8Array, "image/png")).rejects.toBeInstanceOf(
      StorageKeyError,
    );
    expect(await storage.exists("ok-key")).toBe(false);
  });

  it("accepts a key of the longest allowed length", async () => {
    const storage = make();
    const key = "k".repeat(201);
    await storage.put(key, bytes(2), "image/webp");
    expect(await storage.exists(key)).toBe(true);
  });
}
