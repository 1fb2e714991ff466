import { type Browser, expect, type Page, test } from "@playwright/test";
import { PNG } from "pngjs";
import { demo } from "../tests/support/demo-accounts";
import { queryTestDb } from "../tests/support/query-test-db";
import { SignInPage } from "./pages/sign-in-page";
import { e2eDatabaseUrl } from "./support/e2e-database-url";
import { latestLinkFor, mailTo } from "./support/mailbox";

// The whole of an entrant's weeks before the day, on phones (the "phone" project: Pixel 7): a new
// person signs up, fills the profile, adds a car with photos, enters the open event with a
// co-driver (who accepts and signs their own waiver), declares, signs the waiver, pays through
// the payments fake's hosted checkout, gets the receipt and the pass-ready e-mail in the local
// SMTP store, opens the pass — and the scrutineer's phone opens the car from that pass. Every run
// uses a new person and a new car, so the spec repeats on one database.

const OPEN_EVENT = "Cinder Vale Winter Sprint";

/** A real picture drawn in code (pngjs), so the server's image check and reduction run. */
function picture(width: number, height: number, tint: number): Buffer {
  const png = new PNG({ width, height });
  for (let i = 0; i < width * height; i += 1) {
    png.data[i * 4] = (i % width) % 256;
    png.data[i * 4 + 1] = tint;
    png.data[i * 4 + 2] = Math.floor(i / width) % 256;
    png.data[i * 4 + 3] = 255;
  }
  return PNG.sync.write(png);
}

async function phone(browser: Browser) {
  const context = await browser.newContext({ ...test.info().project.use });
  return { context, page: await context.newPage() };
}

async function fitsTheScreen(page: Page) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    page.viewportSize()?.width ?? 0,
  );
}

test("a new entrant signs up, enters with a co-driver, declares, signs, pays and gets a pass the tech line opens", async ({
  browser,
}) => {
  test.setTimeout(180_000);
  const run = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
  const email = `journey-${run}@entrants.test`;
  const fullName = "Noor Halloran";
  const model = `Civic Type R ${run}`;
  const entrant = await phone(browser);
  const page = entrant.page;

  // ── Sign up and confirm from the account e-mail ──
  await page.goto("/");
  await page.getByRole("main").getByRole("link", { name: "Create an account" }).click();
  const signUp = page.locator("form", {
    has: page.getByRole("heading", { name: "With a password" }),
  });
  await signUp.getByLabel("Full name").fill(fullName);
  await signUp.getByLabel("E-mail").fill(email);
  await signUp.getByLabel("Password").fill("cones-and-coffee-at-dawn");
  const signedUpAt = Date.now();
  await signUp.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await page.goto(await latestLinkFor(email, signedUpAt));
  await expect(page).toHaveURL(/\/profile$/);

  // ── Profile ──
  const profile = page.getByRole("form", { name: "Profile" });
  await profile.getByLabel("Date of birth").fill("1990-03-02");
  await profile.getByLabel("Phone", { exact: true }).fill("+44 7700 900321");
  await profile.getByLabel("Emergency contact's name").fill("Sam Halloran");
  await profile.getByLabel("Emergency contact's phone").fill("+44 7700 900654");
  await profile.getByLabel(/^Intermediate/).check();
  await profile.getByRole("button", { name: "Save profile" }).click();
  await expect(profile.getByRole("status")).toHaveText("Profile saved.");

  // ── A car with its body width in inches and three photos ──
  await page.goto("/garage");
  const addCar = page.getByTestId("add-car-form");
  await addCar.getByLabel("Make").fill("Honda");
  await addCar.getByLabel("Model", { exact: true }).fill(model);
  await addCar.getByLabel("Model year").fill("2008");
  await addCar.getByLabel("Colour").fill("Championship White");
  await addCar.getByLabel("Body width (optional)").fill("69.9 in");
  await addCar.getByRole("button", { name: "Add car" }).click();
  const car = page.getByTestId("car-item").filter({ hasText: model });
  // Source: the international inch, 25.4 mm exactly (NIST SP 811 App. B.8): 69.9 in = 1775.46 mm.
  await expect(car.getByTestId("car-body-width")).toHaveText("1775.5 mm (69.9 in)");
  for (const [i, kind] of ["front", "side", "rear"].entries()) {
    await car.getByTestId(`car-file-input-${kind}`).setInputFiles({
      name: `${kind}.png`,
      mimeType: "image/png",
      buffer: picture(480, 320, i * 90),
    });
    await expect(
      car.locator(`[data-testid="car-file-slot"][data-kind="${kind}"] img`),
    ).toBeVisible();
  }
  await fitsTheScreen(page);

  // ── Enter the open event with a co-driver ──
  await page.getByRole("link", { name: "Events", exact: true }).click();
  const card = page.getByTestId("event-card").filter({ hasText: OPEN_EVENT });
  await card.getByRole("link", { name: OPEN_EVENT }).click();
  await page.getByRole("link", { name: "Enter this event" }).click();
  const form = page.getByTestId("entry-form");
  await form
    .getByLabel("Car", { exact: true })
    .selectOption({ label: `2008 Honda ${model} (Championship White)` });
  await expect(page.getByTestId("no-wing-plan")).toBeVisible();
  await form.getByRole("radio", { name: /Kestrel/ }).check();
  await form.getByLabel(/lap-time estimate/).fill("2:04.3");
  await form.getByLabel("Your experience").selectOption("intermediate");
  await form.getByLabel(/Co-driver/).fill(demo.codriver);
  const enteredAt = Date.now();
  await form.getByRole("button", { name: "Enter" }).click();
  await expect(page).toHaveURL(/\/entries\/[0-9a-f-]{36}\?entered=1$/);
  const entryPath = new URL(page.url()).pathname;
  const entryId = entryPath.split("/")[2] ?? "";
  await expect(page.getByTestId("entry-status")).toHaveText("In the field.");
  await mailTo(email, enteredAt, /./); // the entry-received e-mail

  // The co-driver accepts from the invitation e-mail on their own phone and signs their waiver.
  const invite = await mailTo(demo.codriver, enteredAt, /co-drive/);
  const inviteLink = invite.text.match(/https?:\/\/\S+\/invites\/\S+/)?.[0] ?? "";
  const co = await phone(browser);
  await co.page.goto(inviteLink);
  await new SignInPage(co.page).withPassword(demo.codriver, demo.password);
  await expect(co.page).toHaveURL(/\/invites\//);
  const accept = co.page.getByTestId("accept-invite-form");
  await accept.getByLabel(/lap-time estimate/).fill("2:07");
  await accept.getByLabel("Your experience").selectOption("novice");
  await accept.getByRole("button", { name: "Accept and co-drive" }).click();
  await expect(co.page).toHaveURL(new RegExp(`${entryPath}$`));
  const [coDriver] = await queryTestDb<{ name: string }>(
    e2eDatabaseUrl(),
    "select name from users where email = ?",
    [demo.codriver],
  );
  await co.page.goto(`${entryPath}/waiver`);
  await co.page
    .getByLabel("Type your full name to accept the waiver")
    .fill(coDriver?.name.toUpperCase() ?? "");
  await co.page.getByRole("button", { name: "I accept the waiver" }).click();
  // The page lists each driver's acceptance: the co-driver's now, with its time and version.
  const coRows = co.page.getByTestId("waiver-driver");
  await expect(coRows.filter({ hasText: "(co-driver)" })).toHaveAttribute("data-state", "complete");
  await expect(coRows.filter({ hasText: "(co-driver)" })).toContainText("version brackenmoor-");
  await expect(coRows.filter({ hasText: "(driver)" })).not.toHaveAttribute(
    "data-state",
    "complete",
  );
  await co.context.close();

  // ── Declare what the class asks ──
  await page.goto(`${entryPath}/declare`);
  const declare = page.getByTestId("declarations-form");
  await declare.getByLabel("Tyres fitted").selectOption("graded");
  await declare.getByLabel("Treadwear grade (on the sidewall)").fill("200");
  await declare.getByLabel("Rear wing").check();
  await declare.getByRole("button", { name: "Save declarations" }).click();
  await expect(page.getByTestId("declarations-saved")).toBeVisible();

  // ── Sign the waiver with the typed full name (spacing and case forgiven) ──
  await page.goto(`${entryPath}/waiver`);
  await expect(page.getByTestId("waiver-text")).toBeVisible();
  await page.getByLabel("Type your full name to accept the waiver").fill("Noor Hallorann");
  await page.getByRole("button", { name: "I accept the waiver" }).click();
  // A name that is not the profile's is refused at the field, naming the profile's.
  await expect(page.locator("#waiver-name-error")).toContainText("Noor Halloran");
  await expect(page.getByTestId("waiver-done")).toHaveCount(0);
  await page.getByLabel("Type your full name to accept the waiver").fill("  noor   halloran ");
  await page.getByRole("button", { name: "I accept the waiver" }).click();
  const rows = page.getByTestId("waiver-driver");
  await expect(rows.filter({ hasText: "(driver)" })).toHaveAttribute("data-state", "complete");
  await expect(rows.and(page.locator('[data-state="complete"]'))).toHaveCount(2);

  // No pass before the fee is paid.
  await page.goto(`${entryPath}/pass`);
  await expect(page.getByTestId("pass-qr")).toHaveCount(0);

  // ── Pay through the hosted checkout of the payments fake ──
  await page.goto(`${entryPath}/pay`);
  await expect(page.getByTestId("entry-fee")).toContainText("£85.00");
  const paidFrom = Date.now();
  await page.getByRole("button", { name: "Pay £85.00" }).click();
  await expect(page.getByRole("heading", { name: "Pay £85.00" })).toBeVisible();
  expect(new URL(page.url()).port).toBe(new URL(process.env.PAYMENTS_URL ?? "").port);
  await page.getByRole("button", { name: "Pay £85.00" }).click();
  await expect(page).toHaveURL(new RegExp(`${entryPath}/pay\\?checkout=done$`));
  await expect(page.getByTestId("payment-state")).toContainText("Paid: £85.00");
  const receipt = await mailTo(email, paidFrom, /^Receipt: entry fee £85\.00 paid/);
  expect(receipt.text).toContain(OPEN_EVENT);
  await mailTo(email, paidFrom, /^Your pass for .* is ready/);

  // ── The pass ──
  await page.goto(entryPath);
  for (const step of ["declare", "waiver", "pay", "co-driver"]) {
    await expect(page.getByTestId(`step-${step}`)).toHaveAttribute("data-state", "done");
  }
  await page.goto(`${entryPath}/pass`);
  await expect(page.getByTestId("pass-qr")).toBeVisible();
  await fitsTheScreen(page);
  const passUrl = (await page.getByTestId("pass-qr").getAttribute("data-pass-url")) ?? "";
  expect(passUrl).toContain("/p/");
  await entrant.context.close();

  // ── The scrutineer's phone opens the car from the pass (signature checked on the phone) ──
  const [event] = await queryTestDb<{ id: string; car_number: number }>(
    e2eDatabaseUrl(),
    "select e.event_id as id, e.car_number from entries e where e.id = ?",
    [entryId],
  );
  const tech = await phone(browser);
  await new SignInPage(tech.page).open();
  await new SignInPage(tech.page).withPassword(demo.scrutineer, demo.password);
  await tech.page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  await tech.page.goto(`/tech/${event?.id}`);
  await expect(tech.page.getByRole("heading", { name: "Scrutineering" })).toBeVisible();
  await tech.page.getByTestId("find-car-input").fill(passUrl);
  await tech.page.getByRole("button", { name: "Open", exact: true }).click();
  await expect(tech.page.getByTestId("car-card-number")).toHaveText(String(event?.car_number));
  await expect(tech.page.getByTestId("pass-refusal")).toHaveCount(0);
  await tech.context.close();
});
