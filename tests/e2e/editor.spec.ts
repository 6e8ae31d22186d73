import { mkdirSync, writeFileSync } from "node:fs";
import { expect, test, type Locator } from "@playwright/test";
import { makePerson, signInAs } from "./helpers";

const SHOTS = ".data/screenshots";

/** A screenshot of the 3D view once two shots in a row agree (it draws on demand, after the mesh is built). */
async function steadyShot(canvas: Locator): Promise<Buffer> {
  let last = await canvas.screenshot();
  for (let i = 0; i < 20; i++) {
    await canvas.page().waitForTimeout(250);
    const next = await canvas.screenshot();
    if (next.equals(last)) return next;
    last = next;
  }
  return last;
}

test("on the sketchpad a change of depth changes the figures and the 3D view", async ({ page }, info) => {
  await signInAs(page, await makePerson("designer"));
  await page.goto("/studio/sketchpad");
  await expect(page.getByRole("heading", { name: "Sketchpad" })).toBeVisible();

  const figures = page.getByTestId("font-figures");
  const canvas = page.getByTestId("font-canvas");
  await expect(canvas).toBeVisible({ timeout: 30_000 });
  await expect(canvas.locator("canvas")).toBeVisible();
  const figuresBefore = await figures.innerText();
  const before = await steadyShot(canvas);

  const depth = page.getByLabel("Depth", { exact: true });
  const old = Number(await depth.inputValue());
  await depth.fill(String(old - 40));
  await expect(page.getByTestId("error-depth")).toHaveCount(0);
  await expect.poll(() => figures.innerText()).not.toBe(figuresBefore);

  let after = await steadyShot(canvas);
  await expect.poll(async () => (after = await steadyShot(canvas)).equals(before), { timeout: 15_000 }).toBe(false);

  mkdirSync(SHOTS, { recursive: true });
  writeFileSync(`${SHOTS}/sketchpad-${info.project.name}-before.png`, before);
  writeFileSync(`${SHOTS}/sketchpad-${info.project.name}-after.png`, after);
});

test("the sketchpad is for studio staff only", async ({ page }) => {
  await signInAs(page, await makePerson("member"));
  await page.goto("/studio/sketchpad");
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
  await page.goto("/studio");
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
});
