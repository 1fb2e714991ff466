import { devices, expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { removeScratchEntries } from "../tests/support/scratch-entries";
import { demoEvent, makeEntry, makePerson, removePeople } from "../tests/waiver/waiver-fixtures";
import { SignInPage } from "./pages/sign-in-page";
import { latestLinkFor } from "./support/mailbox";

// A minor's waiver on a phone: the driver (16 on the event date — under 18 needs a parent or
// guardian, common practice (no source)) signs and names a guardian; the entry is not signed on
// and has no pass until the guardian accepts from the e-mailed link, with no account; the link
// then works no more. Each run makes its own person and entry (repeatable with --repeat-each).

const databaseUrl = () => {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (run through scripts/e2e.sh)");
  return url;
};

let entryId = "";
let personId = "";
test.afterEach(async () => {
  if (entryId) await removeScratchEntries(databaseUrl(), [entryId]);
  if (personId) await removePeople(databaseUrl(), [personId]);
  entryId = "";
  personId = "";
});

test("a minor's waiver waits for the guardian, who accepts from the e-mail link once", async ({
  page,
  browser,
}) => {
  const event = await demoEvent(databaseUrl());
  const sixteen = `${Number(event.event_date.slice(0, 4)) - 16}${event.event_date.slice(4)}`;
  const minor = await makePerson(databaseUrl(), { name: "Ellis Wrenfield", dateOfBirth: sixteen });
  personId = minor.id;
  entryId = await makeEntry(databaseUrl(), event.id, { driverId: minor.id, paid: true });
  const guardianEmail = `guardian-${minor.id.slice(0, 8)}@waiver.test`;

  await new SignInPage(page).open(`/entries/${entryId}/waiver`);
  await new SignInPage(page).withPassword(minor.email, demo.password);
  await expect(page).toHaveURL(new RegExp(`/entries/${entryId}/waiver$`));
  await expect(page.getByTestId("waiver-text")).toContainText("waiver");
  await expect(page.getByRole("complementary", { name: "Before you accept" })).toContainText(
    "rulebook",
  );
  const since = Date.now();
  await page.getByLabel("Type your full name to accept the waiver").fill("ellis  wrenfield");
  await page.getByLabel("Parent's or guardian's full name").fill("Robin Wrenfield");
  await page.getByLabel("Their e-mail address").fill(guardianEmail);
  await page.getByRole("button", { name: "Sign and ask my parent or guardian" }).click();
  await expect(page.getByTestId("waiver-done")).toContainText(guardianEmail);
  // Nothing wider than the phone's screen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    page.viewportSize()?.width ?? 0,
  );

  await page.goto(`/entries/${entryId}/pass`);
  await expect(
    page.getByText("The waiver needs a parent or guardian to sign it too."),
  ).toBeVisible();
  await expect(page.getByTestId("pass-qr")).toHaveCount(0);

  // The guardian, on their own phone with no account, from the e-mail.
  const link = await latestLinkFor(guardianEmail, since);
  expect(link).toMatch(/\/guardian\/[A-Za-z0-9_-]{43}$/);
  const guardianContext = await browser.newContext({
    ...devices["Pixel 7"],
    baseURL: test.info().project.use.baseURL,
  });
  const guardian = await guardianContext.newPage();
  await guardian.goto(link);
  await expect(guardian.getByRole("heading", { level: 1 })).toContainText("Ellis Wrenfield");
  await expect(guardian.getByTestId("waiver-text")).toBeVisible();
  await guardian.getByLabel(/Type your full name to accept the waiver/).fill("Robin Wrenfield");
  await guardian.getByRole("button", { name: "I accept, as parent or guardian" }).click();
  await expect(guardian.getByTestId("guardian-done")).toContainText("is complete");

  // The entry is now signed on (paid + every waiver complete): the pass is issued.
  await page.reload();
  await expect(page.getByTestId("pass-qr")).toBeVisible();

  // The link works once.
  await guardian.goto(link);
  await expect(guardian.getByRole("heading", { name: "Already accepted" })).toBeVisible();
  await guardianContext.close();
});
