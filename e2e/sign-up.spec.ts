import { expect, type Page, test } from "@playwright/test";
import { latestLinkFor } from "./support/mailbox";

/** The name the header shows on this screen (the phone's short form; the full one is hidden). */
const shownName = (page: Page) => page.getByTestId("signed-in-as").locator("span:visible");

// A new person on a phone: finds "Create an account", signs up with a password, confirms from the
// account e-mail (the local mailbox), lands on the profile, fills it and is shown by name.
test("a new person signs up, confirms by e-mail, fills the profile and is shown by name", async ({
  page,
}) => {
  const email = `signup-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@accounts.test`;
  await page.goto("/");
  await expect(page.getByRole("banner").getByRole("link", { name: "Sign up" })).toBeVisible();
  await page.getByRole("main").getByRole("link", { name: "Create an account" }).click();
  await expect(page.getByRole("heading", { name: "Create an account" })).toBeVisible();

  const form = page.locator("form", {
    has: page.getByRole("heading", { name: "With a password" }),
  });
  await form.getByLabel("Full name").fill("Ana Kovac");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password").fill("short");
  await form.getByRole("button", { name: "Create account" }).click();
  // Source: NIST SP 800-63B §5.1.1.2 — at least 8 characters.
  await expect(form.getByText("Use at least 8 characters")).toBeVisible();
  const since = Date.now();
  await form.getByLabel("Password").fill("paddock-lunch-queue");
  await form.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();

  const link = await latestLinkFor(email, since);
  expect(link).toContain("/sign-up/confirm?token=");
  await page.goto(link);
  await expect(page).toHaveURL(/\/profile$/);
  await expect(page.getByRole("heading", { name: "Your profile" })).toBeVisible();
  await expect(shownName(page)).toHaveText("Ana K.");

  const profile = page.getByRole("form", { name: "Profile" });
  await profile.getByLabel("Full name").fill("Beatriz Okafor");
  await profile.getByLabel("Date of birth").fill("2999-01-01");
  await profile.getByLabel("Phone", { exact: true }).fill("+44 7700 900123");
  await profile.getByLabel("Emergency contact's name").fill("Chidi Okafor");
  await profile.getByLabel("Emergency contact's phone").fill("+44 7700 900456");
  await profile.getByLabel(/^Intermediate/).check();
  await profile.getByRole("button", { name: "Save profile" }).click();
  // Checked in the browser before anything is sent.
  await expect(profile.getByText("A date of birth cannot be in the future")).toBeVisible();
  await profile.getByLabel("Date of birth").fill("1994-05-14");
  await profile.getByRole("button", { name: "Save profile" }).click();
  await expect(profile.getByRole("status")).toHaveText("Profile saved.");
  await expect(shownName(page)).toHaveText("Beatriz O.");

  // Still so after a reload, and on another page.
  await page.goto("/garage");
  await expect(shownName(page)).toHaveText("Beatriz O.");

  // The account e-mail in the local mailbox, both parts.
  await page.goto(`/demo/mailbox?to=${encodeURIComponent(email)}`);
  const message = page
    .getByTestId("mail-message")
    .filter({ hasText: "Confirm your Plumbline account" });
  await expect(message).toHaveCount(1);
  await expect(message.getByRole("region", { name: "Text part" })).toContainText(
    "Confirm and sign in",
  );
  const html = message.getByTestId("mail-html");
  await expect(html).toBeVisible();
  await expect(
    page
      .frameLocator(`[data-testid="mail-html"]`)
      .first()
      .getByRole("link", { name: "Confirm and sign in" }),
  ).toBeVisible();
});
