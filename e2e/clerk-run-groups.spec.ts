import { type Browser, expect, type Page, test } from "@playwright/test";
import ICAL from "ical.js";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { clearRunSheets, mailFor, publishedDrive } from "./support/published-drive";

// The clerk of course's page on a desk and on a phone: build run groups from the demo day's
// ready cars, move a car by tap-to-move, publish, drag one and tap-move another, and see the diff
// (who moved) before publishing again.
// Screenshots go to CLERK_SCREENSHOTS_DIR when set (for looking at), else the test's output.
const desk = { width: 1440, height: 900 };
const phone = { width: 390, height: 844 };

async function signedIn(browser: Browser, viewport: { width: number; height: number }) {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1 });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.clerk, demo.password);
  await expect(page).toHaveURL(/\/clerk\/[0-9a-f-]{36}$/);
  return { context, page };
}

const shot = (page: Page, name: string, fullPage = false) =>
  page.screenshot({
    path: `${process.env.CLERK_SCREENSHOTS_DIR ?? test.info().outputPath()}/${name}.png`,
    fullPage,
  });

async function saved(page: Page) {
  await expect(page.getByTestId("draft-status")).toHaveText(/Draft saved \(revision \d+\)/);
}

/** Tap the first car of the first group and move it to the second group; its car number. */
async function tapMoveFirstCar(page: Page): Promise<string> {
  const groups = page.getByTestId("run-group");
  const tile = groups.first().getByTestId("drive-tile").first();
  const carNumber = (await tile.getAttribute("data-car-number")) ?? "";
  const second = (await groups.nth(1).getAttribute("data-group-name")) ?? "";
  await tile.getByRole("button").first().click();
  await page
    .getByTestId("move-choices")
    .getByRole("button", { name: `Move to ${second}` })
    .click();
  await expect(
    groups.nth(1).locator(`[data-testid="drive-tile"][data-car-number="${carNumber}"]`),
  ).not.toHaveCount(0);
  await saved(page);
  return carNumber;
}

/** On a desk: drag the first car of the second group across onto the first group (the cards
 *  stand side by side) with the mouse. */
async function dragCarToFirstGroup(page: Page) {
  const groups = page.getByTestId("run-group");
  await groups.first().locator("header").scrollIntoViewIfNeeded();
  const tile = groups.nth(1).getByTestId("drive-tile").first();
  const carNumber = (await tile.getAttribute("data-car-number")) ?? "";
  const from = await tile.boundingBox();
  const to = await groups.first().getByTestId("drive-tile").first().boundingBox();
  if (!from || !to) throw new Error("nothing to drag");
  await page.mouse.move(from.x + 40, from.y + 20);
  await page.mouse.down();
  await page.mouse.move(from.x + 60, from.y + 30, { steps: 5 });
  await page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 20 });
  await page.mouse.up();
  await expect(
    groups.first().locator(`[data-testid="drive-tile"][data-car-number="${carNumber}"]`),
  ).not.toHaveCount(0);
  await saved(page);
}

test("the clerk builds, moves a car, publishes, and sees the diff before publishing again", async ({
  browser,
}) => {
  // From an empty sheet every time: version 1 mails every driver on it.
  await clearRunSheets();
  const { context, page } = await signedIn(browser, desk);
  await expect(page.getByTestId("at-a-glance")).toBeVisible();
  await page.getByRole("button", { name: "Build run groups" }).click();
  await expect(page.getByTestId("run-group").first()).toBeVisible();
  await saved(page);
  await expect(page.getByTestId("constraints-ok")).toBeVisible();
  await shot(page, "clerk-desk-built", true);

  const movedFirst = await tapMoveFirstCar(page);
  // Another spec may have published on this database first: count from what the page offers.
  const review = page.getByRole("button", { name: /Review changes and publish version \d+/ });
  const first = Number(/version (\d+)/.exec((await review.textContent()) ?? "")?.[1]);
  const publishedSince = Date.now();
  await review.click();
  const confirm = page.getByTestId("publish-confirm");
  await confirm.getByRole("checkbox").check();
  await confirm.getByRole("button", { name: `Publish version ${first}` }).click();
  await expect(page.getByTestId("publish-result")).toContainText(`Version ${first} is in force`);
  await expect(page.getByTestId("versions")).toContainText(`Version ${first} (in force)`);
  await entrantSeesTheirGroup(browser, first, publishedSince, Number(movedFirst));

  await dragCarToFirstGroup(page);
  const moved = await tapMoveFirstCar(page);
  await page
    .getByRole("button", { name: `Review changes and publish version ${first + 1}` })
    .click();
  // The diff before confirming (the last publication's answer, further down, has its own list).
  const preview = page.getByTestId("publish-confirm").getByTestId("diff-moved");
  await expect(preview.locator("li")).toHaveCount(2);
  await expect(preview).toContainText(moved);
  await page.getByTestId("publish-confirm").scrollIntoViewIfNeeded();
  await shot(page, "clerk-desk-publish-diff");
  await page.getByTestId("publish-confirm").getByRole("checkbox").check();
  await page.getByRole("button", { name: `Publish version ${first + 1}` }).click();
  await expect(page.getByTestId("publish-result")).toContainText(
    `Version ${first + 1} is in force`,
  );
  await expect(page.getByTestId("session-calls")).toBeVisible();
  await shot(page, "clerk-desk-published", true);
  await context.close();

  // The same page on a phone: one column, nothing wider than the screen, tap-to-move at the thumb.
  const onPhone = await signedIn(browser, phone);
  await expect(onPhone.page.getByTestId("run-group").first()).toBeVisible();
  await shot(onPhone.page, "clerk-phone-top");
  await onPhone.page.getByTestId("run-group").first().scrollIntoViewIfNeeded();
  await onPhone.page.getByTestId("drive-tile").first().getByRole("button").first().click();
  await expect(onPhone.page.getByTestId("move-choices")).toBeVisible();
  await shot(onPhone.page, "clerk-phone-move");
  expect(
    await onPhone.page.evaluate(() => document.documentElement.scrollWidth),
  ).toBeLessThanOrEqual(phone.width);
  await onPhone.page.getByTestId("session-calls").scrollIntoViewIfNeeded();
  await shot(onPhone.page, "clerk-phone-day");
  await onPhone.context.close();
});

/** A driver on the published sheet: the e-mail with the calendar file (RFC 5545, read back by
 *  ical.js: one event per session of each of the car's drives, 3 rounds here… or as many as the
 *  sheet has, plus the briefing), the group on the entry page and the calendar download, and the
 *  car in its group on the paddock board. */
async function entrantSeesTheirGroup(
  browser: Browser,
  version: number,
  since: number,
  carNumber: number,
) {
  // The car the clerk moved: its group changed, so its drivers are mailed whatever came before.
  const drive = await publishedDrive(version, carNumber);
  const mail = await mailFor(drive.email, since, /run sheet/);
  expect(mail.subject).toContain(`Car ${drive.carNumber}:`);
  expect(mail.text).toContain(drive.groupName);
  const file = mail.attachments?.find((a) => a.filename?.endsWith(".ics"));
  expect(file?.contentType).toMatch(/^text\/calendar/);
  const events = new ICAL.Component(ICAL.parse(file?.content ?? "")).getAllSubcomponents("vevent");
  expect(events.length).toBeGreaterThan(drive.drivesOfCar);

  const context = await browser.newContext({ viewport: phone, deviceScaleFactor: 1 });
  const page = await context.newPage();
  await new SignInPage(page).open(`/entries/${drive.entryId}`);
  await new SignInPage(page).withPassword(drive.email, demo.password);
  await expect(page).toHaveURL(new RegExp(`/entries/${drive.entryId}$`));
  await expect(page.getByTestId("entry-run-group")).toContainText(drive.groupName);
  const download = page.waitForEvent("download");
  await page.getByTestId("entry-calendar").click();
  const stream = await (await download).createReadStream();
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  const ics = Buffer.concat(chunks).toString("utf8");
  expect(new ICAL.Component(ICAL.parse(ics)).getAllSubcomponents("vevent").length).toBe(
    events.length,
  );

  await page.goto(`/board/${drive.eventId}`);
  await expect(
    page
      .locator(`[data-testid="run-sheet-group"][data-group-name="${drive.groupName}"]`)
      .locator(`[data-car-number="${drive.carNumber}"]`)
      .first(),
  ).toBeVisible();
  await context.close();
}
