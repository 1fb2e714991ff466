import { describe, expect, it } from "vitest";
import { resultsStanding } from "@/lib/results/results-standing";

// Source: Motorsport UK NCR 2026 Ch.3 App.6 (as DOMAIN.md notes) — provisional results carry
// their time of issue and become final when the protest time has expired. The 30 minutes used
// here is the demo event's setting, not a rulebook figure.
const base = {
  issuedAt: "2027-06-12T13:05:00.000Z",
  timeZone: "Europe/London",
  protestWindowMinutes: 30,
  openReinspections: 0,
};

describe("provisional until protest time has expired", () => {
  it("is provisional inside the protest time and says when it ends, in the venue's time", () => {
    const s = resultsStanding({ ...base, now: new Date("2027-06-12T13:34:59.000Z") });
    expect(s.final).toBe(false);
    // 13:05Z is 14:05 BST (tz database: Rule EU 1981 max - Mar lastSun 1:00u 1:00 S).
    expect(s.words).toMatch(/^Provisional — issued 14:05 on Sat 12 Jun 2027 .*final at 14:35/);
  });

  it("is final once the protest time has passed", () => {
    const s = resultsStanding({ ...base, now: new Date("2027-06-12T13:35:00.000Z") });
    expect(s).toEqual({
      final: true,
      words:
        "Final — issued 14:05 on Sat 12 Jun 2027 (Europe/London time); the 30 minutes' protest time ended at 14:35",
    });
  });

  it("stays provisional while a re-inspection is open, however late", () => {
    const s = resultsStanding({
      ...base,
      openReinspections: 1,
      now: new Date("2027-06-12T18:00:00.000Z"),
    });
    expect(s.final).toBe(false);
    expect(s.words).toMatch(/a re-inspection is still open$/);
  });

  it("is provisional with nothing issued", () => {
    expect(resultsStanding({ ...base, issuedAt: null, now: new Date() }).final).toBe(false);
  });
});
