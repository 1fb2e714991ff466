// Render public/icons/plumbline.svg to the PNG sizes the web app manifest lists, with Debian's
// Chromium. Run by hand when the mark changes (`npx tsx scripts/make-icons.ts`); the PNGs are committed.
import { readFile } from "node:fs/promises";
import path from "node:path";
import { chromium } from "@playwright/test";

const root = path.resolve(import.meta.dirname, "..");
const svg = await readFile(path.join(root, "public/icons/plumbline.svg"), "utf8");
const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
});
const targets = [
  { file: "icon-192.png", size: 192, pad: 0 },
  { file: "icon-512.png", size: 512, pad: 0 },
  // Maskable: the mark inside the central safe zone (80 %), on the same background colour.
  { file: "icon-maskable-512.png", size: 512, pad: 0.1 },
  { file: "apple-touch-icon.png", size: 180, pad: 0 },
];
for (const t of targets) {
  const page = await browser.newPage({ viewport: { width: t.size, height: t.size } });
  const inner = t.size * (1 - 2 * t.pad);
  await page.setContent(
    `<html><body style="margin:0;background:#101214;display:grid;place-items:center;width:${t.size}px;height:${t.size}px">` +
      `<div style="width:${inner}px;height:${inner}px">${svg.replace("<svg ", `<svg width="${inner}" height="${inner}" `)}</div></body></html>`,
  );
  await page.screenshot({ path: path.join(root, "public/icons", t.file), omitBackground: false });
  await page.close();
}
await browser.close();
console.log("icons written");
