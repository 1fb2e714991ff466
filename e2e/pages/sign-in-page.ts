import { expect, type Page } from "@playwright/test";

/** The sign-in page, as a person uses it. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(callbackUrl?: string) {
    await this.page.goto(
      callbackUrl ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-in",
    );
    await expect(this.page.getByRole("heading", { name: "Sign in", exact: true })).toBeVisible();
  }

  async withPassword(email: string, password: string) {
    const form = this.page.locator("form", {
      has: this.page.getByRole("heading", { name: "Sign in with a password" }),
    });
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Password").fill(password);
    await form.getByRole("button", { name: "Sign in" }).click();
  }

  async askForLink(email: string) {
    const form = this.page.locator("form", {
      has: this.page.getByRole("heading", { name: "Get a sign-in link" }),
    });
    await form.getByLabel("E-mail").fill(email);
    await form.getByRole("button", { name: "E-mail me a link" }).click();
    await expect(this.page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  }
}
