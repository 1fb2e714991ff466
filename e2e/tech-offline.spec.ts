import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { devices, expect, test } from "@playwright/test";
import { PNG } from "pngjs";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { TechLinePage } from "./pages/tech-line-page";
import { chromiumArgs } from "./support/chromium-args";
import { watchCspViolations } from "./support/csp-violations";
import { forgePass } from "./support/forge-pass";
import { localRecordIds } from "./support/local-record-ids";
import { takeOffline } from "./support/network-switch";
import { makePassVideo } from "./support/pass-video";
import { serverRecordsOf } from "./support/server-records";

/** A small grey PNG standing in for a phone photo of the car. */
function photoPng(): Buffer {
  const png = new PNG({ width: 64, height: 48 });
  png.data.fill(128);
  return PNG.sync.write(png);
}

test("the tech line offline: prepare, scan, record, reload offline, sync, verdict posted", async ({
  browser,
  playwright,
  baseURL,
}, testInfo) => {
  testInfo.setTimeout(180_000);
  // The entrant opens the pass on their phone: that is what the scrutineer will scan.
  const entrant = await browser.newContext({ baseURL: baseURL ?? "" });
  const entrantPage = await entrant.newPage();
  await new SignInPage(entrantPage).open();
  await new SignInPage(entrantPage).withPassword(demo.entrant, demo.password);
  await expect(entrantPage).toHaveURL(/\/garage$/);
  // Car 7's pass by name: other specs may have entered the demo entrant in the open event too.
  await entrantPage.getByRole("link", { name: /^Pass for car 7,/ }).click();
  const passUrl = await entrantPage.getByTestId("pass-qr").getAttribute("data-pass-url");
  expect(passUrl).toContain("/p/");
  const entryId = new URL(entrantPage.url()).pathname.split("/")[2] ?? "";

  // The scrutineer's phone: a camera that sees the pass, and Debian's Chromium.
  const video = await makePassVideo(passUrl ?? "", "car-7-pass");
  const phone = await playwright.chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: [
      ...chromiumArgs,
      "--use-fake-ui-for-media-stream",
      "--use-fake-device-for-media-stream",
      `--use-file-for-fake-video-capture=${video}`,
    ],
  });
  const context = await phone.newContext({
    ...devices["Pixel 7"],
    baseURL: baseURL ?? "",
    permissions: ["camera"],
  });
  const cspViolations = await watchCspViolations(context);
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  const eventId = new URL(page.url()).pathname.split("/")[2] ?? "";
  const tech = new TechLinePage(page);

  // The first load is not controlled by the service worker; wait for it, then load again.
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  expect(await page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
  await tech.prepareForOffline();
  const before = await serverRecordsOf(entryId);

  // Into the concrete pit: no signal from here on, for the page and its service worker alike.
  const offline = await takeOffline(context, baseURL ?? "");
  await page.reload();
  await expect(page.getByRole("heading", { name: "Scrutineering" })).toBeVisible();
  await expect(page.getByTestId("pack-fetched-at")).toBeVisible();

  // A forged pass is refused, offline, and opens no car.
  const kid = await page.evaluate(async (id) => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const open = indexedDB.open("plumbline-packs");
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    return new Promise<string>((resolve) => {
      const get = db.transaction("packs").objectStore("packs").get(id);
      get.onsuccess = () =>
        resolve((get.result as { passKeys: { kid: string }[] }).passKeys[0]?.kid ?? "");
    });
  }, eventId);
  await page.getByTestId("find-car-input").fill(forgePass({ eventId, entryId, carNumber: 7, kid }));
  await page.getByRole("button", { name: "Open", exact: true }).click();
  await expect(page.getByTestId("pass-refusal")).toContainText(
    "altered or was not issued by Plumbline",
  );
  await expect(page.getByTestId("car-card")).toHaveCount(0);

  // Scan the real pass with the camera: straight to car 7's card, no network on the path.
  await page.getByRole("button", { name: "Scan a pass" }).click();
  await expect(page.getByTestId("car-card-number")).toHaveText("7", { timeout: 20_000 });
  // The camera scanner ran under the content security policy with nothing blocked.
  expect(await cspViolations(page)).toEqual([]);

  // Record readings, a checklist answer (the battery is not clamped: a safety failure) and a photo.
  await tech.recordReading("wingTopFromGroundMm", "1395");
  await tech.recordReading("roofPeakFromGroundMm", "1380");
  await tech.recordReading("wingOverhangMm", "0");
  await tech.recordReading("wingSpanMm", "1310");
  await tech.recordReading("bodyWidthMm", "1680");
  await tech.answerChecklist("battery", "Fail");
  await page
    .getByTestId("photo-input")
    .setInputFiles({ name: "battery.png", mimeType: "image/png", buffer: photoPng() });
  await expect(page.getByTestId("photo-list").locator("li")).toHaveCount(1);
  await expect(page.getByTestId("preview-verdict")).toHaveAttribute("data-status", "held");
  await expect(tech.outboxSummary()).toContainText("0 of 7 sent · 7 waiting");
  // The server has nothing new: read from its database, not from what the page says.
  expect(await serverRecordsOf(entryId)).toEqual(before);

  // Reload while still offline: the car card comes back, and everything is still queued.
  await page.reload();
  await expect(page.getByTestId("car-card-number")).toHaveText("7");
  await expect(tech.outboxSummary()).toContainText("0 of 7 sent · 7 waiting");
  await page.getByRole("button", { name: "Show list" }).click();
  await expect(page.getByTestId("outbox-list").locator("li")).toHaveCount(7);

  // Manual entry works offline too.
  await tech.back();
  await tech.openByNumber(7);

  // Still nothing on the server, whatever the service worker tried (the switch stopped it).
  const phoneIds = await localRecordIds(page, entryId);
  expect(phoneIds).toHaveLength(7);
  expect(await serverRecordsOf(entryId)).toEqual(before);
  testInfo.annotations.push({
    type: "blocked while offline",
    description: `${offline.blocked.filter((b) => b.fromServiceWorker).length} service-worker and ${offline.blocked.filter((b) => !b.fromServiceWorker).length} page requests`,
  });

  // Back in range: the outbox drains by itself and the server's verdict comes back. The reload
  // above tried once with no signal, so every record is waiting out a retry; the browser's word
  // that the signal is back makes them due at once. Well inside the outbox's 15 s timer: when the
  // `online` event only drained what was due, this took 14–15 s (the timer sent them).
  await offline.backOnline();
  await expect(tech.outboxSummary()).toContainText("7 of 7 sent", { timeout: 10_000 });
  // Every record the phone made is on the server exactly once, nothing else, and one photo.
  await expect
    .poll(async () => (await serverRecordsOf(entryId)).ids)
    .toEqual([...before.ids, ...phoneIds].sort());
  expect((await serverRecordsOf(entryId)).uploads).toBe(before.uploads + 1);
  await expect(page.getByTestId("server-verdict")).toHaveAttribute("data-status", "held");
  await expect(page.getByTestId("server-verdict-reason")).toContainText(/battery/i);

  // The entrant sees the same verdict and its reason on their entry page.
  await entrantPage.goto(`/entries/${entryId}`);
  await expect(entrantPage.getByTestId("entry-result")).toHaveAttribute("data-status", "held");
  await expect(entrantPage.getByTestId("entry-result-reason")).toContainText(/battery/i);

  // And the public tech board lists car 7 as held.
  await entrantPage.goto(`/board/${eventId}`);
  await expect(
    entrantPage.getByTestId("board-held").locator('[data-car-number="7"]'),
  ).toBeVisible();
  await phone.close();
  await entrant.close();
});

test("control: with service workers blocked, the tech line does not open offline", async ({
  browser,
  baseURL,
}) => {
  // Shows the offline journey above really rests on the service worker and the saved pages.
  const context = await browser.newContext({
    ...devices["Pixel 7"],
    baseURL: baseURL ?? "",
    serviceWorkers: "block",
  });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  await context.setOffline(true);
  const reloaded = await page.reload().catch((error: Error) => error);
  expect(reloaded).toBeInstanceOf(Error);
  await context.close();
});

test("the prepared tech line opens with no signal after the browser is closed and opened again", async ({
  playwright,
  baseURL,
}, testInfo) => {
  testInfo.setTimeout(120_000);
  const profile = mkdtempSync(path.join(tmpdir(), "plumbline-phone-"));
  const open = () =>
    playwright.chromium.launchPersistentContext(profile, {
      ...devices["Pixel 7"],
      baseURL: baseURL ?? "",
      executablePath: "/usr/bin/chromium",
      args: chromiumArgs,
    });
  let context = await open();
  let page = context.pages()[0] ?? (await context.newPage());
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer2, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  const techUrl = page.url();
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await new TechLinePage(page).prepareForOffline();
  await context.close();

  // Reopened in the pit: no signal from the first request.
  context = await open();
  await takeOffline(context, baseURL ?? "");
  page = context.pages()[0] ?? (await context.newPage());
  await page.goto(techUrl);
  await expect(page.getByRole("heading", { name: "Scrutineering" })).toBeVisible();
  await expect(page.getByTestId("pack-fetched-at")).toBeVisible();
  await new TechLinePage(page).openByNumber(7);
  await context.close();
  rmSync(profile, { recursive: true, force: true });
});
