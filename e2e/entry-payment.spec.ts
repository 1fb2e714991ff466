import { expect, type Page, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { makePaymentsEntry } from "../tests/support/payments-fixtures";
import { queryTestDb } from "../tests/support/query-test-db";
import { SignInPage } from "./pages/sign-in-page";
import { e2eDatabaseUrl } from "./support/e2e-database-url";

// The entry fee on a phone (the project's Pixel 7 viewport): the demo entrant pays through the
// local payments service's hosted checkout and gets the receipt by e-mail; a declined card leaves
// the entry unpaid and the page says so. Each test makes its own entry in the demo's open event
// (the Winter Sprint, fee 8500 GBP = £85.00: GBP has two decimals, ISO 4217) and removes it.

let entryId: string;

test.beforeEach(async () => {
  const db = e2eDatabaseUrl();
  const [event] = await queryTestDb<{ id: string; next: number }>(
    db,
    `select ev.id, coalesce(max(en.car_number), 99) + 1 as next
       from events ev left join entries en on en.event_id = ev.id
      where ev.status = 'entries-open' group by ev.id order by ev.created_at limit 1`,
  );
  if (!event) throw new Error("no open event in the demo");
  entryId = await makePaymentsEntry(db, { eventId: event.id, carNumber: Number(event.next) });
});

test.afterEach(async () => {
  const db = e2eDatabaseUrl();
  // The worker may still be sending the receipt: let its job finish before the rows go.
  for (let i = 0; i < 100; i += 1) {
    const [open] = await queryTestDb<{ n: number }>(
      db,
      "select count(*) as n from jobs where status in ('queued', 'running')",
    );
    if (Number(open?.n ?? 0) === 0) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  await queryTestDb(db, "delete from payments where entry_id = ?", [entryId]);
  await queryTestDb(db, "delete from entries where id = ?", [entryId]);
});

async function signInAndOpenPay(page: Page) {
  await new SignInPage(page).open(`/entries/${entryId}/pay`);
  await new SignInPage(page).withPassword(demo.entrant, demo.password);
  await expect(page).toHaveURL(new RegExp(`/entries/${entryId}/pay$`));
  await expect(page.getByTestId("payment-state")).toContainText("Not paid yet");
  await expect(page.getByTestId("entry-fee")).toContainText("£85.00");
  await expectFitsTheScreen(page);
}

async function expectFitsTheScreen(page: Page) {
  const overflow = await page.evaluate(
    () => document.documentElement.scrollWidth - window.innerWidth,
  );
  expect(overflow).toBeLessThanOrEqual(0);
}

async function receiptsFor(address: string, since: number) {
  const mailbox = process.env.MAILBOX_URL ?? "http://127.0.0.1:2780";
  const res = await fetch(`${mailbox}/messages?to=${encodeURIComponent(address)}`);
  const { messages } = (await res.json()) as {
    messages: { receivedAt: string; subject: string; text: string }[];
  };
  return messages.filter(
    (m) => Date.parse(m.receivedAt) >= since && m.subject.startsWith("Receipt: entry fee £85.00"),
  );
}

test("pays the entry fee through the hosted checkout and gets the receipt", async ({ page }) => {
  const since = Date.now();
  await signInAndOpenPay(page);
  await page.getByRole("button", { name: "Pay £85.00" }).click();
  // The payments service's own page, on its own origin.
  await expect(page.getByRole("heading", { name: "Pay £85.00" })).toBeVisible();
  expect(new URL(page.url()).port).toBe(new URL(process.env.PAYMENTS_URL ?? "").port);
  await page.getByRole("button", { name: "Pay £85.00" }).click();
  await expect(page).toHaveURL(new RegExp(`/entries/${entryId}/pay\\?checkout=done$`));
  await expect(page.getByTestId("payment-state")).toContainText("Paid: £85.00");
  await expectFitsTheScreen(page);
  const [row] = await queryTestDb<{ status: string; amount_minor: number; currency: string }>(
    e2eDatabaseUrl(),
    "select status, amount_minor, currency from payments where entry_id = ?",
    [entryId],
  );
  expect(row).toEqual({ status: "paid", amount_minor: 8500, currency: "GBP" });
  await expect.poll(async () => (await receiptsFor(demo.entrant, since)).length).toBe(1);
});

test("a declined card leaves the entry unpaid and the page says so", async ({ page }) => {
  await signInAndOpenPay(page);
  await page.getByRole("button", { name: "Pay £85.00" }).click();
  await expect(page.getByRole("heading", { name: "Pay £85.00" })).toBeVisible();
  await page.getByRole("button", { name: "Pay with a card that is declined" }).click();
  await expect(page).toHaveURL(new RegExp(`/entries/${entryId}/pay\\?checkout=back$`));
  await expect(page.getByTestId("payment-state")).toContainText("Card declined: not paid");
  await expect(page.getByTestId("payment-state")).toContainText("Nothing was taken");
  await expect(page.getByRole("button", { name: "Try again: pay £85.00" })).toBeVisible();
  await expectFitsTheScreen(page);
  const rows = await queryTestDb<{ status: string }>(
    e2eDatabaseUrl(),
    "select status from payments where entry_id = ?",
    [entryId],
  );
  expect(rows.map((r) => r.status)).toEqual(["failed"]);
});
