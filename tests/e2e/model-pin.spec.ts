import { expect, test } from "@playwright/test";
import { DEMO_TITLE, makePerson, signInAs, sql, unique } from "./helpers";

test("a member taps the 3D model to pin a comment on that spot, and the pin shows on the model", async ({ page }, info) => {
  const [rev] = await sql<{ commission_id: number; number: number }[]>(
    "SELECT r.commission_id, r.number FROM revisions r JOIN commissions c ON c.id = r.commission_id WHERE c.title = ? AND r.state = 'circulated' ORDER BY r.number DESC LIMIT 1", [DEMO_TITLE]);
  await signInAs(page, await makePerson("member"));
  await page.goto(`/commissions/${rev.commission_id}/revisions/${rev.number}`);
  const canvas = page.getByTestId("font-canvas");
  await expect(canvas).toBeVisible({ timeout: 20_000 });
  await canvas.scrollIntoViewIfNeeded();
  await page.waitForTimeout(1500); // let the scene settle before picking
  const box = (await canvas.boundingBox())!;
  // Try a few spots down the middle of the picture until one lands on the glass or the pedestal.
  const composer = page.getByTestId("composer-target");
  for (const f of [0.16, 0.2, 0.12, 0.4, 0.6]) {
    await page.mouse.click(box.x + box.width / 2, box.y + box.height * f);
    if (/on the (bowl|foot|pedestal)/.test((await composer.textContent()) ?? "")) break;
  }
  await expect(composer).toContainText(/on the (bowl|foot|pedestal), \d+ mm up/);
  const words = `Is this spot where the engraving goes? ${unique("m")}`;
  await page.getByLabel("Your comment").fill(words);
  await page.getByRole("button", { name: "Post comment" }).click();
  const thread = page.getByTestId("comment-thread").filter({ hasText: words });
  await expect(thread).toBeVisible();
  await page.screenshot({ path: `.data/screenshots/model-pin-${info.project.name}.png`, fullPage: false });
  await expect.poll(async () => (await sql<unknown[]>("SELECT id FROM comments WHERE body = ?", [words])).length).toBe(1);
  const [row] = await sql<{ id: number; target: string }[]>("SELECT id, target FROM comments WHERE body = ?", [words]);
  const target = JSON.parse(row.target);
  expect(target.kind).toBe("model");
  expect(["bowl", "foot", "pedestal"]).toContain(target.part);
  expect(target.point).toHaveLength(3);

  // The pin is listed under the model; choosing it brings its thread into view.
  const [r] = await sql<{ revision_id: number }[]>("SELECT revision_id FROM comments WHERE id = ?", [row.id]);
  const listed = await (await page.request.get(`/api/revisions/${r.revision_id}/comments`)).json();
  const mine = listed.threads.find((t: { id: number }) => t.id === row.id);
  await page.getByTestId("font-canvas").scrollIntoViewIfNeeded();
  const pins = page.getByRole("list", { name: "Points marked on the model" });
  const button = pins.getByRole("button", { name: `Comment ${mine.number} — on the ${target.part}` });
  await expect(button).toBeVisible();
  await button.click();
  await expect(page.locator(`#comment-${row.id}`)).toBeInViewport();
});
