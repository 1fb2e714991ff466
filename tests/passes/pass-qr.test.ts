import jsQR from "jsqr";
import { PNG } from "pngjs";
import QRCode from "qrcode";
import { describe, expect, it } from "vitest";
import { passQrOptions, passQrSvg } from "@/lib/passes/pass-qr-svg";
import { extractPassToken, passUrl } from "@/lib/passes/pass-url";
import { claimsFor, makeEventKey } from "./pass-fixtures";

const key = makeEventKey();
const token = key.sign(claimsFor());
const url = passUrl("https://plumbline.example", token);

/** Draw the dark modules of our SVG (qrcode's renderer: "M x y h n" and "m dx dy h n" strokes
 *  along module rows) into RGBA pixels, `scale` pixels per module. */
function rasterizeSvg(svg: string, scale: number): { data: Uint8ClampedArray; size: number } {
  const modules = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)?.[1]);
  const d = /<path stroke="#000000" d="([^"]+)"/.exec(svg)?.[1] ?? "";
  const size = modules * scale;
  const data = new Uint8ClampedArray(size * size * 4).fill(255);
  let x = 0;
  let y = 0;
  for (const [, cmd, args] of d.matchAll(/([MmHhVv])([^MmHhVv]*)/g)) {
    const n = (args ?? "")
      .trim()
      .split(/[\s,]+/)
      .filter(Boolean)
      .map(Number);
    if (cmd === "M") [x, y] = [n[0] ?? 0, n[1] ?? 0];
    else if (cmd === "m") [x, y] = [x + (n[0] ?? 0), y + (n[1] ?? 0)];
    else if (cmd === "h") {
      const row = Math.floor(y);
      for (let col = x; col < x + (n[0] ?? 0); col += 1) {
        for (let py = row * scale; py < (row + 1) * scale; py += 1) {
          for (let px = col * scale; px < (col + 1) * scale; px += 1) {
            const o = (py * size + px) * 4;
            data[o] = 0;
            data[o + 1] = 0;
            data[o + 2] = 0;
          }
        }
      }
      x += n[0] ?? 0;
    } else throw new Error(`unexpected SVG path command ${cmd}`);
  }
  return { data, size };
}

describe("the pass QR", () => {
  it("decodes with jsQR from a PNG back to the same URL and token", async () => {
    // Reference decoder: jsqr (npm), reading a PNG made by qrcode with our options.
    for (const scale of [2, 4]) {
      const png = PNG.sync.read(
        await QRCode.toBuffer(url, { ...passQrOptions, scale, type: "png" }),
      );
      const read = jsQR(new Uint8ClampedArray(png.data), png.width, png.height);
      expect(read?.data, `scale ${scale}`).toBe(url);
      expect(extractPassToken(read?.data ?? "")).toBe(token);
    }
  });

  it("decodes with jsQR from the very SVG the pass page shows", async () => {
    // Reference decoder: jsqr (npm), reading our SVG drawn into pixels.
    const svg = await passQrSvg(url);
    const { data, size } = rasterizeSvg(svg, 4);
    expect(jsQR(data, size, size)?.data).toBe(url);
  });

  it("uses error correction H and a 4-module quiet zone", async () => {
    // Source: ISO/IEC 18004 — level H restores about 30 % of codewords; quiet zone 4 modules.
    const qr = QRCode.create(url, passQrOptions);
    expect(qr.errorCorrectionLevel.bit).toBe(
      QRCode.create("x", { errorCorrectionLevel: "H" }).errorCorrectionLevel.bit,
    );
    const svg = await passQrSvg(url);
    const viewBox = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)?.[1]);
    expect(viewBox).toBe(qr.modules.size + 2 * 4);
    // A phone camera still reads it across a table: keep it at or under version 25 (117 modules).
    expect(qr.version).toBeLessThanOrEqual(25);
  });

  it("still decodes with part of the symbol covered (what level H is for)", async () => {
    // Reference decoder: jsqr (npm). Cover a band of modules away from the finder patterns.
    const png = PNG.sync.read(
      await QRCode.toBuffer(url, { ...passQrOptions, scale: 4, type: "png" }),
    );
    const qrSize = QRCode.create(url, passQrOptions).modules.size;
    const px = 4;
    const start = (4 + Math.floor(qrSize * 0.45)) * px;
    for (let y = start; y < start + 4 * px; y += 1) {
      for (let x = (4 + 9) * px; x < (4 + qrSize - 9) * px; x += 1) {
        const o = (y * png.width + x) * 4;
        png.data[o] = 255;
        png.data[o + 1] = 255;
        png.data[o + 2] = 255;
      }
    }
    expect(jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data).toBe(url);
  });
});
