import { expect, test } from "@playwright/test";
import { makePerson, newCommissionViaForm, signInAs, sql, waitForMail } from "./helpers";

/**
 * A record file cut short at its end still holds together by itself; the trail head quoted in the decision
 * mail is what catches it (a hash chain shows truncation only against a head kept outside it: RFC 6962 §2.1).
 */
test("the decision mail's trail head: /verify says whether a record file reaches it", async ({ page, browser }, info) => {
  test.setTimeout(300_000);
  const baseURL = String(info.project.use.baseURL ?? "http://localhost:3100");
  await signInAs(page, await makePerson("designer"));
  const { title, commissionId } = await newCommissionViaForm(page, "Font for the north aisle", "St Ia's — Fabric Committee", "St Ia's, Trevenna: the north aisle");
  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByLabel("What changed and why (you can finish this later)").fill("First proposal: a bowl of low-iron glass on a ground foot.");
  await page.getByRole("button", { name: "Start the draft" }).click();
  await page.getByRole("button", { name: "Circulate Revision 1…" }).click();
  await page.getByRole("button", { name: "Yes, freeze and circulate Revision 1" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1$`));

  // The chair, just signed in, records "revise and resubmit" (no ballot needed); the mail quotes the head.
  const chairEmail = await makePerson("chair", { commissionTitle: title });
  const ctx = await browser.newContext({ baseURL });
  const chair = await ctx.newPage();
  await signInAs(chair, chairEmail);
  const [rev] = await sql<{ id: number }[]>("SELECT id FROM revisions WHERE commission_id = ? AND number = 1", [commissionId]);
  const since = Date.now();
  const res = await chair.request.post(`/api/revisions/${rev.id}/decision`, { data: { outcome: "revise-and-resubmit", statement: "Please widen the foot." } });
  expect(res.status()).toBe(201);
  const mail = await waitForMail(chairEmail, since, (m) => m.subject.startsWith("Decision on Revision 1"), 60_000);
  const headLine = (mail.text ?? "").split("\n").map((l) => l.trim()).find((l) => l.startsWith("Trail head after this decision:"))!;
  expect(headLine).toMatch(/event \d+, hash [0-9a-f]{64}$/);
  const seq = Number(headLine.match(/event (\d+)/)![1]);

  // The trail page shows the same head.
  await chair.goto(`/commissions/${commissionId}/trail`);
  await expect(chair.getByTestId("trail-head")).toContainText(headLine.replace("Trail head after this decision: ", ""));

  const text = await (await chair.request.get(`/api/commissions/${commissionId}/record.json`)).text();
  const record = JSON.parse(text);
  expect(record.events).toHaveLength(seq);

  // The whole file reaches the head from the mail.
  await chair.goto("/verify");
  await chair.getByLabel("Trail head from a decision mail or the printed record (optional)").fill(headLine);
  await chair.getByLabel("Record file").setInputFiles({ name: "record.json", mimeType: "application/json", buffer: Buffer.from(text) });
  await expect(chair.getByRole("heading", { name: "The chain holds" })).toBeVisible();
  await expect(chair.getByTestId("head-findings")).toContainText(`It reaches the head you gave: event ${seq}`);

  // The same file with its last two events cut, its final hash made to match and its own head removed.
  const cut = { ...record, events: record.events.slice(0, seq - 2), finalHash: record.events[seq - 3].hash };
  delete cut.head;
  await chair.goto("/verify");
  await chair.getByLabel("Record file").setInputFiles({ name: "cut.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(cut)) });
  await expect(chair.getByRole("heading", { name: "The chain holds" })).toBeVisible(); // by itself it looks whole
  await chair.getByLabel("Trail head from a decision mail or the printed record (optional)").fill(headLine);
  const failed = chair.getByTestId("verify-failed");
  await expect(failed).toContainText(`The record ends at event ${seq - 2} but the head you gave is event ${seq}`);
  await expect(failed).toContainText(`Number ${seq - 1}`);
  await chair.screenshot({ path: `.data/screenshots/verify-head-${info.project.name}.png`, fullPage: true });
  await ctx.close();
});
