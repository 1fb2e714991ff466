import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { reduceImage } from "@/lib/cars/reduce-image";

/** A landscape JPEG (width × height pixels as stored) with an EXIF orientation tag. */
async function jpeg(width: number, height: number, orientation?: number) {
  let image = sharp({
    create: { width, height, channels: 3, background: { r: 200, g: 40, b: 40 } },
  }).jpeg();
  if (orientation) image = image.withMetadata({ orientation });
  return new Uint8Array(await image.toBuffer());
}

describe("reducing a picture before it is stored", () => {
  it("brings the long side down to 1600 px, keeping the shape", async () => {
    const out = await reduceImage(await jpeg(3000, 2000), "image/jpeg");
    const meta = await sharp(out.bytes).metadata();
    expect([meta.width, meta.height]).toEqual([1600, 1067]);
    expect([out.widthPx, out.heightPx]).toEqual([1600, 1067]);
    expect(meta.format).toBe("jpeg");
  });

  it("turns a picture upright by its EXIF orientation and keeps no metadata", async () => {
    // Source: EXIF 2.32 (CIPA DC-008) Orientation tag 6 — the stored rows must be turned 90°
    // clockwise to show the picture upright, so a 3000 × 2000 sensor image shows 2000 × 3000.
    const input = await jpeg(3000, 2000, 6);
    expect((await sharp(input).metadata()).orientation).toBe(6);
    const out = await reduceImage(input, "image/jpeg");
    const meta = await sharp(out.bytes).metadata();
    expect([meta.width, meta.height]).toEqual([1067, 1600]);
    expect(meta.orientation).toBeUndefined();
    expect(meta.exif).toBeUndefined();
  });

  it("never enlarges a small picture", async () => {
    const png = new Uint8Array(
      await sharp({ create: { width: 40, height: 30, channels: 4, background: "#0a0" } })
        .png()
        .toBuffer(),
    );
    const out = await reduceImage(png, "image/png");
    expect([out.widthPx, out.heightPx]).toEqual([40, 30]);
  });

  it("refuses, in words, bytes that start like a JPEG but are not one", async () => {
    const fake = new Uint8Array([
      0xff,
      0xd8,
      0xff,
      0xe0,
      ...new TextEncoder().encode("not really"),
    ]);
    await expect(reduceImage(fake, "image/jpeg")).rejects.toThrow(/could not be read/);
  });
});
