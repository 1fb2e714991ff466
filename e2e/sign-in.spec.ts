import { expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { latestLinkFor } from "./support/mailbox";

const homes = [
  {
    who: "scrutineer",
    email: demo.scrutineer,
    url: /\/tech\/[0-9a-f-]{36}$/,
    heading: "Scrutineering",
  },
  {
    who: "chief scrutineer",
    email: demo.chief,
    url: /\/tech\/[0-9a-f-]{36}\/chief$/,
    heading: "Cars that need your decision",
  },
  {
    who: "clerk of course",
    email: demo.clerk,
    url: /\/clerk\/[0-9a-f-]{36}$/,
    heading: "Run groups and the run sheet",
  },
  {
    who: "organizer",
    email: demo.organizer,
    url: /\/organizer\/[0-9a-f-]{36}$/,
    heading: "The event",
  },
  {
    who: "registrar",
    email: demo.registrar,
    url: /\/registration\/[0-9a-f-]{36}$/,
    heading: "Sign-on desk",
  },
  { who: "entrant", email: demo.entrant, url: /\/garage$/, heading: "Your garage" },
];

for (const home of homes) {
  test(`the demo ${home.who} signs in with a password and lands on their own home`, async ({
    page,
  }) => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.withPassword(home.email, demo.password);
    await expect(page).toHaveURL(home.url);
    await expect(page.getByRole("heading", { level: 1, name: home.heading })).toBeVisible();
    await expect(page.getByText("never replaces the chief scrutineer")).toBeVisible();
  });
}

test("a wrong password is refused with a plain message and no hint which part was wrong", async ({
  page,
}) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(demo.scrutineer, "not-it");
  await expect(
    page.getByRole("alert").filter({ hasText: "do not match an account" }),
  ).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in/);
});

test("signing in by e-mail link, read from the local SMTP server", async ({ page }) => {
  const since = Date.now() - 1000;
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.askForLink(demo.scrutineer);
  const link = await latestLinkFor(demo.scrutineer, since);
  expect(link).toContain("/api/auth/callback/nodemailer");
  await page.goto(link);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { level: 1, name: "Scrutineering" })).toBeVisible();
});

test("an entrant cannot open a scrutineer page", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\//);
  const techUrl = page.url();
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("link", { name: "Sign in" }).first()).toBeVisible();

  await signIn.open();
  await signIn.withPassword(demo.entrant, demo.password);
  await expect(page).toHaveURL(/\/garage$/);
  const response = await page.goto(techUrl);
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId("forbidden")).toBeVisible();
});

test("a signed-out visitor to the tech line is sent to sign in, then back", async ({
  page,
  browser,
  baseURL,
}) => {
  await page.goto("/sign-in");
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\//);
  const techUrl = new URL(page.url()).pathname;
  // A browser that never signed in (clearing cookies here would race the page's own requests,
  // whose answers can set the session cookie again).
  const visitor = await (await browser.newContext({ baseURL: baseURL ?? "" })).newPage();
  await visitor.goto(techUrl);
  await expect(visitor).toHaveURL(/\/sign-in\?callbackUrl=/);
  await new SignInPage(visitor).withPassword(demo.scrutineer, demo.password);
  await expect(visitor).toHaveURL(new RegExp(`${techUrl}$`));
  await visitor.context().close();
});
