// The print layouts, rendered to PDF by Chromium (page.pdf, A4) and read back with PDF.js
// (pdfjs-dist, an independent parser): page size, the cars and words expected, and blocks that
// the print CSS keeps whole (break-inside: avoid) found whole on one page. Expected cars come from
// the database by SQL, not from the app's own shaping code.
import { randomUUID } from "node:crypto";
import { mkdirSync } from "node:fs";
import { type Browser, expect, type Page, test } from "@playwright/test";
import { buildSchedule } from "../lib/paddock/build-schedule";
import { runSheetSchema } from "../lib/paddock/run-sheet-schema";
import { demo } from "../tests/support/demo-accounts";
import { queryTestDb } from "../tests/support/query-test-db";
import { SignInPage } from "./pages/sign-in-page";
import { type PdfPage, readPdf, squeeze, squeezed } from "./support/read-pdf";

const databaseUrl = () => {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (run through scripts/e2e.sh)");
  return url;
};

// Source: ISO 216 — A4 is 210 mm × 297 mm; 1 in = 25.4 mm (NIST SP 811 App. B.8) and a PDF unit
// is 1/72 in (ISO 32000-1 §8.3.2.3): 595.28 × 841.89 pt. Playwright's "A4" is 8.27 × 11.7 in
// (595.44 × 842.4 pt), within 1 pt (0.35 mm) of it.
const A4_PT = { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72 };
const SHOTS = "test-results/print-exports";

type Car = {
  id: string;
  car_number: number;
  status: string | null;
  final_class: string | null;
  reason: string | null;
  records: number;
  driver: string;
  driver_id: string;
  car_id: string;
};

async function eventFacts() {
  const [event] = await queryTestDb<{
    id: string;
    time_zone: string;
    event_date: string | Date;
    body: unknown;
  }>(
    databaseUrl(),
    `select e.id, e.time_zone, e.event_date, v.body from events e
       join rule_set_versions v on v.id = e.rule_set_version_id order by e.event_date limit 1`,
  );
  if (!event) throw new Error("no event");
  const body = (typeof event.body === "string" ? JSON.parse(event.body) : event.body) as {
    classes: { id: string; name: string }[];
  };
  const cars = (
    await queryTestDb<Car>(
      databaseUrl(),
      `select e.id, e.car_number, v.status, v.final_class, v.reason, u.name as driver, e.driver_id, e.car_id,
              (select count(*) from records r where r.entry_id = e.id) as records
         from entries e join users u on u.id = e.driver_id
         left join verdicts v on v.entry_id = e.id
        where e.event_id = ? and e.status = 'entered' order by e.car_number`,
      [event.id],
    )
  ).map((c) => ({ ...c, records: Number(c.records) }));
  const eventDate =
    event.event_date instanceof Date
      ? event.event_date.toISOString().slice(0, 10)
      : String(event.event_date).slice(0, 10);
  return { eventId: event.id, timeZone: event.time_zone, eventDate, classes: body.classes, cars };
}

async function signedIn(browser: Browser, email: string) {
  // A desk browser: print layouts are printed from race control's laptop.
  const context = await browser.newContext({
    viewport: { width: 1280, height: 900 },
    isMobile: false,
  });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(email, demo.password);
  await expect(page).not.toHaveURL(/sign-in/);
  return { context, page };
}

// The layout's page box (components/print/print.css): A4 less 12 mm margins at the sides and top
// and 14 mm at the bottom, passed to page.pdf too so the PDF has the same box whichever wins.
const MARGIN = { top: "12mm", right: "12mm", bottom: "14mm", left: "12mm" };
// CSS px are 1/96 in (CSS Values 4 §6.2): the content box is 186 × 271 mm = 703 × 1024 px.
const CONTENT_PX = { width: Math.round((186 / 25.4) * 96), height: (271 / 25.4) * 96 };

type Printed = { pages: PdfPage[]; heights: Map<string, number> };

/** The page rendered as Chromium prints it and read back, each block's printed height (by its
 *  heading), and a screenshot in print media. */
async function printed(page: Page, name: string): Promise<Printed> {
  await page.emulateMedia({ media: "print" });
  // Each block the layout marks is kept whole by its CSS.
  const breaks = await page
    .getByTestId("print-block")
    .evaluateAll((els) => els.map((el) => getComputedStyle(el).breakInside));
  expect(breaks.length).toBeGreaterThan(0);
  expect(new Set(breaks)).toEqual(new Set(["avoid"]));
  // Nothing of the site's frame or the buttons prints.
  await expect(page.locator("body > header")).toBeHidden();
  await expect(page.getByRole("button", { name: "Print" })).toBeHidden();
  // Laid out at the page box's width, as print lays it out: how tall each block is.
  await page.setViewportSize({ width: CONTENT_PX.width, height: Math.round(CONTENT_PX.height) });
  const heights = new Map(
    await page
      .getByTestId("print-block")
      .evaluateAll((els) =>
        els.map(
          (el) =>
            [
              (el.querySelector("h2")?.textContent ?? "").trim(),
              el.getBoundingClientRect().height,
            ] as [string, number],
        ),
      ),
  );
  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: `${SHOTS}/${name}.png`, fullPage: true, scale: "css" });
  const pdf = await page.pdf({ format: "A4", margin: MARGIN });
  const pages = await readPdf(pdf);
  for (const p of pages) {
    expect(Math.abs(p.widthPt - A4_PT.width)).toBeLessThan(1);
    expect(Math.abs(p.heightPt - A4_PT.height)).toBeLessThan(1);
  }
  return { pages, heights };
}

/** Pages whose text holds `text` (spaces ignored). */
const pagesWith = (pages: PdfPage[], text: string) =>
  pages.flatMap((p, i) => (squeezed(p).includes(squeeze(text)) ? [i] : []));
/** Pages with a text run that is exactly the car number (the large number of a row). */
const pagesWithNumber = (pages: PdfPage[], n: number) =>
  pages.flatMap((p, i) => (p.items.includes(String(n)) ? [i] : []));

/**
 * A block kept whole where it can be: a block that fits in the page box (with 5 % to spare for
 * rounding) is found on one page — its heading and every one of its car numbers; a taller one
 * must run on, but each of its rows is whole (a car's number and its driver on one page).
 */
function expectWholeBlock(
  { pages, heights }: Printed,
  heading: string,
  cars: { number: number; driver: string }[],
) {
  const at = pagesWith(pages, heading);
  expect(at, `heading "${heading}"`).toHaveLength(1);
  const height = heights.get(heading);
  expect(height, `block "${heading}" measured`).toBeDefined();
  const fits = (height ?? Infinity) <= CONTENT_PX.height * 0.95;
  for (const car of cars) {
    const numberAt = pagesWithNumber(pages, car.number);
    if (fits) expect(numberAt, `car ${car.number} under "${heading}"`).toContain(at[0]);
    const rowPage = pages[numberAt.find((i) => i >= (at[0] ?? 0)) ?? -1];
    expect(rowPage && squeezed(rowPage), `row of car ${car.number}`).toContain(squeeze(car.driver));
  }
  return fits;
}

const count = (n: number) => `${n} ${n === 1 ? "car" : "cars"}`;

test("the tech results print on A4, one whole block per class, every car, provisional", async ({
  browser,
}) => {
  const facts = await eventFacts();
  const { context, page } = await signedIn(browser, demo.clerk);
  await page.goto(`/tech/${facts.eventId}/print/results`);
  await expect(
    page.getByRole("heading", { level: 1, name: "Tech results by class" }),
  ).toBeVisible();
  const print = await printed(page, "tech-results");
  const { pages } = print;
  // Enough cars for more than one page, so keeping blocks whole is put to the test.
  expect(pages.length).toBeGreaterThan(1);
  const all = pages.map(squeezed).join("");
  expect(all).toContain(squeeze("Provisional — issued"));
  expect(all).toContain(
    squeeze("the chief scrutineer has the final say and the sanctioning body's rulebook governs"),
  );
  for (const car of facts.cars)
    expect(pagesWithNumber(pages, car.car_number), `car ${car.car_number}`).not.toEqual([]);
  const runs = (c: Car) => c.status === "cleared" || c.status === "moved-up";
  const rows = (cars: Car[]) => cars.map((c) => ({ number: c.car_number, driver: c.driver }));
  const whole: boolean[] = [];
  for (const cls of facts.classes) {
    const inClass = facts.cars.filter((c) => runs(c) && c.final_class === cls.id);
    whole.push(expectWholeBlock(print, `${cls.name} — ${count(inClass.length)}`, rows(inClass)));
  }
  const held = facts.cars.filter((c) => c.status === "held");
  expect(held.length).toBeGreaterThan(0);
  whole.push(expectWholeBlock(print, `Held — ${count(held.length)}`, rows(held)));
  // The check is not empty: some blocks fit a page and were held to it.
  expect(whole.filter(Boolean).length).toBeGreaterThan(1);
  // Who moved up, and why: each moved-up car's reason is printed.
  for (const car of facts.cars.filter((c) => c.status === "moved-up")) {
    expect(all).toContain(squeeze(car.reason ?? "no reason"));
  }
  await context.close();
});

test("the chief scrutineer's report prints every car examined with each rejection", async ({
  browser,
}) => {
  const facts = await eventFacts();
  const { context, page } = await signedIn(browser, demo.chief);
  await page.goto(`/tech/${facts.eventId}/chief`);
  await page.getByRole("link", { name: "Your report to the clerk (print)" }).click();
  await expect(
    page.getByRole("heading", { level: 1, name: "Cars examined at the tech line" }),
  ).toBeVisible();
  const print = await printed(page, "chief-report");
  const { pages } = print;
  const all = pages.map(squeezed).join("");
  // Source: Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.3.1 — all cars examined, with reasons
  // for each rejection, reported to the clerk of the course.
  const examined = facts.cars.filter((c) => c.records > 0);
  const unseen = facts.cars.filter((c) => c.records === 0);
  expect(examined.length).toBeGreaterThan(0);
  expect(unseen.length).toBeGreaterThan(0);
  for (const car of examined) expect(pagesWithNumber(pages, car.car_number)).toHaveLength(1);
  for (const car of unseen) expect(pagesWithNumber(pages, car.car_number)).toEqual([]);
  // Each refused car's block holds its verdict's reason on the page its number is on.
  for (const car of examined.filter((c) => c.status === "held" || c.status === "moved-up")) {
    const [at] = pagesWithNumber(pages, car.car_number);
    expect(squeezed(pages[at ?? -1] as PdfPage), `car ${car.car_number}`).toContain(
      squeeze(car.reason ?? "no reason"),
    );
  }
  expect(all).toContain(squeeze("Reasons for rejection:"));
  expect(all).toContain(squeeze("For the clerk of the course. Chief scrutineer:"));
  await context.close();
});

test("the run sheet prints on A4, one whole block per group, with local times and its version", async ({
  browser,
}) => {
  const facts = await eventFacts();
  // A run sheet as publishing stores it: the demo's cleared cars in groups of 8, the day laid out
  // by buildSchedule (lib/paddock), stored as the event's next version.
  const ready = facts.cars.filter((c) => c.status === "cleared" || c.status === "moved-up");
  const className = new Map(facts.classes.map((c, i) => [c.id, { name: c.name, rank: i }]));
  const drives = ready.map((c) => ({
    driveId: `${c.id}:1`,
    entryId: c.id,
    carNumber: c.car_number,
    carKey: c.car_id,
    driverKey: c.driver_id,
    driverName: c.driver,
    classId: c.final_class ?? "",
    className: className.get(c.final_class ?? "")?.name ?? "",
    classRank: className.get(c.final_class ?? "")?.rank ?? 0,
    experience: "intermediate" as const,
    lapTimeMs: 100_000,
  }));
  const groups = Array.from({ length: Math.ceil(drives.length / 8) }, (_, i) => ({
    name: `Group ${String.fromCharCode(65 + i)}`,
    driveIds: drives.slice(i * 8, i * 8 + 8).map((d) => d.driveId),
  }));
  const settings = {
    dayStart: "09:00",
    dayEnd: "17:00",
    sessionMinutes: 20,
    gapMinutes: 10,
    lunch: { start: "12:30", minutes: 45 },
    rounds: 2,
    briefing: { start: "08:15", minutes: 30 },
  };
  const { sessions, blocks } = buildSchedule({
    eventDate: facts.eventDate,
    timeZone: facts.timeZone,
    settings,
    groupCount: groups.length,
  });
  const body = runSheetSchema.parse({
    timeZone: facts.timeZone,
    eventDate: facts.eventDate,
    drives,
    groups,
    settings,
    sessions,
    blocks,
    explanations: {},
    gaveWay: [],
    cap: { cars: 8, source: "8 cars: a test value" },
  });
  const [clerk] = await queryTestDb<{ id: string }>(
    databaseUrl(),
    "select id from users where email = ?",
    [demo.clerk],
  );
  const [last] = await queryTestDb<{ v: number | null }>(
    databaseUrl(),
    "select max(version) as v from run_group_publications where event_id = ?",
    [facts.eventId],
  );
  const version = Number(last?.v ?? 0) + 1;
  const publicationId = randomUUID();
  await queryTestDb(
    databaseUrl(),
    `insert into run_group_publications (id, event_id, version, body, published_by, published_at)
     values (?, ?, ?, ?, ?, utc_timestamp(3))`,
    [publicationId, facts.eventId, version, JSON.stringify(body), clerk?.id],
  );
  try {
    const { context, page } = await signedIn(browser, demo.clerk);
    await page.goto(`/clerk/${facts.eventId}/print/run-sheet`);
    await expect(page.getByTestId("print-standing")).toContainText(`Version ${version}, published`);
    const print = await printed(page, "run-sheet");
    const { pages } = print;
    expect(pages.length).toBeGreaterThan(1);
    const all = pages.map(squeezed).join("");
    expect(all).toContain(squeeze(`Version ${version}, published`));
    // Each round's start as the venue's wall-clock time, worked here with Intl.
    const hhmm = (iso: string) =>
      new Intl.DateTimeFormat("en-GB", {
        timeZone: facts.timeZone,
        hour: "2-digit",
        minute: "2-digit",
        hourCycle: "h23",
      }).format(new Date(iso));
    groups.forEach((g, i) => {
      const inGroup = g.driveIds.flatMap((id) => {
        const d = drives.find((x) => x.driveId === id);
        return d ? [{ number: d.carNumber, driver: d.driverName }] : [];
      });
      // Eight cars to a group fit a page: every group is found whole.
      expect(expectWholeBlock(print, `${g.name} — ${count(inGroup.length)}`, inGroup)).toBe(true);
      const [at] = pagesWith(pages, `${g.name} — ${count(inGroup.length)}`);
      for (const s of sessions.filter((x) => x.groupIndex === i + 1)) {
        expect(squeezed(pages[at ?? -1] as PdfPage)).toContain(
          squeeze(`Round ${s.round} ${hhmm(s.startsAt)}–${hhmm(s.endsAt)}`),
        );
      }
    });
    for (const d of drives) expect(all).toContain(squeeze(d.driverName));
    await context.close();
  } finally {
    await queryTestDb(databaseUrl(), "delete from run_group_publications where id = ?", [
      publicationId,
    ]);
  }
});
