import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { createHash } from "node:crypto";
import sharp from "sharp";
import { and, count, eq } from "drizzle-orm";
import { attachments, trailEvents } from "@/db/schema";
import { addAttachment, checkCanAttach, listAttachments, readAttachment, removeAttachment, updateCaption } from "@/lib/dal/attachments";
import { createDraft, circulate, updateDraft } from "@/lib/dal/revisions-write";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { resetStorage } from "@/lib/storage";
import { MAX_FILE_BYTES, MAX_FILES_PER_REVISION } from "@/lib/uploads";
import type { Viewer } from "@/lib/dal/viewer";
import * as f from "../unit/uploads/fixtures";
import { closeDb, freshDemo, getDb, viewer } from "./db";

let dir: string;
let ids: Awaited<ReturnType<typeof freshDemo>>;
let elias: Viewer;
let draft: { id: number; number: number };

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "placet-attachments-"));
  process.env.STORAGE_DRIVER = "local";
  process.env.STORAGE_DIR = dir;
  resetStorage();
  ids = await freshDemo();
  elias = await viewer("elias@hollowmere.test");
  draft = await createDraft(elias, ids.commissionId, { note: "Engravings moved lower" });
});
afterAll(async () => {
  await closeDb();
  resetStorage();
  await rm(dir, { recursive: true, force: true });
});

/** Every path under the storage directory, folders included. */
async function listing(): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true });
  return entries.map((e) => `${path.relative(dir, path.join(e.parentPath, e.name))}${e.isDirectory() ? "/" : ""}`).sort();
}
const onlyFiles = (all: string[]) => all.filter((p) => !p.endsWith("/"));

async function rowCount(revisionId = draft.id) {
  return (await getDb().select({ n: count() }).from(attachments).where(eq(attachments.revisionId, revisionId)))[0].n;
}
async function trailCount() {
  return (await getDb().select({ n: count() }).from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId)))[0].n;
}

/** Refused with a message on the file field that names it, and nothing stored, recorded or trailed. */
async function expectRefusedAndNothingStored(name: string, bytes: Uint8Array, pattern: RegExp, who: Viewer = elias) {
  const before = { files: await listing(), rows: await rowCount(), trail: await trailCount() };
  const err = await addAttachment(who, draft.id, { name, bytes, caption: "should not survive" }).then(() => null, (e: unknown) => e);
  expect(err, `${name} should have been refused`).toBeInstanceOf(ValidationError);
  const message = (err as ValidationError).fields.file;
  expect(message).toMatch(pattern);
  expect(await listing()).toEqual(before.files);
  expect(await rowCount()).toBe(before.rows);
  expect(await trailCount()).toBe(before.trail);
  return message;
}

const pdfWith = (objects: string[], trailerExtra?: string) => f.handPdf(objects, { trailerExtra });

describe("hostile and broken files are refused, and nothing is left behind", () => {
  const cases: [string, string, () => Promise<Uint8Array> | Uint8Array, RegExp][] = [
    ["empty file", "drawing.png", () => new Uint8Array(0), /“drawing\.png” is empty/],
    ["one byte over 25 MB", "render.png", async () => { const b = new Uint8Array(MAX_FILE_BYTES + 1); b.set(await f.png(8, 8)); return b; }, /“render\.png” is .*over the limit of 25 MB/],
    ["PNG with altered magic bytes", "drawing.png", async () => { const b = await f.png(); b[1] = 0x51; return b; }, /“drawing\.png”.*not recognised/],
    ["random bytes", "noise.jpg", () => Uint8Array.from({ length: 4096 }, (_, i) => (i * 131) & 0xff), /“noise\.jpg”/],
    ["plain text named .pdf", "notes.pdf", () => f.enc("Bowl 420 mm, three engravings"), /“notes\.pdf”/],
    ["SVG with a script", "font.svg", () => f.enc('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'), /“font\.svg”.*SVG/],
    ["SVG renamed .png", "font.png", () => f.enc('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>'), /“font\.png”.*SVG/],
    ["HTML page", "page.html", () => f.enc("<!DOCTYPE html><html><body>hi</body></html>"), /“page\.html”.*HTML/],
    ["UTF-16 HTML renamed .jpg", "photo.jpg", () => new Uint8Array(Buffer.from("\uFEFF<html><script>alert(1)</script></html>", "utf16le")), /“photo\.jpg”.*HTML/],
    ["XML", "data.pdf", () => f.enc('<?xml version="1.0"?><order><glass/></order>'), /“data\.pdf”.*XML/],
    ["ZIP named .pdf", "drawings.pdf", () => f.zip(), /“drawings\.pdf”.*compressed archive/],
    ["gzip", "drawing.png.gz", () => f.gzip(), /compressed archive/],
    ["7z", "drawings.7z", () => f.sevenZip(), /compressed archive/],
    ["RAR", "drawings.rar", () => f.rar(), /compressed archive/],
    ["tar", "drawings.tar", () => f.tar(), /compressed archive/],
    ["Windows program named .png", "setup.png", () => f.exe(), /“setup\.png” is a program/],
    ["Linux program named .pdf", "tool.pdf", () => f.elf(), /is a program/],
    ["GIF", "sketch.gif", () => f.gif(), /GIF image/],
    ["PNG named .pdf", "plan.pdf", () => f.png(), /named as a PDF but its content is a PNG image/],
    ["JPEG named .png", "photo.png", () => f.jpeg(), /content is a JPEG image/],
    ["WebP named .jpg", "render.jpg", () => f.webp(), /WebP/],
    ["no extension", "drawing", () => f.png(), /no file extension/],
    ["double extension ending .exe", "drawing.png.exe", () => f.png(), /ends in “\.exe”/],
    ["truncated PNG", "elevation.png", async () => { const b = await f.png(); return b.subarray(0, b.length >> 1); }, /damaged or cut short/],
    ["truncated JPEG", "site.jpg", async () => { const b = await f.jpeg(); return b.subarray(0, Math.floor(b.length * 0.6)); }, /damaged or cut short/],
    ["truncated WebP", "render.webp", async () => { const b = await f.webp(); return b.subarray(0, b.length - 100); }, /“render\.webp”/],
    ["PNG claiming 100,000 × 100,000 pixels", "bomb.png", () => f.pngClaiming(100_000, 100_000), /100,000 × 100,000 pixels/],
    ["PNG with a web page after its end", "drawing.png", async () => f.cat(await f.png(), f.enc("<html><script>alert(1)</script></html>")), /hidden in it.*web page or script/],
    ["PNG with a ZIP appended", "drawing.png", async () => f.zipAfter(await f.png()), /ZIP archive/],
    ["JPEG with a ZIP appended", "site.jpg", async () => f.zipAfter(await f.jpeg()), /ZIP archive/],
    ["JPEG with a script appended", "site.jpg", async () => f.cat(await f.jpeg(), f.enc("<?php system($_GET['c']); ?>")), /script/],
    ["WebP with data after its end", "render.webp", async () => f.cat(await f.webp(), f.enc("<svg onload=alert(1)>")), /hidden in it/],
    ["PDF without %%EOF", "spec.pdf", () => f.handPdf(["<< /Type /Catalog >>"], { tail: "startxref\n0\n" }), /end-of-file marker/],
    ["PDF with a page appended after %%EOF", "spec.pdf", () => f.cat(f.plainHandPdf(), f.enc("<script>x</script>")), /“spec\.pdf”/],
    ["PDF that is also a ZIP", "spec.pdf", () => f.zipAfter(f.plainHandPdf(), "\n%%EOF\n"), /ZIP/],
    ["PDF that runs a script when opened", "spec.pdf", () => f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /Type /Action /S /JavaScript /JS (app.alert(1)) >>"]), /contains a script/],
    ["PDF with a script in a compressed object stream", "spec.pdf", () => f.libPdf(f.addOpenScript, true), /script/],
    ["PDF that launches a program", "spec.pdf", () => f.handPdfWithCatalog("/OpenAction 5 0 R", ["<< /S /Launch /F (cmd.exe) >>"]), /starts other programs/],
    ["PDF with an embedded file", "spec.pdf", () => f.libPdf((doc) => doc.attach(f.enc("MZ payload"), "readme.exe", { mimeType: "application/octet-stream" })), /files hidden inside it/],
    ["password-protected PDF", "spec.pdf", () => pdfWith(["<< /Type /Catalog /Pages 2 0 R >>", "<< /Type /Pages /Kids [] /Count 0 >>", "<< /Filter /Standard /V 1 /R 2 /O (x) /U (y) /P -4 >>"], "/Encrypt 3 0 R "), /password-protected/],
    ["PDF with no pages", "spec.pdf", () => pdfWith(["<< /Type /Catalog /Pages 2 0 R >>", "<< /Type /Pages /Kids [] /Count 0 >>"]), /no pages/],
    ["path-traversal name", "../../etc/passwd.png", () => f.png(16, 16), /“passwd\.png”.*folder names/],
    ["right-to-left override in the name", "invoice\u202Egnp.exe", () => f.png(16, 16), /reverse the direction of text/],
    ["control characters in the name", "photo\r\nSet-Cookie: a=b.png", () => f.png(16, 16), /control characters/],
    ["blank name", "   ", () => f.png(16, 16), /has no name/],
  ];

  it(`has at least 25 cases (${cases.length})`, () => expect(cases.length).toBeGreaterThanOrEqual(25));

  it.each(cases)("%s", async (_label, name, make, pattern) => {
    await expectRefusedAndNothingStored(name, await make(), pattern);
  });

  it("a revision already holding the most files refuses one more, naming the limit", async () => {
    const filler = Array.from({ length: MAX_FILES_PER_REVISION }, (_, i) => ({
      revisionId: draft.id, commissionId: ids.commissionId, storageKey: `c0/filler/${i}`, kind: "png" as const, mime: "image/png",
      name: `filler-${i}.png`, sha256: "0".repeat(64), sizeBytes: 1, position: 1000 + i, uploadedBy: elias.id,
    }));
    await getDb().insert(attachments).values(filler);
    try {
      await expectRefusedAndNothingStored("one-more.png", await f.png(32, 32), new RegExp(`“one-more\\.png” cannot be added: .*at most ${MAX_FILES_PER_REVISION} files.*it is full`));
    } finally {
      await getDb().delete(attachments).where(and(eq(attachments.revisionId, draft.id), eq(attachments.sha256, "0".repeat(64))));
    }
  });

  it("a caption over 500 characters is refused on the caption field, nothing stored", async () => {
    const before = await listing();
    const err = await addAttachment(elias, draft.id, { name: "ok.png", bytes: await f.png(16, 16), caption: "x".repeat(501) }).catch((e) => e);
    expect(err).toBeInstanceOf(ValidationError);
    expect(err.fields.caption).toMatch(/500 characters/);
    expect(await listing()).toEqual(before);
  });

  it("when the database refuses the row, the stored bytes are deleted again", async () => {
    const before = { files: onlyFiles(await listing()), rows: await rowCount() };
    // Passes the studio check before the transaction; under the commission's lock its standing is read
    // again from the database, where it has none, so the transaction is refused after the bytes were stored.
    const ghost: Viewer = { ...elias, id: "no-such-person" };
    const err = await addAttachment(ghost, draft.id, { name: "elevation.png", bytes: await f.png(64, 64) }).catch((e) => e);
    expect(err).toBeInstanceOf(NotFoundError);
    expect(onlyFiles(await listing())).toEqual(before.files);
    expect(await rowCount()).toBe(before.rows);
  });
});

describe("good files of each kind are accepted", () => {
  const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

  it("PNG, JPEG, WebP and PDF, stored under server-chosen keys, trailed, in order", async () => {
    const trailBefore = await trailCount();
    const made = [
      await addAttachment(elias, draft.id, { name: "Section elevation.png", bytes: await f.png(320, 200), caption: "  Section through the bowl  " }),
      await addAttachment(elias, draft.id, { name: "site photo.jpg", bytes: await f.orientedJpeg() }),
      await addAttachment(elias, draft.id, { name: "render.webp", bytes: await f.webp(200, 200) }),
      await addAttachment(elias, draft.id, { name: "specification.pdf", bytes: await f.libPdf(undefined, false) }),
    ];
    expect(made.map((a) => a.kind)).toEqual(["png", "jpeg", "webp", "pdf"]);
    expect(made.map((a) => a.position)).toEqual([0, 1, 2, 3]);
    expect(made[0]).toMatchObject({ name: "Section elevation.png", caption: "Section through the bowl", width: 320, height: 200, url: `/api/attachments/${made[0].id}/file` });
    expect(made[1]).toMatchObject({ width: 100, height: 300 }); // orientation applied
    expect(made[3]).toMatchObject({ pages: 2, thumbUrl: null, mime: "application/pdf" });
    expect(made[0].thumbUrl).toBe(`/api/attachments/${made[0].id}/thumb`);

    const files = onlyFiles(await listing());
    expect(files.every((p) => /^c\d+\/r\d+\/[0-9a-f-]{36}(-thumb)?$/.test(p))).toBe(true);
    expect(files.join(" ")).not.toMatch(/elevation|photo|render|specification/i);
    expect(files).toHaveLength(7); // three images with thumbnails, one PDF

    const stored = await readAttachment(elias, made[1].id, "file");
    expect(sha(stored.bytes)).toBe(made[1].sha256);
    expect(Buffer.from(stored.bytes).includes(Buffer.from("Secret Studio Archive"))).toBe(false);
    expect(stored).toMatchObject({ mime: "image/jpeg", downloadName: `revision-attachment-${made[1].id}.jpg` });
    const thumb = await readAttachment(elias, made[0].id, "thumb");
    expect(thumb.mime).toBe("image/webp");
    expect((await sharp(Buffer.from(thumb.bytes)).metadata()).format).toBe("webp");
    await expect(readAttachment(elias, made[3].id, "thumb")).rejects.toBeInstanceOf(NotFoundError);

    const events = await getDb().select().from(trailEvents).where(eq(trailEvents.commissionId, ids.commissionId));
    // A draft is the studio's alone: each event says only that the draft changed, never a file's name or hash.
    expect(await trailCount()).toBe(trailBefore + 4);
    for (const e of events.slice(-4)) expect([e.action, e.payload]).toEqual(["revision updated", { number: draft.number }]);
    expect((await listAttachments(elias, draft.id)).map((a) => a.id)).toEqual(made.map((a) => a.id));
  });

  it("captions change on a draft, with a trail entry; an unchanged caption writes nothing", async () => {
    const [first] = await listAttachments(elias, draft.id);
    const before = await trailCount();
    const updated = await updateCaption(elias, first.id, "Section, 1:10");
    expect(updated.caption).toBe("Section, 1:10");
    await updateCaption(elias, first.id, "Section, 1:10");
    expect(await trailCount()).toBe(before + 1);
    const [last] = await getDb().select().from(trailEvents).where(and(eq(trailEvents.commissionId, ids.commissionId), eq(trailEvents.action, "revision updated")));
    expect(last.payload).toEqual({ number: draft.number });
    await expect(updateCaption(elias, first.id, 42)).rejects.toBeInstanceOf(ValidationError);
  });

  it("removing a file deletes its row and stored bytes, with a trail entry", async () => {
    const extra = await addAttachment(elias, draft.id, { name: "spare.png", bytes: await f.png(40, 40) });
    const filesBefore = onlyFiles(await listing()).length;
    const before = await trailCount();
    await removeAttachment(elias, extra.id);
    expect(onlyFiles(await listing())).toHaveLength(filesBefore - 2);
    expect(await trailCount()).toBe(before + 1);
    await expect(readAttachment(elias, extra.id, "file")).rejects.toBeInstanceOf(NotFoundError);
    await expect(removeAttachment(elias, extra.id)).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("who may see and change files", () => {
  it("a committee member cannot see a draft's files, nor add to the draft: not found", async () => {
    const ruth = await viewer("ruth@stwenna.test");
    const [first] = await listAttachments(elias, draft.id);
    await expect(readAttachment(ruth, first.id, "file")).rejects.toBeInstanceOf(NotFoundError);
    await expect(readAttachment(ruth, first.id, "thumb")).rejects.toBeInstanceOf(NotFoundError);
    await expect(listAttachments(ruth, draft.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(checkCanAttach(ruth, draft.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(checkCanAttach(elias, draft.id)).resolves.toBeUndefined();
    await expect(addAttachment(ruth, draft.id, { name: "x.png", bytes: await f.png(16, 16) })).rejects.toBeInstanceOf(NotFoundError);
    await expect(removeAttachment(ruth, first.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(updateCaption(ruth, first.id, "mine")).rejects.toBeInstanceOf(NotFoundError);
  });

  it("a member of another commission gets not found, even once circulated; unknown ids too", async () => {
    const owen = await viewer("owen@thrennick.test");
    const [first] = await listAttachments(elias, draft.id);
    await expect(readAttachment(owen, first.id, "file")).rejects.toBeInstanceOf(NotFoundError);
    await expect(readAttachment(elias, 987654, "file")).rejects.toBeInstanceOf(NotFoundError);
    await expect(readAttachment(elias, -1, "file")).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("a circulated revision is frozen", () => {
  it("refuses add, remove and caption changes; the committee can now read its files", async () => {
    await updateDraft(elias, ids.commissionId, draft.number, { note: "Drawings for the committee" });
    await circulate(elias, ids.commissionId, draft.number);
    const [first] = await listAttachments(elias, draft.id);
    const before = { files: await listing(), rows: await rowCount(), trail: await trailCount() };

    const add = await addAttachment(elias, draft.id, { name: "late.png", bytes: await f.png(16, 16) }).catch((e) => e);
    expect(add).toBeInstanceOf(ConflictError);
    expect(add.message).toMatch(/circulated and is frozen/);
    await expect(checkCanAttach(elias, draft.id)).rejects.toBeInstanceOf(ConflictError);
    await expect(removeAttachment(elias, first.id)).rejects.toBeInstanceOf(ConflictError);
    await expect(updateCaption(elias, first.id, "changed")).rejects.toBeInstanceOf(ConflictError);
    expect(await listing()).toEqual(before.files);
    expect(await rowCount()).toBe(before.rows);
    expect(await trailCount()).toBe(before.trail);

    const ruth = await viewer("ruth@stwenna.test");
    expect((await readAttachment(ruth, first.id, "file")).bytes.byteLength).toBe(first.sizeBytes);
    await expect(addAttachment(ruth, draft.id, { name: "x.png", bytes: await f.png(16, 16) })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(readAttachment(await viewer("hazel@thrennick.test"), first.id, "file")).rejects.toBeInstanceOf(NotFoundError);
  });
});
