import { expect, test } from "@playwright/test";
import { makePerson, requestLink, signInAs, sql, unique, waitForMail, linkIn } from "./helpers";

test("a committee member signs in by the e-mailed link and sees only their commission", async ({ page }) => {
  await signInAs(page, await makePerson("member"));
  const list = page.getByTestId("commission-list");
  await expect(list.getByText("Baptismal font for the west end")).toBeVisible();
  await expect(list.getByText("Font and cover for the new chapel")).toHaveCount(0);
  await list.getByText("Baptismal font for the west end").click();
  await expect(page.getByTestId("next-steps")).toContainText("Read Revision 2");
  await expect(page.getByTestId("current-revision")).toContainText("Circulated");
  const rows = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = 'Font and cover for the new chapel'");
  await page.goto(`/commissions/${rows[0].id}`);
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
  await page.goto(`/commissions/999999`);
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();
});

test("opening the link alone does not sign in; the link works once", async ({ page, context }) => {
  const link = await requestLink(page, await makePerson("member"));
  await page.goto(link);
  await expect(page.getByText("You are signing in as")).toBeVisible();
  // A mail scanner opening the link changes nothing: the same link still works afterwards.
  await page.goto(link);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/commissions/);
  await context.clearCookies();
  await page.goto(link);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page.getByTestId("sign-in-error")).toContainText("expired or has already been used");
});

test("an expired link is refused with a clear message", async ({ page }) => {
  const email = await makePerson("member");
  const link = await requestLink(page, email);
  await sql("UPDATE verification_tokens SET expires = NOW() - INTERVAL 1 MINUTE WHERE identifier = ?", [email]);
  await page.goto(link);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page.getByTestId("sign-in-error")).toContainText("expired or has already been used");
});

test("an invalid address shows the field's error; an unknown one gets the same answer as a known one", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill("not-an-address");
  await page.getByRole("button", { name: "Send me a sign-in link" }).click();
  await expect(page.locator("#email-error")).toContainText("Enter an e-mail address like");
  await page.getByLabel("E-mail address").fill(`${unique("nobody")}@example.test`);
  await page.getByRole("button", { name: "Send me a sign-in link" }).click();
  await expect(page.getByRole("heading", { name: "Check your inbox" })).toBeVisible();
});

test("the designer invites an adviser, who then signs in", async ({ page, browser }) => {
  const email = `${unique("adviser")}@example.test`;
  const name = `Rowan ${unique("Ashby")}`;
  await signInAs(page, await makePerson("designer"));
  await page.getByTestId("commission-list").getByText("Baptismal font for the west end").click();
  await page.getByRole("link", { name: "People", exact: true }).click();
  const form = page.getByTestId("invite-form");
  await form.getByLabel("Name").fill(name);
  await form.getByLabel("E-mail address").fill("rowan-at-example");
  await form.getByLabel("Role").selectOption("adviser");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.locator("#email-error")).toBeVisible();
  const since = Date.now();
  await form.getByLabel("E-mail address").fill(email);
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByRole("status")).toContainText(`Invited ${email}`);
  await expect(page.getByText(name)).toBeVisible();
  const invite = await waitForMail(email, since, (m) => m.subject.includes("invited"));
  expect(linkIn(invite, "/sign-in")).toContain("/sign-in");

  const ctx = await browser.newContext();
  const adviser = await ctx.newPage();
  await signInAs(adviser, email);
  await expect(adviser.getByTestId("commission-list").getByText("Baptismal font for the west end")).toBeVisible();
  await ctx.close();
});
