import { expect, request as playwrightRequest, test, type Page } from "@playwright/test";
import sharp from "sharp";
import { makePerson, signInAs, sql, unique, waitForMail, newCommissionViaForm } from "./helpers";

const CAPTION = "West elevation";
const drawing = (w = 900, h = 600) =>
  sharp({ create: { width: w, height: h, channels: 3, background: "#e8e0d0" } })
    .composite([{ input: Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}"><rect x="${w / 4}" y="${h / 5}" width="${w / 2}" height="${(h * 3) / 5}" fill="none" stroke="#1d3a6e" stroke-width="8"/></svg>`) }])
    .png().toBuffer();

/** A commission of the test's own (so the desktop and phone runs never share one), with Revision 1 circulated with a drawing. */
async function ownCirculatedRevision(page: Page) {
  const { title, commissionId } = await newCommissionViaForm(page, "Font for the lady chapel", "St Morwen's — Fabric Committee", "St Morwen's, Trevellan: the lady chapel");
  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByLabel("What changed and why (you can finish this later)").fill("First proposal: a cast bowl on a ground foot.");
  await page.getByRole("button", { name: "Start the draft" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1/edit$`));
  const [r] = await sql<{ id: number }[]>("SELECT id FROM revisions WHERE commission_id = ? AND number = 1", [commissionId]);
  const up = await page.request.post(`/api/revisions/${r.id}/attachments`, {
    multipart: { file: { name: "west-elevation.png", mimeType: "image/png", buffer: await drawing() }, caption: CAPTION },
  });
  expect(up.status()).toBe(201);
  const attachmentId = (await up.json()).id as number;
  await page.reload();
  await page.getByRole("button", { name: "Circulate Revision 1…" }).click();
  await page.getByRole("button", { name: "Yes, freeze and circulate Revision 1" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1$`));
  return { title, commissionId, revisionId: r.id, attachmentId, path: `/commissions/${commissionId}/revisions/1` };
}

test("a member pins a comment on a drawing, the designer replies, and the reply reaches the member without a reload", async ({ page, browser }, info) => {
  test.setTimeout(150_000);
  const baseURL = String(info.project.use.baseURL ?? "http://localhost:3100");
  const designerCtx = await browser.newContext({ baseURL });
  const designer = await designerCtx.newPage();
  await signInAs(designer, await makePerson("designer"));
  const rev = await ownCirculatedRevision(designer);
  const memberEmail = await makePerson("member", { commissionTitle: rev.title, name: `Ruth ${unique("Tester")}` });

  // The member, on this project's device, taps a spot on the drawing and comments there.
  await signInAs(page, memberEmail);
  await page.goto(rev.path);
  const panel = page.getByTestId("comments-panel");
  await expect(panel).toContainText("No comments yet.");
  await page.getByTestId("gallery").getByRole("button", { name: new RegExp(`Open ${CAPTION} full screen`) }).click();
  const viewer = page.getByTestId("image-viewer");
  const picture = viewer.locator("img");
  const box = (await picture.boundingBox())!;
  await picture.click({ position: { x: box.width * 0.3, y: box.height * 0.4 } });
  if (await viewer.isVisible()) await viewer.getByRole("button", { name: "Close" }).click();
  const composer = panel.getByTestId("comment-composer");
  await expect(composer.getByTestId("composer-target")).toContainText(new RegExp(`on drawing “${CAPTION}” at \\d+% across, \\d+% down`));
  const words = `The rim looks thin here <b>at the lip</b> — ${unique("note")}`;
  await composer.getByLabel("Your comment").fill(words);
  await composer.getByRole("button", { name: "Post comment" }).click();
  const thread = panel.getByTestId("comment-thread").filter({ hasText: words });
  await expect(thread).toBeVisible();
  await expect(thread.getByTestId("comment-body")).toHaveText(words); // typed HTML stays text
  const pin = page.getByTestId("gallery-lead").getByTestId("image-pin");
  await expect(pin).toHaveCount(1);
  const pinBox = (await pin.boundingBox())!;
  expect(pinBox.width).toBeGreaterThanOrEqual(44);
  expect(pinBox.height).toBeGreaterThanOrEqual(44);

  // The designer sees it (within a few seconds, no reload) and replies.
  await designer.goto(rev.path);
  const dThread = designer.getByTestId("comments-panel").getByTestId("comment-thread").filter({ hasText: words });
  await expect(dThread).toBeVisible();
  await expect(dThread).toContainText(`on drawing “${CAPTION}”`);
  const since = Date.now();
  await dThread.getByRole("button", { name: "Reply" }).click();
  await dThread.getByLabel("Your reply").fill("We will thicken the lip to 15 mm.");
  await dThread.getByRole("button", { name: "Send reply" }).click();
  await expect(dThread).toContainText("We will thicken the lip to 15 mm.");

  // The member's page picks the reply up by itself, and the member is mailed about it.
  await expect(thread).toContainText("We will thicken the lip to 15 mm.", { timeout: 15_000 });
  const mail = await waitForMail(memberEmail, since, (m) => m.subject.includes("replied to your comment"));
  expect(mail.text).toContain("> We will thicken the lip to 15 mm.");

  // The comments leave in an open format: a W3C Web Annotation collection.
  const res = await page.request.get(`/api/revisions/${rev.revisionId}/annotations`);
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toBe('application/ld+json; profile="http://www.w3.org/ns/anno.jsonld"');
  const anno = await res.json();
  expect(anno["@context"]).toBe("http://www.w3.org/ns/anno.jsonld");
  expect(anno.type).toBe("AnnotationCollection");
  const [first, reply] = anno.first.items;
  expect(first.body).toEqual({ type: "TextualBody", value: words, format: "text/plain", purpose: "commenting" });
  expect(first.target.selector).toMatchObject({ type: "FragmentSelector", conformsTo: "http://www.w3.org/TR/media-frags/" });
  expect(first.target.selector.value).toMatch(/^xywh=percent:\d+,\d+,2,2$/);
  expect(first.target.source).toMatch(new RegExp(`/api/attachments/${rev.attachmentId}/file$`));
  expect(reply).toMatchObject({ motivation: "replying", target: first.id });
  await designerCtx.close();
});

test("comments through the API: the designer replies, an outsider is refused, bad input names the field", async ({ page, browser }, info) => {
  test.setTimeout(120_000);
  const baseURL = String(info.project.use.baseURL ?? "http://localhost:3100");
  await signInAs(page, await makePerson("designer"));
  const rev = await ownCirculatedRevision(page);
  const memberCtx = await browser.newContext({ baseURL });
  const member = await memberCtx.newPage();
  await signInAs(member, await makePerson("member", { commissionTitle: rev.title }));

  const posted = await member.request.post(`/api/revisions/${rev.revisionId}/comments`, {
    data: { body: "Is the foot wide enough for the stone floor?", target: { kind: "attachment", attachmentId: rev.attachmentId, selector: "xywh=percent:20,30,40,20" } },
  });
  expect(posted.status()).toBe(201);
  const { id } = await posted.json();
  const replied = await page.request.post(`/api/comments/${id}/replies`, { data: { body: "Yes: 380 mm across." } });
  expect(replied.status()).toBe(201);
  const list = await (await member.request.get(`/api/revisions/${rev.revisionId}/comments`)).json();
  expect(list.threads[0]).toMatchObject({ id, targetLabel: `on drawing “${CAPTION}”, the area 20–60% across and 30–50% down` });
  expect(list.threads[0].replies[0].body).toBe("Yes: 380 mm across.");

  const bad = await member.request.post(`/api/revisions/${rev.revisionId}/comments`, { data: { body: "  ", target: { kind: "model", part: "lid", point: [0, 0, 0] } } });
  expect(bad.status()).toBe(422);
  expect(Object.keys((await bad.json()).fields).sort()).toEqual(["body", "target"]);
  expect((await member.request.post(`/api/comments/${id}/resolve`)).status()).toBe(403);
  expect((await page.request.post(`/api/comments/${id}/resolve`)).status()).toBe(200);

  const outsiderCtx = await browser.newContext({ baseURL });
  const outsider = await outsiderCtx.newPage();
  await signInAs(outsider, await makePerson("member", { commissionTitle: "Font and cover for the new chapel" }));
  expect((await outsider.request.get(`/api/revisions/${rev.revisionId}/comments`)).status()).toBe(404);
  expect((await outsider.request.post(`/api/revisions/${rev.revisionId}/comments`, { data: { body: "Hello" } })).status()).toBe(404);
  expect((await outsider.request.post(`/api/comments/${id}/replies`, { data: { body: "Hello" } })).status()).toBe(404);
  expect((await outsider.request.get(`/api/revisions/${rev.revisionId}/annotations`)).status()).toBe(404);
  await outsiderCtx.close();
  const anonymous = await playwrightRequest.newContext({ baseURL });
  expect((await anonymous.get(`/api/revisions/${rev.revisionId}/comments`)).status()).toBe(401);
  expect((await anonymous.patch("/api/me/notices", { data: { notices: "digest" } })).status()).toBe(401);
  await anonymous.dispose();

  const pref = await member.request.patch("/api/me/notices", { data: { notices: "weekly" } });
  expect(pref.status()).toBe(422);
  expect((await pref.json()).fields.notices).toBeTruthy();
  expect((await member.request.patch("/api/me/notices", { data: { notices: "digest" } })).status()).toBe(200);
  await memberCtx.close();
});
