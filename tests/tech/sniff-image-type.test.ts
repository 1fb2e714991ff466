import { PNG } from "pngjs";
import { describe, expect, it } from "vitest";
import { sniffImageType } from "@/lib/tech/sniff-image-type";

const bytes = (...values: number[]) => new Uint8Array(values);
const text = (s: string) => new TextEncoder().encode(s);

describe("sniffImageType", () => {
  it("knows a PNG by its signature, as pngjs (npm) writes it", () => {
    // Source: PNG specification (W3C / ISO/IEC 15948), §5.2 — signature 137 80 78 71 13 10 26 10.
    const png = new PNG({ width: 2, height: 2 });
    expect(sniffImageType(new Uint8Array(PNG.sync.write(png)))).toBe("image/png");
    expect(sniffImageType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a))).toBe("image/png");
  });

  it("knows a JPEG by its start-of-image marker followed by another marker", () => {
    // Source: ITU-T T.81 (JPEG) Annex B, Table B.1 — SOI marker X'FFD8'; every marker is X'FF' then a code.
    expect(sniffImageType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10))).toBe("image/jpeg");
    expect(sniffImageType(bytes(0xff, 0xd8, 0x00, 0x00))).toBeNull();
  });

  it("knows a WebP by its RIFF header with the WEBP form type", () => {
    // Source: WebP Container Specification (Google), "WebP File Header" — 'RIFF', uint32 size, 'WEBP'.
    expect(sniffImageType(new Uint8Array([...text("RIFF"), 1, 0, 0, 0, ...text("WEBPVP8 ")]))).toBe(
      "image/webp",
    );
    expect(
      sniffImageType(new Uint8Array([...text("RIFF"), 1, 0, 0, 0, ...text("WAVEfmt ")])),
    ).toBeNull();
  });

  it("refuses anything else, whatever it is called", () => {
    expect(sniffImageType(text("This is not a picture, just text named car.png"))).toBeNull();
    expect(sniffImageType(text("GIF89a"))).toBeNull();
    expect(sniffImageType(new Uint8Array())).toBeNull();
    expect(sniffImageType(bytes(0x89, 0x50, 0x4e))).toBeNull();
  });
});
