import { describe, expect, it } from "vitest";
import { countsAsMinor } from "@/lib/waivers/counts-as-minor";
import { describeDriverWaivers } from "@/lib/waivers/describe-driver-waivers";

// Source: Family Law Reform Act 1969 s.1 (full age at 18) and s.9 (attained at the start of the
// birthday); a minor's waiver also needs a parent or guardian — common practice (no source).
describe("countsAsMinor", () => {
  it("goes by the date of birth as it stands now, whatever the waiver was signed as", () => {
    const eventDate = "2027-01-02";
    expect(countsAsMinor({ signedAsMinor: false, dateOfBirth: "1990-03-02", eventDate })).toBe(
      false,
    );
    expect(countsAsMinor({ signedAsMinor: false, dateOfBirth: "2010-09-10", eventDate })).toBe(
      true,
    );
    expect(countsAsMinor({ signedAsMinor: false, dateOfBirth: "2009-01-02", eventDate })).toBe(
      false,
    );
    expect(countsAsMinor({ signedAsMinor: false, dateOfBirth: "2009-01-03", eventDate })).toBe(
      true,
    );
    expect(countsAsMinor({ signedAsMinor: true, dateOfBirth: null, eventDate })).toBe(true);
    expect(countsAsMinor({ signedAsMinor: false, dateOfBirth: null, eventDate })).toBe(false);
  });

  it("reopens an adult's accepted waiver for a guardian once the profile says 16 on the day", () => {
    const signed = [
      {
        signerId: "d1",
        isMinor: false,
        guardianSignedAt: null,
        signedAt: new Date("2026-12-03T10:00:00Z"),
        textVersion: "v1",
        guardianEmail: null,
      },
    ];
    const asAdult = describeDriverWaivers(
      [{ id: "d1", name: "Rowan", dateOfBirth: "1990-03-02", role: "driver" }],
      signed,
      "2027-01-02",
    );
    expect(asAdult[0]?.state).toBe("complete");
    const corrected = describeDriverWaivers(
      [{ id: "d1", name: "Rowan", dateOfBirth: "2010-09-10", role: "driver" }],
      signed,
      "2027-01-02",
    );
    expect(corrected[0]).toMatchObject({ state: "needs-guardian", minor: true });
  });
});
