import { describe, expect, it } from "vitest";
import { latestTodayIso, profileSchema } from "@/lib/profile/profile-schema";

const good = {
  fullName: "  Ana   Kovač ",
  dateOfBirth: "1994-05-14",
  phone: "+44 7700 900123",
  emergencyContactName: "Marko Kovač",
  emergencyContactPhone: "07700 900456",
  licence: "",
  experienceLevel: "novice",
};

function fieldMessages(input: Record<string, unknown>) {
  const result = profileSchema.safeParse(input);
  if (result.success) return {};
  return Object.fromEntries(result.error.issues.map((i) => [String(i.path[0]), i.message]));
}

describe("profileSchema", () => {
  it("keeps a complete profile, tidied", () => {
    const parsed = profileSchema.parse(good);
    expect(parsed.fullName).toBe("Ana Kovač");
    expect(parsed.licence).toBeNull();
    expect(parsed.experienceLevel).toBe("novice");
  });

  it("refuses a date of birth in the future, one that does not exist, and an age over 100", () => {
    const today = new Date();
    const nextYear = `${today.getUTCFullYear() + 1}-01-01`;
    expect(fieldMessages({ ...good, dateOfBirth: nextYear }).dateOfBirth).toBe(
      "A date of birth cannot be in the future",
    );
    // Source: Gregorian calendar — 2023 is not a leap year, so 29 February 2023 does not exist.
    expect(fieldMessages({ ...good, dateOfBirth: "2023-02-29" }).dateOfBirth).toMatch(
      /Enter your date of birth/,
    );
    const longAgo = `${today.getUTCFullYear() - 102}-01-01`;
    expect(fieldMessages({ ...good, dateOfBirth: longAgo }).dateOfBirth).toMatch(/over 100/);
    expect(fieldMessages({ ...good, dateOfBirth: "" }).dateOfBirth).toMatch(/Enter your date/);
  });

  it("takes today as a date of birth anywhere on Earth (UTC+14 is the latest zone)", () => {
    // Source: IANA tz database — Pacific/Kiritimati is UTC+14, the furthest ahead.
    expect(latestTodayIso(new Date("2027-06-12T10:00:00Z"))).toBe("2027-06-13");
    expect(latestTodayIso(new Date("2027-06-12T09:59:59Z"))).toBe("2027-06-12");
  });

  it("refuses phone numbers with too few or too many digits", () => {
    // Source: ITU-T E.164 §6 — at most 15 digits.
    expect(fieldMessages({ ...good, phone: "+44 7700 900123 4567" }).phone).toMatch(/phone/);
    expect(fieldMessages({ ...good, phone: "123" }).phone).toMatch(/phone/);
    expect(fieldMessages({ ...good, phone: "call me" }).phone).toMatch(/phone/);
  });

  it("wants an emergency contact other than the person", () => {
    // common practice (no source): the emergency number is someone else's.
    expect(
      fieldMessages({ ...good, emergencyContactPhone: "+44 (0)7700-900123".replace("(0)", "") })
        .emergencyContactPhone,
    ).toBe("Give someone else's number: this is your own");
  });

  it("needs a name, an experience level, and no markup in names", () => {
    const messages = fieldMessages({ ...good, fullName: " ", experienceLevel: "" });
    expect(messages.fullName).toBe("Enter your full name");
    expect(messages.experienceLevel).toBe("Choose your experience level");
    expect(fieldMessages({ ...good, fullName: "<b>x</b>" }).fullName).toMatch(/no </);
  });
});
