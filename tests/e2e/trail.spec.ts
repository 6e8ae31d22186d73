import { expect, test } from "@playwright/test";
import { verifyRecord } from "../../models/trail/node-hash";
import { DEMO_TITLE, makePerson, signInAs, sql } from "./helpers";

test("the trail reads in plain words, and the browser's verifier agrees with the server's", async ({ page }, info) => {
  await signInAs(page, await makePerson("member"));
  const [c] = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = ?", [DEMO_TITLE]);
  await page.goto(`/commissions/${c.id}/trail`);
  await expect(page.getByTestId("trail")).toContainText("Created the commission");
  await expect(page.getByTestId("trail")).toContainText("Invited Margaret Ellery as chair");

  const res = await page.request.get(`/api/commissions/${c.id}/record.json`);
  expect(res.status()).toBe(200);
  const text = await res.text();
  const record = JSON.parse(text);
  const server = verifyRecord(record);
  expect(server.ok).toBe(true);

  // The same file, checked in the browser (WebCrypto, no server call).
  await page.goto("/verify");
  await page.getByLabel("Record file").setInputFiles({ name: "record.json", mimeType: "application/json", buffer: Buffer.from(text) });
  await expect(page.getByRole("heading", { name: "The chain holds" })).toBeVisible();
  if (server.ok) await expect(page.getByTestId("final-hash")).toHaveText(server.finalHash);
  await page.screenshot({ path: `.data/screenshots/verify-ok-${info.project.name}.png`, fullPage: true });

  // A tampered copy: one payload changed. Both verifiers refuse it, at the same entry.
  record.events[2].payload.role = "chair";
  const tampered = JSON.stringify(record);
  const serverBad = verifyRecord(JSON.parse(tampered));
  expect(serverBad.ok).toBe(false);
  await page.goto("/verify");
  await page.getByLabel("Record file").setInputFiles({ name: "tampered.json", mimeType: "application/json", buffer: Buffer.from(tampered) });
  await expect(page.getByRole("heading", { name: "The chain does not hold" })).toBeVisible();
  if (!serverBad.ok) await expect(page.getByText(new RegExp(`\\b${serverBad.seq}\\b`)).first()).toBeVisible();
});

test("outsiders get not found for a commission's record", async ({ page }) => {
  await signInAs(page, await makePerson("member", { commissionTitle: "Font and cover for the new chapel" }));
  const [c] = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = ?", [DEMO_TITLE]);
  expect((await page.request.get(`/api/commissions/${c.id}/record.json`)).status()).toBe(404);
  await page.context().clearCookies();
  expect((await page.request.get(`/api/commissions/${c.id}/record.json`)).status()).toBe(401);
});
