import { describe, expect, it } from "vitest";
import { extractPassToken, passUrl } from "@/lib/passes/pass-url";

const token =
  "eyJhbGciOiJFZERTQSJ9.RXhhbXBsZSBvZiBFZDI1NTE5IHNpZ25pbmc.hgyY0il_MGCjP0JzlnLWG1PPOt7-09PGcvMg3AIbQR6dWbhijcNR4ki4iylGjg5BhVsPt9g7sVvpAr_MuM0KAg";

describe("passUrl", () => {
  it("puts the token under /p/ on the app's origin, with or without a trailing slash", () => {
    expect(passUrl("https://plumbline.example", token)).toBe(
      `https://plumbline.example/p/${token}`,
    );
    expect(passUrl("https://plumbline.example/", token)).toBe(
      `https://plumbline.example/p/${token}`,
    );
    expect(passUrl("http://127.0.0.1:3000", "a.b.c")).toBe("http://127.0.0.1:3000/p/a.b.c");
  });
});

describe("extractPassToken", () => {
  it("takes the token out of a pass URL", () => {
    expect(extractPassToken(passUrl("https://plumbline.example", token))).toBe(token);
    expect(extractPassToken(`https://plumbline.example/p/${token}/`)).toBe(token);
    expect(extractPassToken(`https://plumbline.example/p/${token}?utm=x#top`)).toBe(token);
    expect(extractPassToken(`https://plumbline.example/club/p/${token}`)).toBe(token);
  });

  it("takes a URL from another host too: whether the pass is good is the verifier's call", () => {
    expect(extractPassToken(`https://elsewhere.example/p/${token}`)).toBe(token);
  });

  it("accepts a bare token, and trims whitespace a scanner or a paste adds", () => {
    expect(extractPassToken(token)).toBe(token);
    expect(extractPassToken(`  ${token}\n`)).toBe(token);
    expect(extractPassToken(`\t${passUrl("https://plumbline.example", token)} \r\n`)).toBe(token);
  });

  it("returns null for anything that is not a pass", () => {
    for (const text of [
      "",
      "   ",
      "7",
      "hello world",
      "https://plumbline.example/",
      "https://plumbline.example/p/",
      "https://plumbline.example/p/not-a-token",
      `https://plumbline.example/q/${token}`,
      `https://plumbline.example/p/${token}/extra`,
      `ftp://plumbline.example/p/${token}`,
      `javascript:alert(1)//p/${token}`,
      "a.b",
      "a..c",
      "a.b.c.d",
      "a.b+.c",
      `${token} ${token}`,
      "x".repeat(10_000),
    ]) {
      expect(extractPassToken(text), JSON.stringify(text.slice(0, 40))).toBeNull();
    }
  });
});
