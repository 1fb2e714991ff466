import { describe, expect, it } from "vitest";
import { formatMoney } from "@/lib/format-money";

describe("formatMoney", () => {
  it("uses the currency's minor unit", () => {
    // Source: ISO 4217 — GBP and EUR have 2 minor-unit digits, JPY has 0.
    expect(formatMoney(9500, "GBP")).toBe("£95.00");
    expect(formatMoney(12345, "EUR")).toBe("€123.45");
    expect(formatMoney(9500, "JPY")).toBe("JP¥9,500");
  });
});
