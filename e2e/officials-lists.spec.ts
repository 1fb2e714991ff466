import { readFileSync } from "node:fs";
import { type Browser, expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { classLadder, clearedMinorWithoutGuardian } from "./support/demo-facts";

const phone = { width: 412, height: 915 };

async function signedIn(browser: Browser, email: string, viewport = phone) {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1, isMobile: false });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(email, demo.password);
  await expect(page).not.toHaveURL(/sign-in/);
  return { context, page };
}

test("the clerk sees a cleared minor without a guardian's signature as not ready to run", async ({
  browser,
}) => {
  const car = await clearedMinorWithoutGuardian();
  const { context, page } = await signedIn(browser, demo.clerk);
  await expect(
    page.getByRole("heading", { level: 1, name: "Run groups and the run sheet" }),
  ).toBeVisible();
  // Who is signed in shows on a phone too, in short ("Gareth Lloyd" → "Gareth L.").
  await expect(page.getByTestId("signed-in-as")).toBeVisible();
  await expect(page.getByTestId("signed-in-as")).toHaveText(/^\S+ \S\.$/, { useInnerText: true });

  const apart = page.getByTestId("cleared-not-signed-on");
  await expect(apart.locator(`[data-car-number="${car}"]`)).toContainText(
    "Waiver needs a parent's or guardian's signature (minor)",
  );
  // Not in the ready-to-run list (folded on the clerk's page: open it), and a search that finds
  // nothing says so in words.
  await page.getByTestId("ready-list").locator("summary").click();
  await page.getByTestId("entry-search").fill(String(car));
  await expect(
    page.getByTestId("entry-row").and(page.locator(`[data-car-number="${car}"]`)),
  ).toHaveCount(0);
  await page.getByTestId("entry-search").fill("9999");
  await expect(page.getByTestId("entry-list-empty")).toHaveText("No car matches “9999”.");
  // Every row in the list is signed on, and says so.
  await page.getByTestId("entry-search").fill("");
  const rows = page.getByTestId("entry-row");
  expect(await rows.count()).toBeGreaterThan(0);
  await expect(rows.locator('[data-testid="sign-on"][data-signed-on="false"]')).toHaveCount(0);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    phone.width,
  );

  // The paddock board keeps tech state only and says that is not "ready to run".
  const eventId = new URL(page.url()).pathname.split("/")[2] ?? "";
  await page.goto(`/board/${eventId}`);
  await expect(page.getByText("Paddock board", { exact: true })).toBeVisible();
  await expect(page.getByText("Tech board", { exact: true })).toHaveCount(0);
  await expect(page.getByTestId("board-scope")).toContainText("not that it is ready to run");
  await context.close();
});

test("the organizer's page words the event status, counts classes low to high, and shows state tiles", async ({
  browser,
}) => {
  const ladder = await classLadder();
  const { context, page } = await signedIn(browser, demo.organizer);
  const facts = page.getByTestId("event-facts");
  await expect(facts).toContainText("Under way (event day)");
  await expect(facts).not.toContainText(/\brunning\b/);
  // DOMAIN.md "Classes": the ladder runs low → high, as the rule set lists it.
  const chips = page.getByTestId("entries-by-class").locator("li");
  expect(await chips.evaluateAll((li) => li.map((l) => l.getAttribute("data-class-name")))).toEqual(
    ladder,
  );
  // Each tile: the state's word on one line, with its icon (DESIGN.md: word + icon + colour).
  const tiles = page.getByTestId("status-tile");
  await expect(tiles).toHaveCount(5);
  for (const tile of await tiles.all()) {
    await expect(tile.locator("dt svg")).toHaveCount(1);
    const dt = await tile.locator("dt").boundingBox();
    expect(dt?.height ?? 999).toBeLessThan(40);
  }
  await expect(tiles.filter({ hasText: "Re-measure" })).toHaveCount(1);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    phone.width,
  );
  await context.close();
});

test("the registrar searches by car number or name, sorts, and downloads the table as CSV", async ({
  browser,
}) => {
  const { context, page } = await signedIn(browser, demo.registrar);
  await expect(page.getByRole("heading", { level: 1, name: "Sign-on desk" })).toBeVisible();
  const rows = page.getByTestId("registration-row");
  const total = await rows.count();
  expect(total).toBeGreaterThan(10);

  await page.getByTestId("registration-search").fill("1");
  const numbers = await rows.evaluateAll((r) => r.map((x) => x.getAttribute("data-car-number")));
  expect(numbers.length).toBeGreaterThan(0);
  for (const n of numbers) expect(n?.startsWith("1")).toBe(true);
  await page.getByTestId("registration-search").fill("whitfield");
  await expect(rows).toHaveCount(1);
  await page.getByTestId("registration-search").fill("nobody-by-this-name");
  await expect(page.getByTestId("registration-empty")).toHaveText(
    "No car matches “nobody-by-this-name”.",
  );

  await page.getByTestId("registration-search").fill("");
  await page.getByTestId("sort-car").click(); // already by car ascending: now descending
  const first = Number(await rows.first().getAttribute("data-car-number"));
  const last = Number(await rows.last().getAttribute("data-car-number"));
  expect(first).toBeGreaterThan(last);
  await expect(page.getByRole("columnheader", { name: /Car/ }).first()).toHaveAttribute(
    "aria-sort",
    "descending",
  );
  await page.getByTestId("sort-waiver").click();
  await expect(rows.first()).toContainText("Not signed");

  const download = page.waitForEvent("download");
  await page.getByTestId("registration-csv").click();
  const file = await (await download).path();
  const csv = readFileSync(file, "utf8");
  // Source: RFC 4180 §2 — CRLF between records, an optional header line first.
  const lines = csv.split("\r\n").filter(Boolean);
  expect(lines[0]).toBe("Car,Driver(s),Car make and model,Class,Waiver,Fee");
  expect(lines).toHaveLength(total + 1);
  // The same order as on screen: sorted by waiver, what still needs doing first.
  expect(lines[1]).toMatch(/,Not signed,|,Needs guardian,/);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    phone.width,
  );
  await context.close();
});
