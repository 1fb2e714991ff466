import { type Browser, expect, test } from "@playwright/test";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import { demo } from "../tests/support/demo-accounts";
import { queryTestDb } from "../tests/support/query-test-db";
import { SignInPage } from "./pages/sign-in-page";
import { movedUpEntrant } from "./support/demo-facts";
import { e2eDatabaseUrl } from "./support/e2e-database-url";
import { takeOffline } from "./support/network-switch";

// The garage and the pass on a narrow phone: 360 × 780 CSS px, one device pixel per CSS pixel
// (common practice (no source): 360 px is the narrowest width phones in use still report).
const narrow = { width: 360, height: 780 };

async function signedIn(browser: Browser, email: string) {
  const context = await browser.newContext({ viewport: narrow, deviceScaleFactor: 1 });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(email, demo.password);
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return { context, page };
}

/** A PNG drawn in code (pngjs): a gradient, so it is a real picture of the given size. */
function makePng(width: number, height: number): Buffer {
  const png = new PNG({ width, height });
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      const i = (y * width + x) * 4;
      png.data[i] = (x * 255) / width;
      png.data[i + 1] = (y * 255) / height;
      png.data[i + 2] = 120;
      png.data[i + 3] = 255;
    }
  }
  return PNG.sync.write(png);
}

test("adds a car with its body width in inches and three photos, shown as thumbnails", async ({
  browser,
}) => {
  const { context, page } = await signedIn(browser, demo.codriver);
  const model = `Elise ${Date.now().toString(36)}`;
  await page.goto("/garage");
  const form = page.getByTestId("add-car-form");
  await form.getByLabel("Make").fill("Lotus");
  await form.getByLabel("Model", { exact: true }).fill(model);
  await form.getByLabel("Model year").fill("1999");
  await form.getByLabel("Colour").fill("Norfolk Mustard");
  await form.getByLabel("Body width (optional)").fill("67.3 in");
  await form.getByRole("button", { name: "Add car" }).click();
  const car = page.getByTestId("car-item").filter({ hasText: model });
  // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 67.3 in = 1709.42 mm → 1709.4 mm.
  await expect(car.getByTestId("car-body-width")).toHaveText("1709.4 mm (67.3 in)");
  const carId = await car.getAttribute("data-car-id");
  try {
    // Three photos: one larger than the stored size (2400 × 1800 px), reduced on the server.
    const photos = {
      front: makePng(2400, 1800),
      side: makePng(640, 400),
      rear: makePng(800, 600),
    };
    for (const [kind, buffer] of Object.entries(photos)) {
      await car
        .getByTestId(`car-file-input-${kind}`)
        .setInputFiles({ name: `${kind}.png`, mimeType: "image/png", buffer });
      await expect(
        car.locator(`[data-testid="car-file-slot"][data-kind="${kind}"] img`),
      ).toBeVisible();
    }
    const thumbs = car.getByTestId("car-file-thumb");
    await expect(thumbs).toHaveCount(3);
    // Each thumbnail has loaded (its bytes came back from the authorised route) and the big one
    // was stored with its long side at 1600 px.
    await expect
      .poll(() =>
        thumbs.evaluateAll((imgs) => imgs.map((i) => (i as HTMLImageElement).naturalWidth)),
      )
      .toEqual([1600, 640, 800]);
    // Nothing wider than the screen.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      narrow.width,
    );
    // A text file named like a photo is refused with words, and no thumbnail appears for it.
    await car.getByTestId("car-file-input-dyno-sheet").setInputFiles({
      name: "dyno.jpg",
      mimeType: "image/jpeg",
      buffer: Buffer.from("not a picture at all"),
    });
    await expect(car.getByTestId("car-file-error")).toContainText("judged by what is inside it");
    await page.screenshot({ path: test.info().outputPath("garage-360.png"), fullPage: true });
  } finally {
    if (carId) {
      await queryTestDb(e2eDatabaseUrl(), "delete from car_files where car_id = ?", [carId]);
      await queryTestDb(e2eDatabaseUrl(), "delete from cars where id = ?", [carId]);
    }
    await context.close();
  }
});

test("the pass fits a 360 px screen with its QR inside the card, and opens offline after a first visit", async ({
  browser,
  baseURL,
}) => {
  const moved = await movedUpEntrant();
  const { context, page } = await signedIn(browser, moved.email);
  await page.goto("/garage");
  await page.getByTestId("entry-pass-link").first().click();
  await expect(page.getByTestId("pass-instruction")).toBeVisible();
  const passPath = new URL(page.url()).pathname;

  const card = await page.getByTestId("pass-card").boundingBox();
  const qr = await page.getByTestId("pass-qr").boundingBox();
  if (!card || !qr) throw new Error("no pass card or QR on the page");
  // The card on the screen, the QR inside the card (to the pixel), nothing wider than the screen.
  expect(card.x).toBeGreaterThanOrEqual(0);
  expect(card.x + card.width).toBeLessThanOrEqual(narrow.width);
  expect(qr.x).toBeGreaterThanOrEqual(card.x);
  expect(qr.x + qr.width).toBeLessThanOrEqual(card.x + card.width);
  // Whole screen pixels per module: 4 px each on a 360 px screen.
  const modules = Number(await page.getByTestId("pass-qr").getAttribute("data-modules"));
  expect(qr.width).toBe(4 * modules);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    narrow.width,
  );
  // It still reads at 1× (reference decoder: jsqr, npm).
  const url = await page.getByTestId("pass-qr").getAttribute("data-pass-url");
  const png = PNG.sync.read(await page.getByTestId("pass-qr").screenshot());
  expect(jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data).toBe(url);
  await expect(page.getByTestId("pass-drivers")).toBeVisible();

  // Saved on the phone by the first visit itself; then no signal at all.
  await expect(page.getByTestId("pass-offline")).toHaveAttribute("data-kept", "true");
  const offline = await takeOffline(context, baseURL ?? "");
  await page.reload();
  await expect(page.getByTestId("pass-qr")).toHaveAttribute("data-pass-url", url ?? "");
  expect(offline.blocked.length).toBeGreaterThan(0);

  // A page never saved, in the entrant's part of the app: words for the garage, no account
  // area, and the kept pass offered.
  await page.goto(`${passPath.replace(/\/pass$/, "")}`).catch(() => undefined);
  await expect(page.getByTestId("no-signal-words")).toHaveAttribute("data-place", "entrant");
  await expect(page.getByTestId("no-signal-words")).toContainText(
    "Your garage and entries need a signal",
  );
  await expect(page.getByText("Prepare for offline")).toHaveCount(0);
  await expect(page.getByRole("link", { name: "Sign in" })).toBeHidden();
  await expect(page.getByTestId("kept-passes").getByRole("link")).toHaveAttribute("href", passPath);
  await offline.backOnline();
  await context.close();
});
