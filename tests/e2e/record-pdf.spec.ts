import { expect, test } from "@playwright/test";
import { pdfPageTexts } from "../pdf-text";
import { DEMO_TITLE, makePerson, signInAs, sql } from "./helpers";

test("a member downloads the decision record as a PDF from the trail page", async ({ page }) => {
  await signInAs(page, await makePerson("member"));
  const [c] = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = ?", [DEMO_TITLE]);
  await page.goto(`/commissions/${c.id}/trail`);
  const link = page.getByRole("link", { name: "Download the decision record (PDF)" });
  await expect(link).toHaveAttribute("href", `/api/commissions/${c.id}/record.pdf`);

  const res = await page.request.get(`/api/commissions/${c.id}/record.pdf`);
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toBe("application/pdf");
  expect(res.headers()["content-disposition"]).toBe(`attachment; filename="placet-decision-record-commission-${c.id}.pdf"`);
  expect(res.headers()["cache-control"]).toContain("no-store");
  const body = await res.body();
  expect(body.subarray(0, 5).toString("latin1")).toBe("%PDF-");

  // The hash printed in the box is one the JSON record's chain holds (the other project may add entries meanwhile).
  const pages = await pdfPageTexts(body);
  const printed = /Final hash\n([0-9a-f]{64})/.exec(pages[pages.length - 1])?.[1];
  expect(printed).toBeTruthy();
  const record = await (await page.request.get(`/api/commissions/${c.id}/record.json`)).json();
  expect(record.events.map((e: { hash: string }) => e.hash)).toContain(printed);
});

test("outsiders get not found for the PDF record, and nobody signed out gets it", async ({ page }) => {
  await signInAs(page, await makePerson("member", { commissionTitle: "Font and cover for the new chapel" }));
  const [c] = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = ?", [DEMO_TITLE]);
  expect((await page.request.get(`/api/commissions/${c.id}/record.pdf`)).status()).toBe(404);
  expect((await page.request.get(`/api/commissions/not-a-number/record.pdf`)).status()).toBe(404);
  await page.context().clearCookies();
  expect((await page.request.get(`/api/commissions/${c.id}/record.pdf`)).status()).toBe(401);
});
