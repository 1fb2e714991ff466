import { type Browser, expect, type Page, test } from "@playwright/test";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { movedUpEntrant } from "./support/demo-facts";

// The entrant's garage and pass on the audit's two screens: a phone (412 × 915) and a laptop
// (1280 × 800), one device pixel per CSS pixel so a screenshot is what "1×" means.
const phone = { width: 412, height: 915 };
const laptop = { width: 1280, height: 800 };

async function signedIn(browser: Browser, viewport: typeof phone, email: string) {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1, isMobile: false });
  const page = await context.newPage();
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(email, demo.password);
  await expect(page).toHaveURL(/\/garage$/);
  return { context, page };
}

/** Read the pass QR the way a camera would: a screenshot of the element, decoded by jsQR. */
async function decodeShownQr(page: Page): Promise<{ text: string | null; width: number }> {
  const qr = page.getByTestId("pass-qr");
  const box = await qr.boundingBox();
  const png = PNG.sync.read(await qr.screenshot());
  const read = jsQR(new Uint8ClampedArray(png.data), png.width, png.height);
  return { text: read?.data ?? null, width: Math.round(box?.width ?? 0) };
}

test("the garage fits a phone with a moved-up entry, and says where the car runs", async ({
  browser,
}) => {
  const moved = await movedUpEntrant();
  const { context, page } = await signedIn(browser, phone, moved.email);
  const entry = page.getByTestId("entrant-entry").first();
  await expect(entry.getByTestId("verdict-badge")).toHaveAttribute("data-status", "moved-up");
  await expect(entry.getByTestId("class-line")).toHaveText(
    `Declared ${moved.declared} → runs in ${moved.final} (moved up)`,
  );
  // The event's date as the rest of the app writes it ("Saturday 5 December 2026"), not ISO.
  await expect(entry.locator("time")).toHaveText(/^[A-Z][a-z]+day,? \d{1,2} [A-Z][a-z]+ \d{4}$/);

  // Nothing wider than the screen; the Pass button whole on it; "Moved up → X" on one line.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
    phone.width,
  );
  const pass = await entry.getByTestId("entry-pass-link").boundingBox();
  expect((pass?.x ?? 0) + (pass?.width ?? Number.POSITIVE_INFINITY)).toBeLessThanOrEqual(
    phone.width,
  );
  const badge = await entry.getByTestId("verdict-badge").boundingBox();
  expect(badge?.height ?? 999).toBeLessThan(50);
  await context.close();
});

for (const [name, viewport] of [
  ["phone", phone],
  ["laptop", laptop],
] as const) {
  test(`the pass QR on a ${name} is drawn as wide as its card allows and reads at 1×`, async ({
    browser,
  }) => {
    const moved = await movedUpEntrant();
    const { context, page } = await signedIn(browser, viewport, moved.email);
    await page.getByTestId("entry-pass-link").first().click();
    await expect(page.getByTestId("pass-instruction")).toBeVisible();
    await expect(page.getByTestId("class-line")).toHaveText(
      `Declared ${moved.declared} → runs in ${moved.final} (moved up)`,
    );
    const url = await page.getByTestId("pass-qr").getAttribute("data-pass-url");
    const shown = await decodeShownQr(page);
    // Reference decoder: jsqr (npm), on a screenshot at one image pixel per CSS pixel.
    expect(shown.text).toBe(url);
    // Whole screen pixels per module, as many as fit: 4 px on the phone (the card spans its
    // 412 px), 5 px in the laptop's 504 px column; never past the card's edge. These are the
    // widths tests/passes/pass-qr.test.ts renders and decodes.
    const modules = Number(await page.getByTestId("pass-qr").getAttribute("data-modules"));
    expect(shown.width).toBe(modules * (name === "phone" ? 4 : 5));
    const card = await page.getByTestId("pass-card").boundingBox();
    const qr = await page.getByTestId("pass-qr").boundingBox();
    expect(qr?.x ?? -1).toBeGreaterThanOrEqual(card?.x ?? 0);
    expect((qr?.x ?? 0) + (qr?.width ?? 0)).toBeLessThanOrEqual(
      (card?.x ?? 0) + (card?.width ?? 0),
    );
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      viewport.width,
    );
    await context.close();
  });
}
