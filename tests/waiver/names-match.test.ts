import { describe, expect, it } from "vitest";
import { namesMatch } from "@/lib/waivers/names-match";

// The waiver asks for the full name as the profile gives it; the issue forgives only case and
// spacing (issue 11, item 6) — the rule is ours, so the checks are the rule's own cases.
describe("namesMatch", () => {
  it("forgives capitals and extra or missing spaces at the ends and between words", () => {
    expect(namesMatch("anna de la cruz", "Anna de la Cruz")).toBe(true);
    expect(namesMatch("  ANNA   de  la CRUZ ", "Anna de la Cruz")).toBe(true);
    expect(namesMatch("Anna\tde la\u00a0Cruz", "Anna de la Cruz")).toBe(true);
  });

  it("refuses another name, a part of the name, or letters that differ", () => {
    expect(namesMatch("Anna Cruz", "Anna de la Cruz")).toBe(false);
    expect(namesMatch("Anna", "Anna de la Cruz")).toBe(false);
    expect(namesMatch("Zoe Brennan", "Zoë Brennan")).toBe(false);
    expect(namesMatch("", "Anna de la Cruz")).toBe(false);
  });

  it("reads the same letter typed composed or decomposed as the same (Unicode NFC)", () => {
    // Source: Unicode Standard Annex #15 — "ë" U+00EB is canonically equivalent to e + U+0308.
    expect(namesMatch("Zoe\u0308 Brennan", "Zo\u00eb Brennan")).toBe(true);
  });

  it("matches nothing when the profile has no name", () => {
    expect(namesMatch("Anyone", null)).toBe(false);
    expect(namesMatch("", "   ")).toBe(false);
  });
});
