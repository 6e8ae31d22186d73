import { expect, test } from "@playwright/test";
import { DEMO_TITLE, makePerson, signInAs } from "./helpers";

const B = process.env.E2E_BASE_URL_B ?? "http://localhost:3101";

test("two app nodes on one database: signed in on one, recognised on the other", async ({ page }) => {
  await signInAs(page, await makePerson("member"));
  // The session lives in the database, so the second node knows the same person.
  const res = await page.request.get(`${B}/api/commissions`);
  expect(res.status()).toBe(200);
  const body = await res.json();
  expect(body.commissions.map((c: { title: string }) => c.title)).toContain(DEMO_TITLE);
  await page.goto(`${B}/commissions`);
  await expect(page.getByTestId("commission-list").getByText(DEMO_TITLE)).toBeVisible();
});
