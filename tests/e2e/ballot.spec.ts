import { devices, expect, test, type Browser, type Page } from "@playwright/test";
import { verifyRecord } from "../../models/trail/node-hash";
import { linkIn, makePerson, signInAs, sql, unique, waitForMail, newCommissionViaForm } from "./helpers";

const { defaultBrowserType: _ignored, ...PHONE } = devices["Pixel 7"];
void _ignored;

/** A commission of the test's own (so the desktop and phone runs never supersede each other's revision), circulated. */
async function ownCirculatedCommission(page: Page): Promise<{ title: string; commissionId: number }> {
  const { title, commissionId } = await newCommissionViaForm(page, "Font for the south porch", "St Tessa's — Building Committee", "St Tessa's, Polgarrow: the south porch");
  // The rules are the committee's: the studio cannot open the rules page.
  await page.goto(`/commissions/${commissionId}/rules`);
  await expect(page.getByRole("heading", { name: "Not found" })).toBeVisible();

  await page.goto(`/commissions/${commissionId}/revisions/new`);
  await page.getByLabel("What changed and why (you can finish this later)").fill("First proposal: a cast bowl on a ground glass foot, three engravings.");
  await page.getByRole("button", { name: "Start the draft" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1/edit$`));
  await page.getByRole("button", { name: "Circulate Revision 1…" }).click();
  await page.getByRole("button", { name: "Yes, freeze and circulate Revision 1" }).click();
  await expect(page).toHaveURL(new RegExp(`/commissions/${commissionId}/revisions/1$`));
  return { title, commissionId };
}

/** The chair sets the authority for electronic ballots on the rules page, which also confirms the rules. */
async function chairSetsRules(chair: Page, commissionId: number) {
  await chair.goto(`/commissions/${commissionId}`);
  await expect(chair.getByTestId("rules-proposed")).toBeVisible();
  await chair.goto(`/commissions/${commissionId}/rules`);
  await expect(chair.getByTestId("confirm-rules")).toBeVisible();
  await chair.getByLabel("Authority for electronic ballots").fill("Standing order 4: the committee may vote by electronic ballot between meetings");
  await chair.getByRole("button", { name: "Save the rules" }).click();
  await expect(chair).toHaveURL(new RegExp(`/commissions/${commissionId}$`));
  await expect(chair.getByTestId("rules-proposed")).toHaveCount(0);
}

/** A member on a phone of their own: signs in, opens the revision and votes (and may change their mind). */
async function voteFromPhone(browser: Browser, baseURL: string, email: string, path: string, choices: string[]) {
  const ctx = await browser.newContext({ ...PHONE, baseURL });
  const page = await ctx.newPage();
  await signInAs(page, email);
  await page.goto(path);
  const buttons = page.getByTestId("vote-buttons");
  for (const choice of choices) {
    const button = buttons.getByRole("button", { name: new RegExp(`^${choice}`) });
    const box = await button.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    await button.click();
    await expect(button).toHaveAttribute("aria-pressed", "true");
  }
  await expect(page.getByTestId("who-voted-how")).toBeVisible();
  await ctx.close();
}

test("the chair opens a ballot, three members vote from phones, the chair records approved as noted, and the trail verifies", async ({ page, browser }, info) => {
  test.setTimeout(180_000);
  const baseURL = String(info.project.use.baseURL ?? "http://localhost:3100");
  await signInAs(page, await makePerson("designer"));
  const { title, commissionId } = await ownCirculatedCommission(page);
  const path = `/commissions/${commissionId}/revisions/1`;
  const chairEmail = await makePerson("chair", { commissionTitle: title });
  const members = [await makePerson("member", { commissionTitle: title }), await makePerson("member", { commissionTitle: title }), await makePerson("member", { commissionTitle: title })];
  await makePerson("adviser", { commissionTitle: title });

  // The chair opens the ballot (closing in a week, by default).
  const chairCtx = await browser.newContext({ baseURL });
  const chair = await chairCtx.newPage();
  await signInAs(chair, chairEmail);
  await chairSetsRules(chair, commissionId);
  await chair.goto(path);
  const panel = chair.getByTestId("ballot-panel");
  await expect(panel.getByTestId("ballot-rules")).toContainText("Standing order 4");
  await panel.getByRole("button", { name: "Open the ballot" }).click();
  await expect(panel).toHaveAttribute("data-ballot-status", "open");
  await expect(panel).toContainText("voting closes");
  // The chair does not vote under these rules, and the API says so too.
  await expect(panel.getByTestId("vote-buttons")).toHaveCount(0);
  const [b] = await sql<{ id: number }[]>("SELECT id FROM ballots WHERE commission_id = ? AND status = 'open'", [commissionId]);
  const refused = await chair.request.post(`/api/ballots/${b.id}/votes`, { data: { choice: "in-favour" } });
  expect(refused.status()).toBe(403);

  // Three members vote on their phones; the third changes their vote before the close.
  await voteFromPhone(browser, baseURL, members[0], path, ["In favour"]);
  await voteFromPhone(browser, baseURL, members[1], path, ["In favour"]);
  await voteFromPhone(browser, baseURL, members[2], path, ["Against", "In favour"]);

  // The chair's tally follows without a reload; then the chair closes the ballot.
  await expect(panel.getByTestId("tally")).toContainText("3 of 3 voting members have voted");
  await expect(panel.getByTestId("ballot-roll")).toContainText("The roll (3), fixed when the ballot opened");

  // While it is open, who may vote is fixed, and the people page tells the studio so.
  await page.goto(`/commissions/${commissionId}/people`);
  await expect(page.getByTestId("roll-fixed-note")).toContainText("A ballot on Revision 1 is open");
  await panel.getByRole("button", { name: "Close the ballot now" }).click();
  await panel.getByRole("button", { name: "Yes, close it" }).click();
  await expect(panel.getByTestId("ballot-result")).toContainText("Carried");

  // Signed in long enough ago, the chair is asked to confirm it is them: a fresh link leads back here.
  await sql("UPDATE sessions s JOIN users u ON u.id = s.userId SET s.created_at = NOW(3) - INTERVAL 20 MINUTE WHERE u.email = ?", [chairEmail]);
  await chair.reload();
  const form = chair.getByTestId("decision-form");
  await form.getByRole("radio", { name: "Approved as noted", exact: true }).check();
  await form.getByLabel("Conditions, one per line").fill("Engrave the inscription at 8 mm lettering height\nAnchor the foot to the floor slab as the structural engineer specifies");
  await form.getByLabel("Statement (optional)").fill("Carried by electronic ballot.");
  const hash = (await chair.getByTestId("content-hash").getAttribute("data-hash"))!;
  await expect(form.getByTestId("signing-statement")).toContainText("You are recording, as chair, that the committee approved Revision 1 subject to the 2 conditions above.");
  await expect(form.getByTestId("signing-statement")).toContainText(hash);
  const since = Date.now();
  await form.getByRole("button", { name: "E-mail me a confirmation link" }).click();
  await expect(form.getByTestId("confirm-identity")).toContainText(`A link is on its way to ${chairEmail}`);
  const mail = await waitForMail(chairEmail, since, (m) => m.subject.includes("sign-in link"));
  await chair.goto(linkIn(mail, "/sign-in/confirm"));
  await chair.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(chair).toHaveURL(new RegExp(`${path}$`));

  // What the chair wrote was kept; now they record and sign it.
  await expect(form.getByLabel("Conditions, one per line")).toHaveValue(/8 mm lettering height/);
  await form.getByRole("button", { name: "Record and sign the decision" }).click();
  const summary = chair.getByTestId("decision-summary");
  await expect(summary).toHaveAttribute("data-outcome", "approved-as-noted");
  await expect(summary.getByTestId("decision-conditions").getByRole("listitem")).toHaveCount(2);
  await expect(summary).toContainText(hash);
  await expect(summary).toContainText("Carried by electronic ballot: 3 in favour, 0 against, 0 abstaining, of 3 voting members. The roll:");
  await chair.screenshot({ path: `.data/screenshots/decision-${info.project.name}.png`, fullPage: true });

  // Pressing again changes nothing: one decision.
  const again = await chair.request.post(`/api/revisions/${(await revisionId(commissionId))}/decision`, { data: { outcome: "not-approved" } });
  expect(again.status()).toBe(409);

  // The trail verifies, and says what happened.
  const res = await chair.request.get(`/api/commissions/${commissionId}/record.json`);
  expect(res.status()).toBe(200);
  const record = await res.json();
  expect(verifyRecord(record).ok).toBe(true);
  const actions = record.events.map((e: { action: string }) => e.action);
  expect(actions.filter((a: string) => a === "vote cast")).toHaveLength(3);
  expect(actions.filter((a: string) => a === "vote changed")).toHaveLength(1);
  expect(actions).toContain("ballot closed");
  const decided = record.events.filter((e: { action: string }) => e.action === "decision recorded");
  expect(decided).toHaveLength(1);
  expect(decided[0].payload).toMatchObject({ outcome: "approved-as-noted", contentHash: hash, conditions: [expect.stringContaining("8 mm"), expect.stringContaining("engineer")] });
  expect(actions.at(-1)).toBe("stage changed");
  await chairCtx.close();
});

async function revisionId(commissionId: number): Promise<number> {
  const [r] = await sql<{ id: number }[]>("SELECT id FROM revisions WHERE commission_id = ? AND number = 1", [commissionId]);
  return r.id;
}

test("every ballot and decision route refuses those without the right, and nothing changes", async ({ page, browser }, info) => {
  test.setTimeout(180_000);
  const baseURL = String(info.project.use.baseURL ?? "http://localhost:3100");
  await signInAs(page, await makePerson("designer"));
  const { title, commissionId } = await ownCirculatedCommission(page);
  const rid = await revisionId(commissionId);
  const as = async (email: string) => {
    const ctx = await browser.newContext({ baseURL });
    const p = await ctx.newPage();
    await signInAs(p, email);
    return p.request;
  };
  const chairCtx = await browser.newContext({ baseURL });
  const chairPage = await chairCtx.newPage();
  await signInAs(chairPage, await makePerson("chair", { commissionTitle: title }));
  await chairSetsRules(chairPage, commissionId);
  const chair = chairPage.request;
  const member = await as(await makePerson("member", { commissionTitle: title }));
  const adviser = await as(await makePerson("adviser", { commissionTitle: title }));
  const outsider = await as(await makePerson("member", { commissionTitle: "Font and cover for the new chapel" }));
  const designer = page.request;

  // Bad input names the field; it is never a 500.
  const bad = await chair.post(`/api/revisions/${rid}/ballot`, { data: { closesAt: "soon" } });
  expect(bad.status()).toBe(422);
  expect((await bad.json()).fields.closesAt).toContain("closing date");
  const notJson = await chair.post(`/api/revisions/${rid}/ballot`, { data: "{not json", headers: { "content-type": "application/json" } });
  expect(notJson.status()).toBe(422);

  const opened = await chair.post(`/api/revisions/${rid}/ballot`, { data: { closesAt: new Date(Date.now() + 86_400_000).toISOString() } });
  expect(opened.status()).toBe(201);
  const bid = (await opened.json()).ballot.id as number;

  const count = async () => JSON.stringify(await sql(
    `SELECT (SELECT COUNT(*) FROM ballots WHERE commission_id = ?) b, (SELECT COUNT(*) FROM votes v JOIN ballots x ON x.id = v.ballot_id WHERE x.commission_id = ?) v,
            (SELECT COUNT(*) FROM decisions WHERE commission_id = ?) d, (SELECT COUNT(*) FROM trail_events WHERE commission_id = ?) t`, [commissionId, commissionId, commissionId, commissionId]));
  const before = await count();
  const today = new Date().toISOString().slice(0, 10);
  const calls: [string, unknown][] = [
    [`/api/revisions/${rid}/ballot`, { closesAt: new Date(Date.now() + 86_400_000).toISOString() }],
    [`/api/ballots/${bid}/close`, {}],
    [`/api/revisions/${rid}/meeting-vote`, { meetingDate: today, minutesRef: "Minute book 1, page 2", counts: { inFavour: 1, against: 0, abstain: 0 } }],
    [`/api/revisions/${rid}/decision`, { outcome: "revise-and-resubmit" }],
    [`/api/revisions/${rid}/decision/sign-in-link`, {}],
  ];
  for (const [url, data] of calls) {
    for (const who of [member, adviser, designer]) expect((await who.post(url, { data })).status(), url).toBe(403);
    expect((await outsider.post(url, { data })).status(), url).toBe(404);
  }
  for (const who of [adviser, designer, chair]) expect((await who.post(`/api/ballots/${bid}/votes`, { data: { choice: "in-favour" } })).status()).toBe(403);
  expect((await outsider.post(`/api/ballots/${bid}/votes`, { data: { choice: "in-favour" } })).status()).toBe(404);
  expect((await outsider.get(`/api/revisions/${rid}/ballot`)).status()).toBe(404);
  expect((await outsider.get(`/api/revisions/${rid}/decision`)).status()).toBe(404);
  const anonymous = await (await browser.newContext({ baseURL })).request;
  expect((await anonymous.post(`/api/ballots/${bid}/votes`, { data: { choice: "in-favour" } })).status()).toBe(401);
  expect(await count()).toBe(before);

  // The one who may, can; and the adviser and the studio see who voted how.
  expect((await member.post(`/api/ballots/${bid}/votes`, { data: { choice: "abstain" } })).status()).toBe(200);
  for (const who of [adviser, designer]) {
    const state = await (await who.get(`/api/revisions/${rid}/ballot`)).json();
    expect(state.tally).toMatchObject({ abstain: 1, ballotsCast: 1 });
    expect(state.whoVotedHow.filter((v: { choice: string | null }) => v.choice === "abstain")).toHaveLength(1);
    expect(state.youMayVote).toBe(false);
  }
});
