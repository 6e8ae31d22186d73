import { expect, request as playwrightRequest, test, type Page } from "@playwright/test";
import sharp from "sharp";
import { makePerson, signInAs, sql, unique, newCommissionViaForm } from "./helpers";

const OTHER_TITLE = "Font and cover for the new chapel";

const drawing = async (w = 900, h = 600) =>
  sharp({ create: { width: w, height: h, channels: 3, background: "#d8e8e2" } })
    .composite([{ input: Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}"><circle cx="${w / 2}" cy="${h / 2}" r="${h / 3}" fill="none" stroke="#1d3a6e" stroke-width="8"/></svg>`) }])
    .png().toBuffer();

/** A commission of the designer's own with Revision 1 started as a draft; returns the edit page's ids. */
async function ownDraft(page: Page): Promise<{ title: string; commissionId: number; revisionId: number }> {
  const { title, commissionId } = await newCommissionViaForm(page, "Font for the baptistry", "Test parish — Fabric Committee", "Test church, the north aisle");
  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByRole("button", { name: "Start the draft" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1/edit$`));
  const [r] = await sql<{ id: number }[]>("SELECT id FROM revisions WHERE commission_id = ? AND number = 1", [commissionId]);
  return { title, commissionId, revisionId: r.id };
}

test("the designer attaches drawings with a progress bar per file; a refused file says why by name", async ({ page }) => {
  await signInAs(page, await makePerson("designer"));
  await ownDraft(page);
  const uploader = page.getByTestId("attachment-uploader");
  await uploader.getByTestId("attachment-input").setInputFiles([
    { name: "Section A-A.png", mimeType: "image/png", buffer: await drawing() },
    { name: "notes.png", mimeType: "image/png", buffer: Buffer.from("<html><script>alert(1)</script></html>") },
  ]);
  const items = uploader.getByTestId("upload-item");
  await expect(items).toHaveCount(2);
  await items.nth(0).getByLabel("Caption (optional)").fill("Section through the bowl");
  await uploader.getByRole("button", { name: "Upload 2 files" }).click();

  const good = items.filter({ hasText: "Section A-A.png" });
  await expect(good).toHaveAttribute("data-status", "done");
  await expect(good.getByRole("progressbar")).toHaveAttribute("aria-valuenow", "100");
  const bad = items.filter({ hasText: "notes.png" });
  await expect(bad).toHaveAttribute("data-status", "refused");
  await expect(bad.getByRole("alert")).toContainText("“notes.png”");

  const gallery = page.getByTestId("gallery");
  await expect(gallery.getByTestId("gallery-lead")).toContainText("Section through the bowl");
  await gallery.getByRole("button", { name: /Open Section through the bowl full screen/ }).click();
  const viewer = page.getByTestId("image-viewer");
  await viewer.getByRole("button", { name: "Zoom in" }).click();
  await expect(viewer).toContainText("150%");
  await viewer.getByRole("button", { name: "Fit to screen" }).click();
  await expect(viewer).toContainText("100%");
  await viewer.getByRole("button", { name: "Close" }).click();
  await expect(viewer).toHaveCount(0);

  await gallery.getByRole("button", { name: "Edit caption" }).click();
  await gallery.getByLabel(/Caption for/).fill("Section A-A, 1:10");
  await gallery.getByRole("button", { name: "Save caption" }).click();
  await expect(gallery.getByTestId("gallery-lead")).toContainText("Section A-A, 1:10");
  await gallery.getByRole("button", { name: "Remove" }).click();
  await gallery.getByRole("button", { name: "Yes, remove it" }).click();
  await expect(gallery).toContainText("No files yet.");
});

test("files are served with a fixed name and type, and only to people who may see the revision", async ({ page, browser, baseURL }) => {
  await signInAs(page, await makePerson("designer"));
  const { title, revisionId } = await ownDraft(page);

  const posted = await page.request.post(`/api/revisions/${revisionId}/attachments`, {
    multipart: { file: { name: "<img src=x onerror=alert(1)>.png", mimeType: "image/png", buffer: await drawing(640, 480) }, caption: "Plan" },
  });
  expect(posted.status()).toBe(201);
  const dto = await posted.json();
  expect(dto).toMatchObject({ name: "_img src=x onerror=alert(1)_.png", caption: "Plan", kind: "png", width: 640, height: 480, url: `/api/attachments/${dto.id}/file` });

  const file = await page.request.get(dto.url);
  expect(file.status()).toBe(200);
  expect(file.headers()["content-type"]).toBe("image/png");
  expect(file.headers()["content-disposition"]).toBe(`inline; filename="revision-attachment-${dto.id}.png"`);
  expect(file.headers()["x-content-type-options"]).toBe("nosniff");
  expect(file.headers()["content-security-policy"]).toBe("sandbox; default-src 'none'");
  expect(file.headers()["cache-control"]).toBe("private, max-age=3600");
  expect((await page.request.get(dto.thumbUrl)).headers()["content-type"]).toBe("image/webp");

  const refused = await page.request.post(`/api/revisions/${revisionId}/attachments`, {
    multipart: { file: { name: "drawing.pdf", mimeType: "application/pdf", buffer: Buffer.from("PK\u0003\u0004 not a pdf") } },
  });
  expect(refused.status()).toBe(422);
  expect((await refused.json()).fields.file).toContain("“drawing.pdf”");
  // Over the limit: refused early by its length (or the connection is closed on it), never stored.
  const huge = await page.request.post(`/api/revisions/${revisionId}/attachments`, {
    multipart: { file: { name: "huge.png", mimeType: "image/png", buffer: Buffer.alloc(26 * 1024 * 1024) } },
  }).catch(() => null);
  if (huge) {
    expect(huge.status()).toBe(413);
    expect((await huge.json()).fields.file).toMatch(/over the limit of 25 MB/);
  }
  const rows = await sql<{ n: number }[]>("SELECT COUNT(*) AS n FROM attachments WHERE revision_id = ?", [revisionId]);
  expect(Number(rows[0].n)).toBe(1);

  const signedOut = await playwrightRequest.newContext({ baseURL });
  expect((await signedOut.get(dto.url)).status()).toBe(401);
  expect((await signedOut.get(dto.thumbUrl)).status()).toBe(401);
  await signedOut.dispose();

  // A member of another commission, and a member of this one asking for a draft: both "not found".
  for (const who of [await makePerson("member", { commissionTitle: OTHER_TITLE }), await makePerson("member", { commissionTitle: title })]) {
    const ctx = await browser.newContext({ baseURL });
    const other = await ctx.newPage();
    await signInAs(other, who);
    expect((await other.request.get(dto.url)).status()).toBe(404);
    expect((await other.request.get(`/api/attachments/${dto.id + 100000}/file`)).status()).toBe(404);
    expect((await other.request.post(`/api/revisions/${revisionId}/attachments`, { multipart: { file: { name: "x.png", mimeType: "image/png", buffer: await drawing(8, 8) } } })).status()).toBe(404);
    await ctx.close();
  }
});
