import { describe, expect, it } from "vitest";
import { isReadyToRun } from "@/lib/entries/ready-to-run";
import { signOnState } from "@/lib/entries/sign-on-state";
import { verdictWords } from "@/lib/verdict-word";

describe("signOnState", () => {
  it("is signed on only with a complete waiver and a paid fee", () => {
    expect(signOnState({ waiver: "signed", paid: true })).toEqual({ signedOn: true, missing: [] });
    expect(signOnState({ waiver: "signed", paid: false })).toEqual({
      signedOn: false,
      missing: ["Entry fee not paid"],
    });
    expect(signOnState({ waiver: "missing", paid: true }).missing).toEqual(["Waiver not signed"]);
  });

  it("holds a minor whose guardian has not co-signed, and says so", () => {
    // common practice (no source): a parent or guardian co-signs the waiver for a minor.
    const state = signOnState({ waiver: "needs-guardian", paid: true });
    expect(state.signedOn).toBe(false);
    expect(state.missing).toEqual(["Waiver needs a parent's or guardian's signature (minor)"]);
  });
});

describe("isReadyToRun", () => {
  const signedOn = signOnState({ waiver: "signed", paid: true });
  const minor = signOnState({ waiver: "needs-guardian", paid: true });

  it("needs both: through the tech line (cleared or moved up) and signed on", () => {
    // DOMAIN.md "Run groups": the clerk groups cleared cars; sign-on comes first (the day, step 2).
    expect(isReadyToRun("cleared", signedOn)).toBe(true);
    expect(isReadyToRun("moved-up", signedOn)).toBe(true);
    expect(isReadyToRun("cleared", minor)).toBe(false);
    expect(isReadyToRun("moved-up", minor)).toBe(false);
  });

  it("is never true for a car still waiting, to re-measure or held, signed on or not", () => {
    for (const status of verdictWords.filter((w) => w !== "cleared" && w !== "moved-up")) {
      expect(isReadyToRun(status, signedOn), status).toBe(false);
    }
  });
});
