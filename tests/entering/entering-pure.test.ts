import { describe, expect, it } from "vitest";
import { chooseCarNumber } from "@/lib/entries/choose-car-number";
import { hashInviteToken, newInviteToken } from "@/lib/entries/co-driver-invite-token";
import { describeRefundPolicy } from "@/lib/entries/describe-refund-policy";
import { entryFormSchema } from "@/lib/entries/entry-form-schema";
import { entryWindowProblem } from "@/lib/entries/entry-window-problem";
import { formatEntryWindow } from "@/lib/entries/format-entry-window";
import { formatLapTime } from "@/lib/entries/format-lap-time";
import { inviteProblem } from "@/lib/entries/invite-problem";
import { parseLapTime } from "@/lib/entries/parse-lap-time";
import { placesLeft } from "@/lib/entries/places-left";

describe("chooseCarNumber", () => {
  // Our rule (issue 11): lowest free number ≥ 2 in the event; 1 kept back — common practice (no source).
  it("gives 2 to the first entry and fills the lowest gap", () => {
    expect(chooseCarNumber([])).toBe(2);
    expect(chooseCarNumber([2, 3, 5])).toBe(4);
    expect(chooseCarNumber([1, 2, 3])).toBe(4);
    expect(chooseCarNumber([7, 8])).toBe(2);
  });
  it("never hands out a number still held, withdrawn entries included (the caller passes all)", () => {
    const taken = Array.from({ length: 300 }, (_, i) => i + 2);
    expect(chooseCarNumber(taken)).toBe(302);
  });
});

describe("entryWindowProblem", () => {
  const opensAt = new Date("2031-05-01T08:00:00Z");
  const closesAt = new Date("2031-05-20T23:00:00Z");
  const open = { status: "entries-open" as const, opensAt, closesAt };
  it("takes entries from the opening instant up to, not at, the closing instant", () => {
    expect(entryWindowProblem(open, new Date("2031-05-01T07:59:59.999Z"))).toMatch(/not opened/);
    expect(entryWindowProblem(open, opensAt)).toBeNull();
    expect(entryWindowProblem(open, new Date("2031-05-20T22:59:59.999Z"))).toBeNull();
    expect(entryWindowProblem(open, closesAt)).toMatch(/closed/);
  });
  it("refuses whatever the window says when the status is not entries-open", () => {
    for (const status of ["draft", "entries-closed", "running", "finished"] as const) {
      expect(entryWindowProblem({ ...open, status }, new Date("2031-05-10T12:00:00Z"))).toMatch(
        /not taking entries/,
      );
    }
  });
  it("an open end means open while the status says so", () => {
    expect(
      entryWindowProblem({ status: "entries-open", opensAt: null, closesAt: null }, new Date(0)),
    ).toBeNull();
  });
});

describe("parseLapTime", () => {
  it("reads minutes and seconds with an optional fraction", () => {
    expect(parseLapTime("1:52")).toBe(112_000);
    expect(parseLapTime(" 1:52.4 ")).toBe(112_400);
    expect(parseLapTime("0:58.25")).toBe(58_250);
    expect(parseLapTime("2:05.125")).toBe(125_125);
  });
  it("refuses what is not m:ss, seconds of 60 or more, zero and over 20 minutes", () => {
    for (const bad of ["112", "1:5", "1:60", "1.52", "0:00", "21:00", "", "1:52.1234", "-1:52"]) {
      expect(parseLapTime(bad), bad).toBeNull();
    }
  });
  it("round-trips through formatLapTime", () => {
    for (const ms of [112_000, 112_400, 58_250, 125_125]) {
      expect(parseLapTime(formatLapTime(ms))).toBe(ms);
    }
    expect(formatLapTime(112_400)).toBe("1:52.4");
  });
});

describe("placesLeft", () => {
  it("is capacity less the field, never below zero", () => {
    expect(placesLeft({ capacity: 30, entered: 0 })).toBe(30);
    expect(placesLeft({ capacity: 30, entered: 29 })).toBe(1);
    expect(placesLeft({ capacity: 30, entered: 30 })).toBe(0);
    expect(placesLeft({ capacity: 30, entered: 31 })).toBe(0);
  });
});

describe("formatEntryWindow", () => {
  it("writes the window in the venue's zone, daylight saving included", () => {
    // Source: IANA tz database (Europe/London) — BST (UTC+1) from the last Sunday of March 2031
    // (30 March) to the last Sunday of October; GMT (UTC+0) in January.
    expect(
      formatEntryWindow({
        opensAt: new Date("2031-01-10T09:00:00Z"),
        closesAt: new Date("2031-05-20T23:00:00Z"),
        timeZone: "Europe/London",
      }),
    ).toBe("Opens 2031-01-10 09:00 · closes 2031-05-21 00:00 (Europe/London time)");
  });
});

describe("describeRefundPolicy", () => {
  it("says each tier, longest notice first, with the money in the fee's currency", () => {
    expect(
      describeRefundPolicy(
        {
          tiers: [
            { daysBefore: 3, percent: 50 },
            { daysBefore: 14, percent: 100 },
          ],
        },
        { amountMinor: 8500, currency: "GBP" },
      ),
    ).toEqual([
      "Withdraw 14 or more whole days before the event: 100 % back (£85.00).",
      "Withdraw 3 or more whole days before the event: 50 % back (£42.50).",
      "Later than that, the entry fee is not refunded.",
    ]);
    expect(describeRefundPolicy(null, { amountMinor: 8500, currency: "GBP" })).toEqual([
      "The entry fee is not refunded if you withdraw.",
    ]);
  });
});

describe("entryFormSchema", () => {
  const good = {
    eventSlug: "winter",
    carId: "0190f3c2-7c1a-7b4e-9c3d-2a1b0c9d8e7f",
    classId: "kestrel",
    lapTime: "1:52",
    experience: "novice",
    coDriverEmail: "",
  };
  it("turns the lap time into milliseconds and an empty co-driver into none", () => {
    const parsed = entryFormSchema.parse(good);
    expect(parsed.lapTime).toBe(112_000);
    expect(parsed.coDriverEmail).toBeUndefined();
    expect(
      entryFormSchema.parse({ ...good, coDriverEmail: " Co@Example.COM " }).coDriverEmail,
    ).toBe("co@example.com");
  });
  it("names the field that is wrong", () => {
    const r = entryFormSchema.safeParse({
      ...good,
      lapTime: "fast",
      carId: "",
      coDriverEmail: "x",
    });
    expect(r.success).toBe(false);
    const paths = r.error?.issues.map((i) => i.path[0]).sort();
    expect(paths).toEqual(["carId", "coDriverEmail", "lapTime"]);
  });
});

describe("co-driver invitation", () => {
  it("a token is 32 random bytes in base64url and only its SHA-256 is kept", () => {
    const token = newInviteToken();
    // Source: RFC 4648 §5 — 32 bytes → 43 base64url characters without padding.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(newInviteToken()).not.toBe(token);
    // Source: FIPS 180-4 test vector — SHA-256("abc").
    expect(hashInviteToken("abc")).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
  });
  const base = {
    expiresAt: new Date("2031-05-15T00:00:00Z"),
    acceptedAt: null,
    closedAt: null,
    entryStatus: "entered" as const,
    driverId: "driver",
    coDriverId: null,
  };
  const now = new Date("2031-05-10T00:00:00Z");
  it("lets anyone but the driver accept an open invitation once", () => {
    expect(inviteProblem(base, "someone", now)).toBeNull();
    expect(inviteProblem(base, "driver", now)).toMatch(/driver/);
    expect(inviteProblem({ ...base, coDriverId: "x" }, "someone", now)).toMatch(
      /co-driver already/,
    );
    expect(inviteProblem({ ...base, acceptedAt: now }, "someone", now)).toMatch(/accepted/);
    expect(inviteProblem({ ...base, closedAt: now }, "someone", now)).toMatch(/no longer open/);
    expect(inviteProblem(base, "someone", base.expiresAt)).toMatch(/expired/);
    expect(inviteProblem({ ...base, entryStatus: "withdrawn" }, "someone", now)).toMatch(
      /withdrawn/,
    );
  });
});
