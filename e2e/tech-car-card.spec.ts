import { expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { CarCardPage } from "./pages/car-card-page";
import { SignInPage } from "./pages/sign-in-page";

// The car card as a scrutineer uses it on a phone (Pixel 7 size). Car 37 is an invented demo
// car that waits at the tech line; no trade value is checked here.
const CAR = 37;

test.beforeEach(async ({ page }) => {
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
});

test("the checklist offers only the answers the rule set takes and remembers them", async ({
  page,
}) => {
  const card = new CarCardPage(page);
  await expect(card.outboxSummary()).toHaveText("Outbox empty — everything is sent");
  await card.open(CAR);
  await expect(page.getByTestId("preview-verdict")).toContainText("Preview on this device");

  // "(if fitted)" items offer Not fitted, and it is an answer the engine takes.
  await expect(card.item("head-restraint")).toContainText("Head restraint (if fitted)");
  await expect(card.answer("battery", "Pass")).toBeVisible();
  await expect(card.item("battery").getByRole("button", { name: "Not fitted" })).toHaveCount(0);
  for (const id of ["head-restraint", "suit"]) {
    await card.answer(id, "Not fitted").click();
    await expect(card.answer(id, "Not fitted")).toHaveAttribute("aria-pressed", "true");
    await expect(card.item(id).getByTestId("checklist-state")).toContainText("Not fitted");
    // The engine takes it: the item is settled, not waiting for a pass or a fail.
    await expect(card.item(id)).toHaveAttribute("data-outcome", "not-applicable");
  }
  await card.answer("battery", "Fail").click();
  await expect(card.answer("battery", "Fail")).toHaveAttribute("aria-pressed", "true");
  await expect(card.answer("battery", "Pass")).toHaveAttribute("aria-pressed", "false");

  // A seat label read and passed, then the page reloaded: the fields still say what was read.
  await card
    .item("seat")
    .getByLabel("Standard on the label")
    .selectOption({ label: "FIA 8862-2009" });
  await card.item("seat").getByLabel("Year on the label").fill("2022");
  await card.answer("seat", "Pass").click();
  await expect(card.answer("seat", "Pass")).toHaveAttribute("aria-pressed", "true");
  await expect(card.outboxSummary()).toContainText("4 of 4 sent", { timeout: 20_000 });
  await page.reload();
  await expect(card.item("seat").getByLabel("Year on the label")).toHaveValue("2022");
  await expect(card.item("seat").getByLabel("Standard on the label")).toHaveValue("fia-8862-2009");
  await expect(card.answer("seat", "Pass")).toHaveAttribute("aria-pressed", "true");
  await expect(card.answer("suit", "Not fitted")).toHaveAttribute("aria-pressed", "true");

  // Equipment expiring inside the warning window is shown in the attention state.
  const eventDate = await page.evaluate(async (eventId) => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const open = indexedDB.open("plumbline-packs");
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    return new Promise<string>((resolve) => {
      const get = db.transaction("packs").objectStore("packs").get(eventId);
      get.onsuccess = () =>
        resolve((get.result as { event: { eventDate: string } }).event.eventDate);
    });
  }, new URL(page.url()).pathname.split("/")[2] ?? "");
  // A service check 2 years less 10 days before the event (the demo's 2-year extinguisher rule).
  const checked = new Date(`${eventDate}T00:00:00Z`);
  checked.setUTCFullYear(checked.getUTCFullYear() - 2);
  checked.setUTCDate(checked.getUTCDate() + 10);
  await card
    .item("extinguisher")
    .getByLabel("Date on the label")
    .fill(checked.toISOString().slice(0, 10));
  await card.answer("extinguisher", "Pass").click();
  await expect(card.item("extinguisher")).toHaveAttribute("data-state", "attention");
  await expect(card.item("extinguisher").getByTestId("checklist-state")).toContainText(
    "Passed · expires soon",
  );
  await page.getByTestId("preview-verdict").getByText("Every rule and item").click();
  await expect(page.getByTestId("verdict-safety-extinguisher")).toHaveAttribute(
    "data-tone",
    "attention",
  );
});

test("readings: a slip is caught before saving, and your own reading can be voided", async ({
  page,
}) => {
  const card = new CarCardPage(page);
  await card.open(CAR);

  const wingTop = await card.typeReading("wingTopFromGroundMm", "1380");
  await expect(wingTop.getByRole("status")).toContainText("Saved on this phone");
  await expect(wingTop.getByTestId("reading-value")).toHaveAttribute("placeholder", "e.g. 1450 mm");

  // A number no car can carry (five digits typed for four): asked to check it, not saved.
  await card.typeReading("wingTopFromGroundMm", "99999");
  const implausible = wingTop.getByTestId("reading-implausible");
  await expect(implausible).toContainText("Check this reading");
  await expect(implausible).toContainText("Wing top 99,999 mm above the ground");
  await implausible.getByRole("button", { name: "Fix it" }).click();
  await expect(implausible).toHaveCount(0);
  await expect(wingTop.getByTestId("reading-value")).toBeFocused();

  // 1280 mm after 1380 mm: plausible, but it disagrees with your own reading; warned, not saved
  // until the scrutineer says so.
  await wingTop.getByTestId("reading-value").fill("1280.4567");
  await wingTop.getByRole("button", { name: "Save reading" }).click();
  const warning = wingTop.getByTestId("reading-mismatch");
  await expect(warning).toContainText(
    "1280.5 mm does not agree with your earlier reading, 1380 mm",
  );
  await warning.getByRole("button", { name: "Save anyway" }).click();
  await expect(wingTop.getByRole("status")).toContainText("1280.5 mm");
  // Let the sync land first: the server's verdict then fills in above and moves the card down.
  await expect(card.outboxSummary()).toContainText("2 of 2 sent", { timeout: 20_000 });
  await expect(page.getByTestId("server-verdict")).not.toHaveAttribute("data-status", "none");

  // The typo is taken back with a reason; it stays listed, struck through.
  const typo = wingTop
    .locator("xpath=..")
    .getByTestId("reading-list")
    .locator("li", { hasText: "1280.5 mm" });
  await typo.getByRole("button", { name: /^Void your reading of 1280\.5/ }).click();
  await typo.getByTestId("void-own-reason").fill("typed the wrong number");
  await typo.getByRole("button", { name: "Void it" }).click();
  await expect(typo).toContainText("Void: typed the wrong number");
  await expect(card.outboxSummary()).toContainText("3 of 3 sent", { timeout: 20_000 });

  // Each length has its own example; the hint leads with the event's unit.
  const plate = await card.reading("endPlateThicknessMm");
  await expect(plate.getByTestId("reading-value")).toHaveAttribute("placeholder", "e.g. 6 mm");
  await plate.getByTestId("reading-value").fill("six");
  await plate.getByRole("button", { name: "Save reading" }).click();
  await expect(plate.getByRole("alert")).toContainText("write it like 1638.3 mm,");

  // The noise test has its own caution: the engine runs for it.
  const noise = await card.reading("noiseDbA");
  await expect(
    noise.getByRole("complementary", { name: "Noise test: engine running" }),
  ).toContainText("hearing protection");

  // The outbox names what it holds as people do.
  await page.getByRole("button", { name: "Show list" }).click();
  const list = page.getByTestId("outbox-list");
  await expect(list).toContainText(`Car ${CAR} · Wing top height from the ground 1380 mm`);
  await expect(list).toContainText(
    `Car ${CAR} · Void of “Wing top height from the ground 1280.5 mm”`,
  );
  await expect(list).not.toContainText("wingTopFromGroundMm");
});

test("photos, comments and notes: only pictures, only what the server takes, who and when", async ({
  page,
}) => {
  const card = new CarCardPage(page);
  await card.open(CAR);

  await page.getByTestId("photo-input").setInputFiles({
    name: "wing.png",
    mimeType: "image/png",
    buffer: Buffer.from("not a picture"),
  });
  await expect(page.getByTestId("photo-error")).toContainText(
    '"wing.png" cannot be opened as a picture',
  );
  await expect(page.getByTestId("photo-list")).toHaveCount(0);

  const comment = card.item("harness").getByPlaceholder("Comment (optional)");
  await comment.fill("x".repeat(2100));
  await expect(comment).toHaveValue("x".repeat(2000));
  await expect(card.item("harness").getByTestId("character-count")).toHaveText(
    "2000 of 2000 characters",
  );

  await page.getByLabel("Note", { exact: true }).fill("Wing mount bolts checked with the entrant.");
  await page.getByRole("button", { name: "Save note" }).click();
  await expect(page.getByTestId("note-byline").first()).toHaveText(/^by you · \d\d:\d\d$/);
});

test("Send now sends a record that was waiting out its retry time", async ({ page }) => {
  const card = new CarCardPage(page);
  await card.open(CAR);
  // No signal for the sync endpoint: the note waits in the outbox.
  await page.route("**/api/events/*/sync", (route) => route.abort("internetdisconnected"));
  await page.getByLabel("Note", { exact: true }).fill("Recorded in the concrete pit.");
  await page.getByRole("button", { name: "Save note" }).click();
  await page.getByRole("button", { name: "Show list" }).click();
  await expect(page.getByTestId("outbox-list")).toContainText("No signal; will try again.");
  // Make the wait long, as after many failed tries: ten minutes from now.
  await page.evaluate(async () => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const open = indexedDB.open("plumbline-records");
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    const store = db.transaction("records", "readwrite").objectStore("records");
    await new Promise<void>((resolve) => {
      const cursor = store.openCursor();
      cursor.onsuccess = () => {
        const at = cursor.result;
        if (!at) return resolve();
        const item = at.value as { state: string; attempts: number; nextAttemptAt: number };
        if (item.state === "queued")
          at.update({ ...item, attempts: 6, nextAttemptAt: Date.now() + 600_000 });
        at.continue();
      };
    });
  });
  await page.unroute("**/api/events/*/sync");
  await page.getByRole("button", { name: "Send now" }).click();
  // Well inside the ten minutes and the outbox's 15 s timer: it went because of the tap.
  await expect(card.outboxSummary()).not.toContainText("waiting", { timeout: 8_000 });
  await expect(
    page.getByTestId("outbox-list").locator('li[data-state="sent"]').last(),
  ).toContainText("Recorded in the concrete pit.");
});
