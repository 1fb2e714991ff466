import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { decodeBase64Url } from "@/lib/passes/decode-base64url";
import { encodeBase64Url } from "@/lib/passes/encode-base64url";

const bytes = (s: string) => new TextEncoder().encode(s);

describe("base64url", () => {
  it("matches the RFC 4648 test vectors (padding removed, as RFC 7515 §2 does)", () => {
    // Source: RFC 4648 §10 — BASE64("") = "", "f" = "Zg==", "fo" = "Zm8=", "foo" = "Zm9v",
    // "foob" = "Zm9vYg==", "fooba" = "Zm9vYmE=", "foobar" = "Zm9vYmFy"
    const vectors: [string, string][] = [
      ["", ""],
      ["f", "Zg"],
      ["fo", "Zm8"],
      ["foo", "Zm9v"],
      ["foob", "Zm9vYg"],
      ["fooba", "Zm9vYmE"],
      ["foobar", "Zm9vYmFy"],
    ];
    for (const [plain, encoded] of vectors) {
      expect(encodeBase64Url(bytes(plain))).toBe(encoded);
      expect(decodeBase64Url(encoded)).toEqual(bytes(plain));
    }
  });

  it("uses the URL-safe alphabet: - and _ for 62 and 63 (RFC 4648 §5)", () => {
    // Source: RFC 4648 §5, Table 2 — value 62 is "-", 63 is "_".
    expect(encodeBase64Url(new Uint8Array([0xfb, 0xff]))).toBe("-_8");
    expect(decodeBase64Url("-_8")).toEqual(new Uint8Array([0xfb, 0xff]));
  });

  it("agrees with Node's Buffer base64url on random bytes (reference: Node.js Buffer)", () => {
    for (let n = 0; n < 200; n += 1) {
      const b = randomBytes(n);
      const encoded = encodeBase64Url(b);
      expect(encoded).toBe(b.toString("base64url"));
      expect(decodeBase64Url(encoded)).toEqual(new Uint8Array(b));
    }
  });

  it("refuses padding, other alphabets, whitespace, impossible lengths and non-canonical tails", () => {
    for (const text of [
      "Zg==",
      "Zm8=",
      "Zm+v",
      "Zm/v",
      "Zm9 v",
      "Zm9v\n",
      "Z",
      "Zm9vY",
      "Zh",
      "Zm9",
    ]) {
      // "Zh" and "Zm9" leave non-zero unused bits: canonical encoders write "Zg" and "Zm8".
      expect(decodeBase64Url(text), text).toBeNull();
    }
  });
});
