import { describe, expect, it } from "vitest";
import { entryChecklistSteps } from "@/lib/entries/entry-checklist-steps";
import { composeCoDriverInviteMail } from "@/lib/mail/compose-co-driver-invite-mail";
import { composeEntryReceivedMail } from "@/lib/mail/compose-entry-received-mail";

const entry = {
  eventName: "Test Sprint",
  eventDay: "Saturday 17 May 2031",
  carNumber: 12,
  car: "2001 Mazda MX-5",
  className: "Kestrel",
  fee: "£85.00",
  entryUrl: "http://127.0.0.1:3000/entries/abc",
};

describe("composeEntryReceivedMail", () => {
  it("gives the car number when in the field, in text and HTML", () => {
    const mail = composeEntryReceivedMail({ ...entry, status: "entered", waitingPlace: null });
    expect(mail.subject).toBe("Entry received: car 12 at Test Sprint");
    expect(mail.text).toContain("entered in Test Sprint as car 12");
    expect(mail.text).toContain(entry.entryUrl);
    expect(mail.html).toContain("Kestrel");
    expect(mail.text).not.toMatch(/waiting list/i);
  });
  it("gives the waiting-list place when waiting", () => {
    const mail = composeEntryReceivedMail({ ...entry, status: "waiting", waitingPlace: 3 });
    expect(mail.subject).toBe("Waiting list, place 3: Test Sprint");
    expect(mail.text).toContain("on the waiting list in place 3");
    expect(mail.text).toContain("Waiting list place: 3");
  });
});

describe("composeCoDriverInviteMail", () => {
  it("names the inviter, the car and the link, and how long it works", () => {
    const mail = composeCoDriverInviteMail({
      inviterName: "Sam <Driver>",
      eventName: "Test Sprint",
      eventDay: "Saturday 17 May 2031",
      carNumber: 12,
      car: "2001 Mazda MX-5",
      className: "Kestrel",
      inviteUrl: "http://127.0.0.1:3000/invites/tok",
      expiresDays: 14,
    });
    expect(mail.subject).toBe("Sam <Driver> asks you to co-drive car 12 at Test Sprint");
    expect(mail.text).toContain("http://127.0.0.1:3000/invites/tok");
    expect(mail.text).toContain("14 days");
    // The HTML part escapes what a person typed.
    expect(mail.html).toContain("Sam &#60;Driver&#62;");
    expect(mail.html).not.toContain("<Driver>");
  });
});

describe("entryChecklistSteps", () => {
  const now = new Date("2031-05-10T00:00:00Z");
  const base = {
    entryId: "e1",
    status: "entered" as const,
    declared: false,
    drivers: [{ name: "Sam", waiver: "missing" as const }],
    payment: null,
    invite: null,
    hasCoDriver: false,
    hasPass: false,
    now,
  };
  it("reads each step's state from the facts and links to its route", () => {
    const steps = entryChecklistSteps(base);
    expect(steps.map((s) => [s.key, s.state, s.href])).toEqual([
      ["declare", "to-do", "/entries/e1/declare"],
      ["waiver", "to-do", "/entries/e1/waiver"],
      ["pay", "to-do", "/entries/e1/pay"],
      ["co-driver", "to-do", null],
      ["pass", "to-do", "/entries/e1/pass"],
    ]);
  });
  it("every driver must sign; a declined payment needs the entrant", () => {
    const steps = entryChecklistSteps({
      ...base,
      declared: true,
      drivers: [
        { name: "Sam", waiver: "signed" },
        { name: "Alex", waiver: "needs-guardian" },
      ],
      payment: "failed",
      hasCoDriver: true,
    });
    const state = Object.fromEntries(steps.map((s) => [s.key, s.state]));
    expect(state).toMatchObject({
      declare: "done",
      waiver: "to-do",
      pay: "problem",
      "co-driver": "done",
    });
    expect(steps.find((s) => s.key === "waiver")?.words).toContain("Alex: waits for a parent");
  });
  it("an open invitation is waiting; a waiting entry does not pay yet", () => {
    const steps = entryChecklistSteps({
      ...base,
      status: "waiting",
      invite: {
        email: "co@example.com",
        acceptedAt: null,
        closedAt: null,
        expiresAt: new Date("2031-05-20T00:00:00Z"),
      },
    });
    const byKey = Object.fromEntries(steps.map((s) => [s.key, s]));
    expect(byKey["co-driver"]?.state).toBe("waiting");
    expect(byKey["co-driver"]?.words).toContain("co@example.com");
    expect(byKey.pay?.state).toBe("waiting");
  });
});
