import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { devices, expect, type Page, test } from "@playwright/test";
import { SYNC_BATCH_SIZE } from "../lib/offline/outbox-constants";
import { demo } from "../tests/support/demo-accounts";
import { makeScratchEntries, removeScratchEntries } from "../tests/support/scratch-entries";
import { SignInPage } from "./pages/sign-in-page";
import { TechLinePage } from "./pages/tech-line-page";
import { chromiumArgs } from "./support/chromium-args";
import { e2eDatabaseUrl } from "./support/e2e-database-url";
import { holdSyncRequest } from "./support/hold-sync-request";
import { takeOffline } from "./support/network-switch";
import { countStates, outboxContents } from "./support/outbox-contents";
import { phoneVerdictTimes } from "./support/phone-verdict-times";
import { queueReadings } from "./support/queue-readings";
import { serverRecordIds } from "./support/server-record-ids";
import { serverVerdictTimes } from "./support/server-verdict-times";
import { watchSyncAnswers } from "./support/watch-sync-answers";

// The browser part of the sync path's fault matrix (tests/faults has the server part): the real
// tech line in Chromium on a phone-sized screen, its own outbox runner and service worker, the
// real app and job worker. Each case breaks something in the middle of the outbox's work — the
// signal, the page, the browser, the sign-in — then counts the records on the phone (its outbox
// in IndexedDB, and what the outbox bar says) and in the database, and requires none lost and
// none stored twice. Requests are held with routes and released on a condition; nothing waits on
// a timer. Each case writes to cars of its own (copies of a demo entry, car numbers from 900 up),
// so the demo's cars other specs read stay as they were. Readings are test data for the
// transport, not trade values.

/** Cars made for the running case, removed after it with every row that names them. */
let scratch: string[] = [];

test.afterEach(async () => {
  await removeScratchEntries(e2eDatabaseUrl(), scratch);
  scratch = [];
});

/**
 * Sign a phone in as the demo scrutineer, give the case `carCount` cars of its own, open the tech
 * line under its service worker and prepare for offline (the pack then holds the new cars).
 */
async function preparedTechLine(page: Page, carCount: number) {
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}$/);
  const techUrl = page.url();
  const eventId = new URL(techUrl).pathname.split("/")[2] ?? "";
  const session = (await (await page.request.get("/api/auth/session")).json()) as {
    user: { id: string };
  };
  const cars = await makeScratchEntries(e2eDatabaseUrl(), eventId, carCount);
  scratch.push(...cars);
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await new TechLinePage(page).prepareForOffline();
  return { eventId, techUrl, officialId: session.user.id, cars };
}

const sorted = (ids: string[]) => [...ids].sort();

test("500 records queued offline go when the signal is back: none lost, none sent twice", async ({
  page,
  context,
  baseURL,
}, testInfo) => {
  // Breaking it shows: a batch dropped or never retried → fewer than 500 in the database and
  // the bar short of "500 of 500 sent"; a batch sent twice → an eleventh answered request and
  // "duplicate" states; a record copied under a new id → more than 500 rows for these cars; the
  // page not looking for the worker's verdicts after its drain → the cars' verdicts on the phone
  // stay older than their records (seen: the check fails when use-outbox-runner.ts skips
  // awaitFreshVerdicts).
  testInfo.setTimeout(180_000);
  const { eventId, officialId, cars } = await preparedTechLine(page, 10);
  const tech = new TechLinePage(page);
  const answers = watchSyncAnswers(context);
  const offline = await takeOffline(context, baseURL ?? "");

  // 500 readings put in the outbox the way the tech line keeps them. None is typed: a typed one
  // asks for Background Sync, and then whether the service worker or the page drains is the
  // browser's race (both were seen); this case is about the page's own runner.
  const made = await queueReadings(page, { eventId, officialId, entryIds: cars, count: 500 });
  await expect(tech.outboxSummary()).toHaveText("0 of 500 sent · 500 waiting");
  expect(sorted((await outboxContents(page, eventId)).map((item) => item.id))).toEqual(made);
  expect(await serverRecordIds(cars)).toEqual([]);

  await offline.backOnline();
  await expect(tech.outboxSummary()).toHaveText("500 of 500 sent", { timeout: 60_000 });

  // The phone: the same 500 records, every one sent, none answered "already had it".
  const phone = await outboxContents(page, eventId);
  expect(countStates(phone)).toEqual({ sent: 500 });
  expect(sorted(phone.map((item) => item.id))).toEqual(made);
  // The database: exactly those 500 for these cars, nothing more.
  expect(await serverRecordIds(cars)).toEqual(made);
  // On the wire: the page sent each record in exactly one answered request, in full batches.
  expect(answers.map((a) => a.status)).toEqual(Array(500 / SYNC_BATCH_SIZE).fill(200));
  expect(answers.filter((a) => a.fromServiceWorker)).toEqual([]);
  expect(sorted(answers.flatMap((a) => a.ids))).toEqual(made);

  // And the page looked for the worker's verdicts afterwards: each car's verdict in the phone's
  // pack was computed after that car's last record arrived.
  await expect
    .poll(
      async () => {
        const server = await serverVerdictTimes(cars);
        const onPhone = await phoneVerdictTimes(page, eventId);
        return cars.filter(
          (id) => !((onPhone[id] ?? 0) >= (server[id]?.lastReceivedAt ?? Number.POSITIVE_INFINITY)),
        ).length;
      },
      { timeout: 20_000 },
    )
    .toBe(0);
});

test("the page reloaded while a batch is on its way: every record stored once, all sent", async ({
  page,
  context,
  baseURL,
}) => {
  // Breaking it shows: records left "sending" by the reload not sent again → the bar stuck at
  // "100 of 150 sent · 50 waiting" and 50 missing from the database (seen: drain-outbox.ts
  // skipping "sending" records); a resent batch stored under new ids → more than 150 rows.
  const { eventId, officialId, cars } = await preparedTechLine(page, 3);
  const tech = new TechLinePage(page);
  const answers = watchSyncAnswers(context);
  // The second sync request is held before it reaches the server.
  const hold = await holdSyncRequest(context, { nth: 2, toServer: false });
  const offline = await takeOffline(context, baseURL ?? "");
  const made = await queueReadings(page, { eventId, officialId, entryIds: cars, count: 150 });
  await expect(tech.outboxSummary()).toHaveText("0 of 150 sent · 150 waiting");

  await offline.backOnline();
  const held = await hold.held;
  expect(held.ids).toEqual(made.slice(50, 100));
  // Mid-drain: the first batch answered, the second on its way.
  await expect(tech.outboxSummary()).toHaveText("50 of 150 sent · 100 waiting");
  expect(await serverRecordIds(cars)).toEqual(made.slice(0, 50));

  await page.reload();
  hold.release();
  await expect(tech.outboxSummary()).toHaveText("150 of 150 sent", { timeout: 12_000 });

  const phone = await outboxContents(page, eventId);
  expect(countStates(phone)).toEqual({ sent: 150 });
  expect(sorted(phone.map((item) => item.id))).toEqual(made);
  expect(await serverRecordIds(cars)).toEqual(made);
  // Three answered requests: the first batch, then the reopened page's two; each record once.
  expect(answers.map((a) => a.status)).toEqual([200, 200, 200]);
  expect(answers.filter((a) => a.fromServiceWorker)).toEqual([]);
  expect(sorted(answers.flatMap((a) => a.ids))).toEqual(made);
});

test("the browser closed while the server stores a batch: reopened, it sends again, nothing doubled", async ({
  playwright,
  baseURL,
}, testInfo) => {
  // Breaking it shows: the outbox lost with the closed browser (no persistent storage) or
  // records left "sending" never sent again → fewer than 150 in the database (seen: drain-outbox.ts
  // skipping "sending" records); the resent batch stored again under new ids → more than 150;
  // the server not recognising a resent record → "refused" instead of 50 "duplicate".
  testInfo.setTimeout(120_000);
  const profile = mkdtempSync(path.join(tmpdir(), "plumbline-phone-"));
  const open = () =>
    playwright.chromium.launchPersistentContext(profile, {
      ...devices["Pixel 7"],
      baseURL: baseURL ?? "",
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: chromiumArgs,
    });
  let context = await open();
  try {
    let page = context.pages()[0] ?? (await context.newPage());
    const { eventId, techUrl, officialId, cars } = await preparedTechLine(page, 3);
    // The second sync request goes on to the server, which stores it; its answer is held.
    const hold = await holdSyncRequest(context, { nth: 2, toServer: true });
    const offline = await takeOffline(context, baseURL ?? "");
    const made = await queueReadings(page, { eventId, officialId, entryIds: cars, count: 150 });
    await expect(new TechLinePage(page).outboxSummary()).toHaveText("0 of 150 sent · 150 waiting");

    await offline.backOnline();
    const held = await hold.held;
    expect(held.ids).toEqual(made.slice(50, 100));
    expect(held.answer?.results.map((r) => r.status)).toEqual(Array(50).fill("stored"));
    await expect(new TechLinePage(page).outboxSummary()).toHaveText("50 of 150 sent · 100 waiting");
    expect(await serverRecordIds(cars)).toEqual(made.slice(0, 100));

    // The phone is switched off with the answer still on its way.
    await context.close();
    hold.release();

    // Switched on again, with signal: same profile, still signed in, the outbox as it was left.
    context = await open();
    const answers = watchSyncAnswers(context);
    page = context.pages()[0] ?? (await context.newPage());
    await page.goto(techUrl);
    await expect(page).toHaveURL(techUrl);
    const tech = new TechLinePage(page);
    await expect(tech.outboxSummary()).toHaveText("150 of 150 sent", { timeout: 12_000 });

    const phone = await outboxContents(page, eventId);
    expect(countStates(phone)).toEqual({ sent: 100, duplicate: 50 });
    expect(sorted(phone.filter((i) => i.state === "duplicate").map((i) => i.id))).toEqual(held.ids);
    expect(sorted(phone.map((item) => item.id))).toEqual(made);
    expect(await serverRecordIds(cars)).toEqual(made);
    // After reopening: the held batch again (answered "duplicate") and the third; nothing else.
    expect(answers.map((a) => a.status)).toEqual([200, 200]);
    expect(answers.filter((a) => a.fromServiceWorker)).toEqual([]);
    expect(sorted(answers.flatMap((a) => a.ids))).toEqual(made.slice(50));
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
});

test("signed out while offline: the phone keeps the records, asks for a sign-in, then sends them", async ({
  page,
  context,
  baseURL,
}) => {
  // Breaking it shows: records dropped or marked refused on a 401 → "120 refused" in the bar and
  // no held sentence (seen: drain-outbox.ts refusing instead of holding); held records not sent
  // after the sign-in → the bar stuck at "0 of 120 sent"; fewer than 120 in the database.
  const { eventId, techUrl, officialId, cars } = await preparedTechLine(page, 2);
  const tech = new TechLinePage(page);
  const answers = watchSyncAnswers(context);
  const offline = await takeOffline(context, baseURL ?? "");
  const made = await queueReadings(page, { eventId, officialId, entryIds: cars, count: 120 });
  await expect(tech.outboxSummary()).toHaveText("0 of 120 sent · 120 waiting");

  // The sign-in runs out in the pit (no request can set the cookie again while offline).
  await context.clearCookies();
  await offline.backOnline();
  const outbox = page.getByTestId("outbox");
  await expect(outbox).toContainText(
    "120 records are held until you sign in again. They are safe on this phone.",
  );
  await expect(tech.outboxSummary()).toHaveText("0 of 120 sent · 120 waiting");
  expect(countStates(await outboxContents(page, eventId))).toEqual({ "needs-sign-in": 120 });
  expect(await serverRecordIds(cars)).toEqual([]);
  // Only "sign in again" so far (once, or again on the outbox's 15 s timer: held records are
  // tried in case the sign-in came back in another tab).
  const whileSignedOut = answers.length;
  expect(whileSignedOut).toBeGreaterThan(0);
  expect(new Set(answers.map((a) => a.status))).toEqual(new Set([401]));

  // Sign in again from the outbox's own link: back to the tech line, and the records go.
  await outbox.getByRole("link", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: "Sign in", exact: true })).toBeVisible();
  await new SignInPage(page).withPassword(demo.scrutineer, demo.password);
  await expect(page).toHaveURL(techUrl);
  await expect(tech.outboxSummary()).toHaveText("120 of 120 sent", { timeout: 12_000 });

  const phone = await outboxContents(page, eventId);
  expect(countStates(phone)).toEqual({ sent: 120 });
  expect(sorted(phone.map((item) => item.id))).toEqual(made);
  expect(await serverRecordIds(cars)).toEqual(made);
  // After the sign-in: three answered batches (50, 50, 20), each record in exactly one.
  const afterSignIn = answers.slice(whileSignedOut);
  expect(afterSignIn.map((a) => a.status)).toEqual([200, 200, 200]);
  expect(answers.filter((a) => a.fromServiceWorker)).toEqual([]);
  expect(sorted(afterSignIn.flatMap((a) => a.ids))).toEqual(made);
});
