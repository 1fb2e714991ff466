import { type Browser, expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { queryTestDb } from "../tests/support/query-test-db";
import { removeScratchEntries } from "../tests/support/scratch-entries";
import { SignInPage } from "./pages/sign-in-page";
import { e2eDatabaseUrl } from "./support/e2e-database-url";

// The entrant's journey into an event on a phone (the "phone" project: Pixel 7): find the open
// event, add a car and enter it with a co-driver; the co-driver opens the invitation e-mail,
// signs in and accepts. Each run adds a car of its own, so the spec repeats on one database.

const OPEN_EVENT = "Cinder Vale Winter Sprint";

async function invitationLink(address: string, since: number): Promise<string> {
  const mailbox = process.env.MAILBOX_URL ?? "http://127.0.0.1:2780";
  for (let attempt = 0; attempt < 75; attempt += 1) {
    const response = await fetch(`${mailbox}/messages?to=${encodeURIComponent(address)}`);
    const { messages } = (await response.json()) as {
      messages: { receivedAt: string; subject: string; text: string }[];
    };
    const mail = messages.find(
      (m) => Date.parse(m.receivedAt) >= since && m.subject.includes("co-drive"),
    );
    const link = mail?.text.match(/https?:\/\/\S+\/invites\/\S+/)?.[0];
    if (link) return link;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no invitation mail for ${address}`);
}

async function phone(browser: Browser) {
  const context = await browser.newContext({ ...test.info().project.use });
  return { context, page: await context.newPage() };
}

test("an entrant enters the open event with a co-driver, who accepts from the e-mail", async ({
  browser,
}) => {
  const model = `MX-5 run ${Date.now().toString(36)}`;
  const entrant = await phone(browser);
  const page = entrant.page;
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.entrant, demo.password);
  await expect(page).toHaveURL(/\/garage$/);

  // A car of this run's own.
  const addCar = page.getByTestId("add-car-form");
  await addCar.getByLabel("Make").fill("Mazda");
  await addCar.getByLabel("Model", { exact: true }).fill(model);
  await addCar.getByLabel("Model year").fill("2001");
  await addCar.getByLabel("Colour").fill("Silver");
  await addCar.getByRole("button", { name: "Add car" }).click();
  await expect(page.getByText(model).first()).toBeVisible();

  // Find the event from the header.
  await page.getByRole("link", { name: "Events", exact: true }).click();
  await expect(page).toHaveURL(/\/events$/);
  const card = page.getByTestId("event-card").filter({ hasText: OPEN_EVENT });
  await expect(card.getByTestId("event-status")).toHaveText("Entries open");
  await expect(card.getByTestId("places-left")).toHaveText(/^\d+ of 30$/);
  await card.getByRole("link", { name: OPEN_EVENT }).click();
  await expect(page.getByRole("heading", { name: OPEN_EVENT })).toBeVisible();
  await expect(page.getByTestId("waiver-text")).toBeVisible();
  await expect(page.getByTestId("rule-set-description")).toBeVisible();
  await expect(page.getByRole("link", { name: "Pre-check a wing design" })).toHaveAttribute(
    "href",
    /\/pre-check\?event=cinder-vale-winter-/,
  );
  await page.getByRole("link", { name: "Enter this event" }).click();

  // The form: the browser's own check first (zod via react-hook-form), then the entry.
  const form = page.getByTestId("entry-form");
  await form
    .getByLabel("Car", { exact: true })
    .selectOption({ label: `2001 Mazda ${model} (Silver)` });
  await form.getByRole("button", { name: "Enter" }).click();
  await expect(form.getByText("Choose a class.")).toBeVisible();
  await form.getByRole("radio", { name: /Kestrel/ }).check();
  await form.getByLabel(/lap-time estimate/).fill("1:58.5");
  await form.getByLabel("Your experience").selectOption("intermediate");
  await form.getByLabel(/Co-driver/).fill(demo.codriver);
  const since = Date.now();
  await form.getByRole("button", { name: "Enter" }).click();

  await expect(page).toHaveURL(/\/entries\/[0-9a-f-]{36}\?entered=1$/);
  const entryUrl = new URL(page.url()).pathname;
  await expect(page.getByTestId("entry-received")).toBeVisible();
  await expect(page.getByTestId("entry-status")).toHaveText("In the field.");
  await expect(page.getByTestId("step-co-driver")).toHaveAttribute("data-state", "waiting");
  await expect(page.getByTestId("step-co-driver")).toContainText(`Invited ${demo.codriver}`);
  for (const step of ["declare", "waiver", "pay", "pass"]) {
    await expect(page.getByTestId(`step-${step}`)).toHaveAttribute("data-state", "to-do");
  }
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    page.viewportSize()?.width ?? 0,
  );

  // The co-driver, on their own phone, from the e-mail.
  const link = await invitationLink(demo.codriver, since);
  const co = await phone(browser);
  await co.page.goto(link);
  await expect(co.page.getByRole("heading", { name: "Sign in", exact: true })).toBeVisible();
  await new SignInPage(co.page).withPassword(demo.codriver, demo.password);
  await expect(co.page).toHaveURL(/\/invites\//);
  await expect(co.page.getByTestId("invite-addressee")).toHaveText(demo.codriver);
  const accept = co.page.getByTestId("accept-invite-form");
  await accept.getByLabel(/lap-time estimate/).fill("2:01");
  await accept.getByLabel("Your experience").selectOption("novice");
  await accept.getByRole("button", { name: "Accept and co-drive" }).click();
  await expect(co.page).toHaveURL(new RegExp(`${entryUrl}$`));
  await expect(co.page.getByTestId("entry-drivers")).toContainText("Co-driver:");
  await expect(co.page.getByTestId("entry-drivers")).toContainText("estimate 2:01");
  // It is in their garage too.
  await co.page.goto("/garage");
  await expect(co.page.locator(`a[href="${entryUrl}"]`)).toHaveCount(1);

  // The entrant sees the co-driver step done.
  await page.reload();
  await expect(page.getByTestId("step-co-driver")).toHaveAttribute("data-state", "done");
  await co.context.close();
  await entrant.context.close();

  // Leave the demo entrant's garage as the other specs expect it: this run's entry and car go
  // (removeScratchEntries first lets the worker send the entry's e-mails).
  const entryId = entryUrl.split("/")[2] ?? "";
  const [car] = await queryTestDb<{ car_id: string }>(
    e2eDatabaseUrl(),
    "select car_id from entries where id = ?",
    [entryId],
  );
  await removeScratchEntries(e2eDatabaseUrl(), [entryId]);
  await queryTestDb(e2eDatabaseUrl(), "delete from cars where id = ?", [car?.car_id ?? ""]);
});
