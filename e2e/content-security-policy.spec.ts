import { type Browser, expect, type Page, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { CarCardPage } from "./pages/car-card-page";
import { SignInPage } from "./pages/sign-in-page";
import { watchCspViolations } from "./support/csp-violations";
import { movedUpEntrant } from "./support/demo-facts";

// Under the content security policy every page still works and the browser blocks nothing of
// Plumbline's own: each page's `securitypolicyviolation` events are collected from the first
// script on and must be none. (Source: W3C CSP Level 3 §5.3, the SecurityPolicyViolationEvent.)

async function watched(
  browser: Browser,
): Promise<{ page: Page; violations: () => Promise<string[]> }> {
  const context = await browser.newContext();
  const violationsOf = await watchCspViolations(context);
  const page = await context.newPage();
  return { page, violations: () => violationsOf(page) };
}

test("the scrutineer's tech line and car card run with nothing blocked", async ({ browser }) => {
  const { page, violations } = await watched(browser);
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  await new CarCardPage(page).open(37);
  await expect(page.getByTestId("preview-verdict")).toBeVisible();
  expect(await violations()).toEqual([]);
});

test("the entrant's garage and pass QR run with nothing blocked", async ({ browser }) => {
  const moved = await movedUpEntrant();
  const { page, violations } = await watched(browser);
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(moved.email, demo.password);
  await expect(page).toHaveURL(/\/garage$/);
  await page.getByTestId("entry-pass-link").first().click();
  await expect(page.getByTestId("pass-qr")).toBeVisible();
  expect(await violations()).toEqual([]);
});

test("the organizer's class rules and the public paddock board run with nothing blocked", async ({
  browser,
}) => {
  const { page, violations } = await watched(browser);
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.organizer, demo.password);
  await expect(page).toHaveURL(/\/organizer\/[0-9a-f-]{36}$/);
  const eventId = /\/organizer\/([0-9a-f-]{36})/.exec(page.url())?.[1];
  await page.goto(`/organizer/${eventId}/rules`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  // Each navigation starts a fresh list: read this page's before leaving it.
  expect(await violations()).toEqual([]);
  await page.goto(`/board/${eventId}`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  expect(await violations()).toEqual([]);
});
