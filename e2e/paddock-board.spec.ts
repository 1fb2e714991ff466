import { expect, type Page, test } from "@playwright/test";
import { publishBoardRunSheet } from "./support/board-run-sheet";
import { takeOffline } from "./support/network-switch";

// The public paddock board with a published run sheet (inserted by e2e/support/board-run-sheet.ts:
// two groups of about a dozen cars; Group A on track since 5 min ago after a 2-min red flag,
// Group B next, Group A's second round after).
let sheet: Awaited<ReturnType<typeof publishBoardRunSheet>>;

test.beforeAll(async () => {
  sheet = await publishBoardRunSheet();
});
test.afterAll(async () => {
  await sheet?.remove();
});

const tv = { width: 1920, height: 1080 };
const phone = { width: 390, height: 844 };

/** The state words a tile may carry (DESIGN.md: colour always travels with a word and icon). */
const stateWords = /Cleared|Moved up|Re-measure|Held|Waiting|Withdrawn/;

/** Tiles whose words do not fit: a line running past the tile's edge, or cut short by it. */
function unfitTiles(page: Page) {
  return page.evaluate(() =>
    [...document.querySelectorAll("[data-testid=paddock-board] li[data-state]")].flatMap((tile) => {
      const box = tile.getBoundingClientRect();
      const bad = [...tile.querySelectorAll("span")].filter((el) => {
        const r = el.getBoundingClientRect();
        return r.right > box.right + 0.5 || el.scrollWidth > el.clientWidth + 0.5;
      });
      return bad.map((el) => `car ${tile.getAttribute("data-car-number")}: ${el.textContent}`);
    }),
  );
}

async function openBoard(page: Page) {
  await page.goto(`/board/${sheet.eventId}`);
  await expect(page.getByTestId("board-on-track").getByTestId("group-name")).toHaveText("Group A");
}

test("on a TV at 1920×1080 the board shows on track, next and after without scrolling, no sign-in", async ({
  browser,
}, testInfo) => {
  const context = await browser.newContext({ viewport: tv, deviceScaleFactor: 1, isMobile: false });
  const page = await context.newPage();
  await openBoard(page);
  await expect(page.getByTestId("board-next").getByTestId("group-name")).toHaveText("Group B");
  await expect(page.getByTestId("board-after").getByTestId("group-name")).toHaveText("Group A");
  await expect(page.getByTestId("board-after")).toContainText("Round 2");
  // The whole "next to call" panel (name, times, every car) is on screen at the top of the page.
  for (const id of ["board-on-track", "board-next"]) {
    const box = await page.getByTestId(id).boundingBox();
    expect(box, id).not.toBeNull();
    expect(box?.y ?? -1).toBeGreaterThanOrEqual(0);
    expect((box?.y ?? 0) + (box?.height ?? 0)).toBeLessThanOrEqual(tv.height);
    expect((box?.x ?? 0) + (box?.width ?? 0)).toBeLessThanOrEqual(tv.width);
  }
  expect(await page.evaluate(() => window.scrollY)).toBe(0);
  // It uses the screen: the three panels span most of its width.
  const now = await page.getByTestId("board-now").boundingBox();
  expect(now?.width ?? 0).toBeGreaterThan(tv.width * 0.9);
  // Large type: the car numbers in the next group are at least 40 px tall.
  const number = page
    .getByTestId("board-next")
    .getByTestId("drive-tile")
    .first()
    .locator("span")
    .first();
  const fontPx = await number.evaluate((el) =>
    Number.parseFloat(getComputedStyle(el.firstElementChild ?? el).fontSize),
  );
  expect(fontPx).toBeGreaterThanOrEqual(40);
  // Each tile: state colour with its word and icon.
  const tiles = page.getByTestId("board-next").getByTestId("drive-tile");
  expect(await tiles.count()).toBeGreaterThan(0);
  for (const tile of await tiles.all()) {
    await expect(tile).toContainText(stateWords);
    await expect(tile.locator("svg")).toHaveCount(1);
  }
  // The clerk's lifted red flag is told with its note; the times are in the venue's zone.
  await expect(page.getByTestId("day-shifts")).toContainText("Oil at the hairpin");
  await expect(page.getByTestId("board-next").getByTestId("session-times")).toContainText(
    /\d\d:\d\d–\d\d:\d\d/,
  );
  expect(await unfitTiles(page)).toEqual([]);
  // A public screen: nobody signs in there.
  await expect(page.getByRole("link", { name: "Sign in" })).toHaveCount(0);
  await expect(
    page.getByText(/the run sheet as published by the clerk of course governs/i),
  ).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath("board-1920x1080.png") });
  await context.close();
});

test("on a phone at 390×844 nothing on the board runs off the side", async ({
  browser,
}, testInfo) => {
  const context = await browser.newContext({
    viewport: phone,
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
  });
  const page = await context.newPage();
  await openBoard(page);
  const widths = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    client: document.documentElement.clientWidth,
  }));
  expect(widths.scroll).toBeLessThanOrEqual(widths.client);
  const overflowing = await page.evaluate(
    (limit) =>
      [...document.querySelectorAll("[data-testid=paddock-board] *")]
        .filter((el) => el.getBoundingClientRect().right > limit + 0.5)
        .map((el) => el.outerHTML.slice(0, 80)),
    widths.client,
  );
  expect(overflowing).toEqual([]);
  expect(await unfitTiles(page)).toEqual([]);
  await page.screenshot({ path: testInfo.outputPath("board-390x844.png") });
  await page.screenshot({ path: testInfo.outputPath("board-390x844-full.png"), fullPage: true });
  await context.close();
});

test("offline after a load the board still shows the run sheet and says how old it is", async ({
  browser,
  baseURL,
}, testInfo) => {
  const context = await browser.newContext({
    viewport: phone,
    deviceScaleFactor: 1,
    isMobile: true,
  });
  const page = await context.newPage();
  await openBoard(page);
  // From the first visit (no reload while online), the board keeps its own page for a reload
  // with no signal: a TV switched on once in the morning must survive the signal going.
  await expect(page.getByTestId("board-heard")).toContainText("Live.");
  await expect
    .poll(() =>
      page.evaluate(
        async (path) => (await (await caches.open("plumbline-pages")).match(path)) !== undefined,
        `/board/${sheet.eventId}`,
      ),
    )
    .toBe(true);
  // The screen keeps the board it heard in IndexedDB.
  await expect
    .poll(() =>
      page.evaluate(
        (eventId) =>
          new Promise<boolean>((resolve) => {
            const open = indexedDB.open("plumbline-boards");
            open.onsuccess = () => {
              const db = open.result;
              if (!db.objectStoreNames.contains("boards")) return resolve(false);
              const get = db.transaction("boards").objectStore("boards").get(eventId);
              get.onsuccess = () => resolve(get.result !== undefined);
              get.onerror = () => resolve(false);
            };
            open.onerror = () => resolve(false);
          }),
        sheet.eventId,
      ),
    )
    .toBe(true);

  const network = await takeOffline(context, baseURL ?? "");
  await page.clock.install();
  await page.reload();
  await expect(page.getByTestId("board-on-track").getByTestId("group-name")).toHaveText("Group A");
  await expect(page.getByTestId("run-sheet-group")).toHaveCount(2);
  // Four minutes with no signal: the board moves on with the clock and says how old it is.
  await page.clock.fastForward("04:00");
  await expect(page.getByTestId("board-heard")).toContainText("No signal");
  await expect(page.getByTestId("board-heard")).toContainText(
    "Last heard from the server 4 min ago",
  );
  expect(network.blocked.length).toBeGreaterThan(0);
  await page.screenshot({ path: testInfo.outputPath("board-offline-390x844.png") });
  await network.backOnline();
  await context.close();
});
