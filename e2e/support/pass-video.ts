import { execFileSync } from "node:child_process";
import { mkdirSync } from "node:fs";
import path from "node:path";
import QRCode from "qrcode";
import { passQrOptions } from "../../lib/passes/pass-qr-svg";

/**
 * A short Y4M "camera" clip of a pass QR held in front of a phone, for Chromium's fake video
 * capture (made during the test run from a QR the `qrcode` package draws; never committed).
 *
 * The clip is 24 frames at 10 fps in which the pass turns a few degrees and comes nearer and
 * further, as it does in a hand. One still frame repeated is not what a camera sees, and it is
 * unfair to the decoder: ZXing (inside html5-qrcode) fails some perfectly sharp dense codes at
 * one particular scale and gets them on the next frame — its maintainers call retrying on the
 * next image the intended use (zxing/zxing issue 1900; zxing-js/library issue 653).
 */
export async function makePassVideo(url: string, name: string): Promise<string> {
  const dir = path.resolve(import.meta.dirname, "../../test-results/camera");
  mkdirSync(dir, { recursive: true });
  const png = path.join(dir, `${name}.png`);
  const y4m = path.join(dir, `${name}.y4m`);
  // Drawn as the pass page draws it (same error correction and quiet zone).
  await QRCode.toFile(png, url, { ...passQrOptions, width: 400 });
  const frames = 24;
  execFileSync("ffmpeg", [
    "-loglevel",
    "error",
    "-y",
    "-framerate",
    "10",
    "-loop",
    "1",
    "-i",
    png,
    "-vf",
    [
      // White surround in the camera's 4:3, a tilt of up to ±3.4°, nearer and further by ±9 %.
      "pad=800:600:200:100:white",
      `rotate=a='0.06*sin(2*PI*n/${frames})':fillcolor=white`,
      "zoompan=z='1.15+0.1*sin(2*PI*on/17)':d=1:s=640x480:x='iw/2-(iw/zoom/2)':y='ih/2-(ih/zoom/2)'",
      "format=yuv420p",
    ].join(","),
    "-frames:v",
    String(frames),
    y4m,
  ]);
  return y4m;
}
