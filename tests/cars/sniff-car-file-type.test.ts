import { describe, expect, it } from "vitest";
import { sniffCarFileType } from "@/lib/cars/sniff-car-file-type";

const bytes = (...b: number[]) => new Uint8Array(b);
const text = (s: string) => new TextEncoder().encode(s);

describe("what a car's file is, by its first bytes", () => {
  it("knows a PDF by its header", () => {
    // Source: ISO 32000-1:2008 §7.5.2 — a PDF file begins with "%PDF-" and the version.
    expect(sniffCarFileType(text("%PDF-1.7\n%âãÏÓ\n"))).toBe("application/pdf");
    expect(sniffCarFileType(text("%PDF"))).toBeNull();
  });

  it("knows the pictures the tech line stores", () => {
    // Source: ISO/IEC 10918-1 (JPEG) — SOI marker FF D8, then a marker FF.
    expect(sniffCarFileType(bytes(0xff, 0xd8, 0xff, 0xe0))).toBe("image/jpeg");
    // Source: ISO/IEC 15948 (PNG) §5.2 — the 8-byte signature.
    expect(sniffCarFileType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a))).toBe(
      "image/png",
    );
  });

  it("refuses text, an executable and a ZIP whatever they are called", () => {
    expect(sniffCarFileType(text("this is not a photo.jpg"))).toBeNull();
    // Source: Microsoft PE format — a DOS/Windows executable starts "MZ".
    expect(sniffCarFileType(bytes(0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00))).toBeNull();
    // Source: PKWARE APPNOTE 4.3.7 — a ZIP local file header starts "PK\x03\x04".
    expect(sniffCarFileType(bytes(0x50, 0x4b, 0x03, 0x04))).toBeNull();
    expect(sniffCarFileType(bytes())).toBeNull();
  });
});
