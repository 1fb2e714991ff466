import { execFileSync } from "node:child_process";
import { mkdirSync } from "node:fs";
import path from "node:path";
import QRCode from "qrcode";
import { passQrOptions } from "../../lib/passes/pass-qr-svg";

/**
 * A one-frame Y4M "camera" showing a pass QR, for Chromium's fake video capture (made during the
 * test run from a QR the `qrcode` package draws; never committed).
 */
export async function makePassVideo(url: string, name: string): Promise<string> {
  const dir = path.resolve(import.meta.dirname, "../../test-results/camera");
  mkdirSync(dir, { recursive: true });
  const png = path.join(dir, `${name}.png`);
  const y4m = path.join(dir, `${name}.y4m`);
  // Drawn as the pass page draws it (same error correction and quiet zone).
  await QRCode.toFile(png, url, { ...passQrOptions, width: 400 });
  execFileSync("ffmpeg", [
    "-loglevel",
    "error",
    "-y",
    "-i",
    png,
    "-vf",
    "pad=640:480:120:40:white,format=yuv420p",
    "-frames:v",
    "1",
    y4m,
  ]);
  return y4m;
}
