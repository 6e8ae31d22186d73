import { expect, test, type Page } from "@playwright/test";
import { makePerson, signInAs, sql, unique } from "./helpers";

/**
 * Puts a new studio person into a studio of their own, a copy of the demo studio, so tests running at
 * once never save over each other's settings.
 */
async function personWithOwnStudio(role: "owner" | "designer"): Promise<{ email: string; studioId: number }> {
  const email = await makePerson(role);
  const res = await sql<{ insertId: number }>(
    "INSERT INTO studios (name, town, settings) SELECT ?, town, settings FROM studios ORDER BY id LIMIT 1",
    [unique("Test studio")],
  );
  await sql("UPDATE studio_members SET studio_id = ? WHERE user_id = (SELECT id FROM users WHERE email = ?)", [res.insertId, email]);
  return { email, studioId: res.insertId };
}

async function savedDownfeed(studioId: number): Promise<number> {
  const [row] = await sql<{ settings: string }[]>("SELECT settings FROM studios WHERE id = ?", [studioId]);
  const settings = typeof row.settings === "string" ? JSON.parse(row.settings) : row.settings;
  return settings.machines[0].downfeedPerTurnMm;
}

const downfeed = (page: Page) => page.getByTestId("machine-0").getByLabel("Downfeed per full turn of the handwheel");

test("the owner changes a machine's downfeed in inches and it is saved", async ({ page }) => {
  const { email, studioId } = await personWithOwnStudio("owner");
  await signInAs(page, email);
  await page.goto("/studio");
  await expect(page.getByTestId("studio-staff")).toContainText("Owner");
  await expect(page.getByTestId("cold-working-caution")).toContainText("eye protection");

  await page.getByRole("group", { name: "Units" }).getByRole("button", { name: "Inches" }).click();
  await downfeed(page).fill("0.05");
  await page.getByRole("button", { name: "Save the studio's settings" }).click();
  await expect(page.getByTestId("settings-saved")).toContainText("Saved");
  expect(await savedDownfeed(studioId)).toBeCloseTo(1.27, 9); // 0.05 in × 25.4 mm/in

  await page.reload();
  await expect(downfeed(page)).toHaveValue("1.27");
});

test("a bad downfeed is refused with the message beside the field, and nothing is saved", async ({ page }) => {
  const { email, studioId } = await personWithOwnStudio("owner");
  const before = await savedDownfeed(studioId);
  await signInAs(page, email);
  await page.goto("/studio");
  await downfeed(page).fill("-2");
  await page.getByRole("button", { name: "Save the studio's settings" }).click();
  await expect(page.getByTestId("error-machines.0.downfeedPerTurnMm")).toHaveText("Downfeed per turn must be more than 0.");
  await expect(downfeed(page)).toHaveAttribute("aria-invalid", "true");
  await downfeed(page).fill("lots");
  await page.getByRole("button", { name: "Save the studio's settings" }).click();
  await expect(page.getByTestId("error-machines.0.downfeedPerTurnMm")).toHaveText("Downfeed per turn must be a number.");
  expect(await savedDownfeed(studioId)).toBe(before);
});

test("a designer reads the settings but has no form, and the server refuses their save", async ({ page, browser }) => {
  // The owner's save, captured so the designer can send the very same request.
  const owner = await personWithOwnStudio("owner");
  const ownerCtx = await browser.newContext();
  const ownerPage = await ownerCtx.newPage();
  await signInAs(ownerPage, owner.email);
  await ownerPage.goto("/studio");
  await downfeed(ownerPage).fill("2");
  const [request] = await Promise.all([
    ownerPage.waitForRequest((r) => r.method() === "POST" && !!r.headers()["next-action"]),
    ownerPage.getByRole("button", { name: "Save the studio's settings" }).click(),
  ]);
  await expect(ownerPage.getByTestId("settings-saved")).toContainText("Saved");
  await ownerCtx.close();

  const designer = await personWithOwnStudio("designer");
  const before = await savedDownfeed(designer.studioId);
  await signInAs(page, designer.email);
  await page.goto("/studio");
  await expect(page.getByTestId("studio-settings-view")).toContainText("per full turn of the handwheel");
  await expect(page.getByTestId("studio-settings-form")).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Save the studio's settings" })).toHaveCount(0);

  const headers = request.headers();
  const res = await page.request.post(request.url(), {
    headers: { "next-action": headers["next-action"], "content-type": headers["content-type"], accept: "text/x-component", origin: new URL(request.url()).origin },
    data: request.postData() ?? "",
  });
  expect(await res.text()).toContain("Only the studio's owner");
  expect(await savedDownfeed(designer.studioId)).toBe(before);
});
