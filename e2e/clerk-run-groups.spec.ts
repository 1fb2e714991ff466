import { type Browser, expect, type Page, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";

// The clerk of course's page on a desk and on a phone: build run groups from the demo day's
// ready cars, move a car by tap-to-move, publish, move again and see the diff before publishing.
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

test("the clerk builds, moves a car, publishes, and sees the diff before publishing again", async ({
  browser,
}) => {
  const { context, page } = await signedIn(browser, desk);
  await expect(page.getByTestId("at-a-glance")).toBeVisible();
  await page.getByRole("button", { name: "Build run groups" }).click();
  await expect(page.getByTestId("run-group").first()).toBeVisible();
  await saved(page);
  await expect(page.getByTestId("constraints-ok")).toBeVisible();
  await shot(page, "clerk-desk-built", true);

  await tapMoveFirstCar(page);
  await page.getByRole("button", { name: /Review changes and publish version 1/ }).click();
  const confirm = page.getByTestId("publish-confirm");
  await confirm.getByRole("checkbox").check();
  await confirm.getByRole("button", { name: "Publish version 1" }).click();
  await expect(page.getByTestId("publish-result")).toContainText("Version 1 is in force");
  await expect(page.getByTestId("versions")).toContainText("Version 1 (in force)");

  const moved = await tapMoveFirstCar(page);
  await page.getByRole("button", { name: /Review changes and publish version 2/ }).click();
  await expect(page.getByTestId("diff-moved").locator("li")).toHaveCount(1);
  await expect(page.getByTestId("diff-moved")).toContainText(moved);
  await page.getByTestId("publish-confirm").scrollIntoViewIfNeeded();
  await shot(page, "clerk-desk-publish-diff");
  await page.getByTestId("publish-confirm").getByRole("checkbox").check();
  await page.getByRole("button", { name: "Publish version 2" }).click();
  await expect(page.getByTestId("publish-result")).toContainText("Version 2 is in force");
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
