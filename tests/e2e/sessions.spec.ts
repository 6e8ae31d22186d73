import { expect, test } from "@playwright/test";
import { DEMO_TITLE, makePerson, signInAs, sql } from "./helpers";

// Several sign-ins and mail round trips per test, on a shared machine: a longer allowance.
test.describe.configure({ timeout: 180_000 });

test("the session cookie is HttpOnly and SameSite=Lax, and no page or JSON carries it (OWASP ASVS 4.0.3 V3.1.1, V3.4.2, V3.4.3)", async ({ page, context, baseURL }) => {
  await signInAs(page, await makePerson("member"));
  const cookies = await context.cookies();
  const session = cookies.find((c) => /placet-session$/.test(c.name))!;
  expect(session).toBeTruthy();
  expect(session.httpOnly).toBe(true);
  expect(session.sameSite).toBe("Lax");
  expect(session.path).toBe("/");
  // Secure and the __Host- prefix are for https app URLs (V3.4.1, V3.4.4); this run is on http.
  expect(session.secure).toBe(baseURL!.startsWith("https://"));
  expect(session.name).toBe(baseURL!.startsWith("https://") ? "__Host-placet-session" : "placet-session");
  expect(cookies.some((c) => c.name.startsWith("authjs"))).toBe(false);

  const [c] = await sql<{ id: number }[]>("SELECT id FROM commissions WHERE title = ?", [DEMO_TITLE]);
  const stored = await sql<{ sessionToken: string }[]>("SELECT sessionToken FROM sessions");
  for (const path of ["/api/auth/session", "/commissions", `/commissions/${c.id}`, `/commissions/${c.id}/revisions`, "/account/devices", "/verify"]) {
    const body = await (await page.request.get(path)).text();
    expect(body, path).not.toContain(session.value);
    for (const s of stored) expect(body, path).not.toContain(s.sessionToken);
  }
  const json = await (await page.request.get("/api/auth/session")).json();
  expect(Object.keys(json)).toEqual(["user"]);
  expect(Object.keys(json.user).sort()).toEqual(["email", "name"]);
  expect(await page.evaluate(() => document.cookie)).not.toContain(session.value);
});

test("signed-in devices: 'sign out everywhere else' ends the other device's session (OWASP ASVS 4.0.3 V3.3.4)", async ({ page, browser }) => {
  const email = await makePerson("member");
  await signInAs(page, email);
  const other = await browser.newContext();
  const otherPage = await other.newPage();
  await signInAs(otherPage, email);

  await page.goto("/account/devices");
  await expect(page.getByRole("heading", { name: "Signed-in devices" })).toBeVisible();
  await expect(page.getByTestId("device")).toHaveCount(2);
  await expect(page.getByTestId("device-list")).toContainText("(this device)");
  await page.getByRole("button", { name: "Sign out everywhere else" }).click();
  await expect(page.getByRole("status")).toContainText("Signed out on 1 other device");
  await expect(page.getByTestId("device")).toHaveCount(1);

  await otherPage.goto("/commissions");
  await expect(otherPage).toHaveURL(/\/sign-in/);
  await page.goto("/commissions");
  await expect(page).toHaveURL(/\/commissions$/);
  await other.close();
});

test("an idle session ends: the next page asks to sign in again (OWASP ASVS 4.0.3 V3.3.2)", async ({ page }) => {
  const email = await makePerson("member");
  await signInAs(page, email);
  await sql("UPDATE sessions s JOIN users u ON u.id = s.userId SET s.last_seen_at = NOW(3) - INTERVAL 31 MINUTE WHERE u.email = ?", [email]);
  await page.goto("/commissions");
  await expect(page).toHaveURL(/\/sign-in/);
  expect(await sql<unknown[]>("SELECT 1 FROM sessions s JOIN users u ON u.id = s.userId WHERE u.email = ?", [email])).toHaveLength(0);
});
