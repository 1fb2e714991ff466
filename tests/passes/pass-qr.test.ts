import { createPrivateKey } from "node:crypto";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import QRCode from "qrcode";
import { describe, expect, it } from "vitest";
import { passQrOptions, passQrSvg } from "@/lib/passes/pass-qr-svg";
import { extractPassToken, passUrl } from "@/lib/passes/pass-url";
import { signPass } from "@/lib/passes/sign-pass";
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

  it("uses error correction M and a 4-module quiet zone", async () => {
    // Source: ISO/IEC 18004 — level M restores about 15 % of codewords; quiet zone 4 modules.
    const qr = QRCode.create(url, passQrOptions);
    expect(qr.errorCorrectionLevel.bit).toBe(
      QRCode.create("x", { errorCorrectionLevel: "M" }).errorCorrectionLevel.bit,
    );
    const svg = await passQrSvg(url);
    const viewBox = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)?.[1]);
    expect(viewBox).toBe(qr.modules.size + 2 * 4);
  });

  it("is a version 15 symbol (77 × 77 modules), whatever the car number or the app's address", () => {
    // Source: ISO/IEC 18004 §6.1 — a version-V symbol is 17 + 4·V modules a side.
    for (const origin of [
      "http://127.0.0.1:3000",
      "https://scrutineering.brackenmoor-dcc.org.uk",
    ]) {
      for (const car of [1, 7, 42, 314, 9999]) {
        const passAt = passUrl(origin, makeEventKey().sign(claimsFor({ car })));
        const qr = QRCode.create(passAt, passQrOptions);
        expect(qr.version, `${origin}, car ${car}`).toBe(15);
        expect(qr.modules.size).toBe(17 + 4 * 15);
      }
    }
  });

  it("carries a token of about 350 characters: header 79, payload 182 for a one-digit car, signature 86", () => {
    // Source: RFC 8032 §5.1.6 — an Ed25519 signature is 64 bytes (86 base64url characters).
    const [header = "", payload = "", signature = ""] = token.split(".");
    expect(signature).toHaveLength(86);
    // Our own layout: the kid is 16 characters, and so the header is 59 bytes of JSON.
    expect(header).toHaveLength(79);
    expect(payload).toHaveLength(182);
    expect(token).toHaveLength(79 + 1 + 182 + 1 + 86);
  });

  it("was version 24 (113 modules) at level H in the older layout this replaces", () => {
    // The older pass: typ "plumbline-pass+jwt", ids as 36-character text, iss and cls claims.
    const b64 = (value: unknown) => Buffer.from(JSON.stringify(value)).toString("base64url");
    const older = [
      b64({ alg: "EdDSA", kid: key.kid, typ: "plumbline-pass+jwt" }),
      b64({ iss: "plumbline", ...claimsFor(), cls: "kestrel" }),
      token.split(".")[2],
    ].join(".");
    const olderQr = QRCode.create(passUrl("http://127.0.0.1:3000", older), {
      errorCorrectionLevel: "H",
    });
    expect(olderQr.version).toBe(24);
    const now = QRCode.create(passUrl("http://127.0.0.1:3000", token), passQrOptions);
    expect(now.version).toBe(15);
    // Same screen, modules 42 % bigger: 113 + 8 against 77 + 8 modules across.
    expect((olderQr.modules.size + 8) / (now.modules.size + 8)).toBeGreaterThan(1.42);
  });

  it("control: the older layout, drawn 316 px wide as the older page did, does not decode at 1×", async () => {
    // Reference decoder: jsqr (npm). A fixed key (RFC 8037 Appendix A.1) makes the token, and so
    // the image, the same on every run. This is the failure the audit saw; the same test on
    // today's layout passes at that width and at the widths below.
    const der = createPrivateKey({
      key: {
        kty: "OKP",
        crv: "Ed25519",
        d: "nWGxne_9WmC6hEr0kuwsxERJxWl7MmkZcDusAxyuf2A",
        x: "11qYAYKxCrfVS_7TyWQHOg7hcvPapiMlrwIaaPcHURo",
      },
      format: "jwk",
    })
      .export({ type: "pkcs8", format: "der" })
      .toString("base64");
    const kid = "kPrK_qmxVWaYVA9w"; // first 16 characters of the A.3 thumbprint
    const fixed = signPass({ claims: claimsFor(), kid, privateKeyPkcs8: der });
    const b64 = (value: unknown) => Buffer.from(JSON.stringify(value)).toString("base64url");
    const older = [
      b64({ alg: "EdDSA", kid, typ: "plumbline-pass+jwt" }),
      b64({ iss: "plumbline", ...claimsFor(), cls: "kestrel" }),
      fixed.split(".")[2],
    ].join(".");
    const decodeAt = async (text: string, options: object, width: number) => {
      const png = PNG.sync.read(await QRCode.toBuffer(text, { ...options, width, type: "png" }));
      return jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data ?? null;
    };
    const olderUrl = passUrl("http://127.0.0.1:3000", older);
    expect(await decodeAt(olderUrl, { errorCorrectionLevel: "H", margin: 4 }, 316)).toBeNull();
    const fixedUrl = passUrl("http://127.0.0.1:3000", fixed);
    expect(await decodeAt(fixedUrl, passQrOptions, 316)).toBe(fixedUrl);
  });

  it("decodes at 1× when drawn as big as the pass page draws it on phones and laptops", async () => {
    // Reference decoder: jsqr (npm), one image pixel per screen pixel (device pixel ratio 1).
    // The pass page draws the QR in whole screen pixels per module (components/pass-qr.tsx):
    // 4 px on a 360 or 412 px phone (340 px for 85 modules), 5 px on a laptop's 504 px column;
    // e2e/entrant-pass.spec.ts and e2e/garage-files.spec.ts decode screenshots of the real page.
    const demoUrl = passUrl("http://127.0.0.1:3000", key.sign(claimsFor({ car: 9999 })));
    const modules = QRCode.create(demoUrl, passQrOptions).modules.size + 8;
    for (const width of [4 * modules, 5 * modules]) {
      const png = PNG.sync.read(
        await QRCode.toBuffer(demoUrl, { ...passQrOptions, width, type: "png" }),
      );
      expect(png.width, `width ${width}`).toBe(width);
      const read = jsQR(new Uint8ClampedArray(png.data), png.width, png.height);
      expect(read?.data, `width ${width}`).toBe(demoUrl);
    }
  });

  it("still decodes with part of the symbol lost to glare (what level M keeps in hand)", async () => {
    // Reference decoder: jsqr (npm). Wash out a band of modules away from the finder patterns.
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
