import { expect, test } from "@playwright/test";
import { DEMO_TITLE, makePerson, signInAs, sql } from "./helpers";

/** Circulated at some time: circulated, superseded or decided (never a draft). */
async function circulatedRevisions(): Promise<{ commissionId: number; numbers: number[] }> {
  const rows = await sql<{ commission_id: number; number: number }[]>(
    `SELECT r.commission_id, r.number FROM revisions r JOIN commissions c ON c.id = r.commission_id
     WHERE c.title = ? AND r.state <> 'draft' ORDER BY r.number`,
    [DEMO_TITLE],
  );
  return { commissionId: rows[0]?.commission_id ?? 0, numbers: rows.map((r) => r.number) };
}

test("a committee member compares the two latest circulated revisions and sees what changed", async ({ page }) => {
  const { commissionId, numbers } = await circulatedRevisions();
  expect(numbers.length, `the demo commission "${DEMO_TITLE}" should have two revisions to compare`).toBeGreaterThanOrEqual(2);
  const [older, newer] = numbers.slice(-2);

  await signInAs(page, await makePerson("member"));
  await page.goto(`/commissions/${commissionId}/revisions/${older}/compare/${newer}`, { waitUntil: "domcontentloaded" });
  const view = page.getByTestId("compare-view");
  await expect(view.getByRole("heading", { name: `Revision ${newer} against Revision ${older}` })).toBeVisible();
  await expect(view.getByTestId("content-hash-older")).toHaveAttribute("data-hash", /^[0-9a-f]{64}$/);
  await expect(view.getByTestId("content-hash-newer")).toHaveAttribute("data-hash", /^[0-9a-f]{64}$/);

  // At least one value changed, and its change is said in words with a sign and a unit.
  const changed = view.locator('[data-changed="yes"]');
  await expect(changed.first()).toBeVisible();
  await expect(changed.first().getByTestId("change")).toHaveText(/^(?:[+−]\S.*|Changed|Added|Removed)$/);
  await expect(view.getByTestId("compare-figures").getByTestId("change").filter({ hasText: /^[+−]/ }).first()).toBeVisible();

  // Inches at a tap; "only what changed" hides the rest.
  await view.getByRole("button", { name: "Inches" }).click();
  await expect(view.getByTestId("compare-parameters")).toContainText(" in");
  await view.getByLabel("Only what changed").check();
  await expect(view.locator('[data-changed="no"]')).toHaveCount(0);

  // The same page with the numbers the other way round shows the same comparison.
  await page.goto(`/commissions/${commissionId}/revisions/${newer}/compare/${older}`, { waitUntil: "domcontentloaded" });
  await expect(page.getByRole("heading", { name: `Revision ${newer} against Revision ${older}` })).toBeVisible();
});

test("a comparison with a revision that is not there is simply not found", async ({ page }) => {
  const { commissionId, numbers } = await circulatedRevisions();
  expect(numbers.length, `the demo commission "${DEMO_TITLE}" should have a circulated revision`).toBeGreaterThanOrEqual(1);
  await signInAs(page, await makePerson("member"));
  await page.goto(`/commissions/${commissionId}/revisions/${numbers[0]}/compare/9999`);
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
  await page.goto(`/commissions/${commissionId}/revisions/${numbers[0]}/compare/abc`);
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
});
