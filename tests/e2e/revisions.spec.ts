import { expect, test, type Page } from "@playwright/test";
import sharp from "sharp";
import { linkIn, makePerson, newCommissionViaForm, signInAs, waitForMail } from "./helpers";

const drawing = () =>
  sharp({ create: { width: 800, height: 500, channels: 3, background: "#e7efe9" } })
    .composite([{ input: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="800" height="500"><path d="M150 120 Q400 420 650 120" fill="none" stroke="#1d3a6e" stroke-width="10"/></svg>') }])
    .png().toBuffer();

async function setDepth(page: Page, mm: string) {
  const depth = page.getByLabel("Depth", { exact: true });
  await depth.fill(mm);
  await depth.blur();
}

async function circulateDraft(page: Page, n: number) {
  await page.getByRole("button", { name: `Circulate Revision ${n}…` }).click();
  await page.getByRole("button", { name: `Yes, freeze and circulate Revision ${n}` }).click();
  await expect(page).toHaveURL(new RegExp(`/revisions/${n}$`));
}

test("the designer drafts, uploads with progress and circulates; a member opens the mail link and reads it; compare shows what changed", async ({ page, browser, baseURL }) => {
  test.setTimeout(150_000);
  await signInAs(page, await makePerson("designer"));
  const { title, commissionId } = await newCommissionViaForm(page, "Font for the chapel of rest", "Wickerdine Parish — Fabric Committee", "Wickerdine church, the chapel of rest");
  const member = await makePerson("member", { commissionTitle: title });

  // Revision 1: the model, a note, a drawing (with its progress bar), then circulate.
  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByRole("button", { name: "Start the draft" }).click();
  await expect(page).toHaveURL(/\/revisions\/1\/edit$/);
  await setDepth(page, "140");
  await page.getByLabel("Note to the committee").fill("A first form: shallow bowl, three engravings.");
  await page.getByTestId("attachment-input").setInputFiles([{ name: "elevation.png", mimeType: "image/png", buffer: await drawing() }]);
  await page.getByRole("button", { name: /^Upload/ }).click();
  const item = page.getByTestId("upload-item").first();
  await expect(item).toHaveAttribute("data-status", "done");
  await expect(item.getByRole("progressbar")).toHaveAttribute("aria-valuenow", "100");
  const since = Date.now();
  await circulateDraft(page, 1);
  const hash1 = await page.getByTestId("content-hash").getAttribute("data-hash");
  expect(hash1).toMatch(/^[0-9a-f]{64}$/);

  // The member reads it from the e-mailed link, signing in on the way.
  const mail = await waitForMail(member, since, (m) => m.subject.startsWith("Revision 1 of"));
  const link = linkIn(mail, `/commissions/${commissionId}/revisions/1`);
  const ctx = await browser.newContext({ baseURL });
  const reader = await ctx.newPage();
  await reader.goto(link);
  await expect(reader).toHaveURL(/\/sign-in\?next=/);
  await signInAs(reader, member);
  await reader.goto(link);
  await expect(reader.getByTestId("revision-note")).toHaveText("A first form: shallow bowl, three engravings.");
  await expect(reader.getByTestId("content-hash")).toHaveAttribute("data-hash", hash1!);
  await expect(reader.getByTestId("font-figures")).toContainText("L");

  // Revision 2 changes the depth; the member's comparison shows it.
  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByRole("button", { name: "Start the draft" }).click();
  await expect(page).toHaveURL(/\/revisions\/2\/edit$/);
  await setDepth(page, "165");
  await page.getByLabel("Note to the committee").fill("Deeper bowl, as asked.");
  await circulateDraft(page, 2);
  await reader.goto(`/commissions/${commissionId}/revisions/2/compare/1`, { waitUntil: "domcontentloaded" });
  const row = reader.getByTestId("compare-parameters").locator('[data-changed="yes"]').filter({ hasText: "Depth" });
  await expect(row).toBeVisible();
  await expect(row.getByTestId("change")).toHaveText(/\+25\s?mm/);
  await reader.goto(`/commissions/${commissionId}/revisions/1`);
  await expect(reader.getByText("Superseded").first()).toBeVisible();
  await ctx.close();
});
