// The waiver: each driver accepts with their typed full name (time, address and text version
// stored); a wrong name is refused; a minor's entry is not signed on until the parent or guardian
// accepts from the e-mailed link, which works once; the pass-ready e-mail follows sign-on.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { actionState } from "../support/action-state";
import { callServerAction } from "../support/call-server-action";
import { HttpSession } from "../support/http-session";
import { linkIn, listMail, waitForMail } from "../support/mailbox";
import { queryTestDb } from "../support/query-test-db";
import { removeScratchEntries } from "../support/scratch-entries";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";
import {
  demoEvent,
  makeEntry,
  makePerson,
  removePeople,
  signedIn,
  sixteenOn,
} from "./waiver-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");

const SIGN = "app/(entrant)/entries/[entryId]/waiver/actions.ts#signWaiverAction";
const ACCEPT = "app/guardian/[token]/actions.ts#acceptGuardianWaiverAction";
type State = { status: string; message?: string; fields?: Record<string, string[]> };

const entries: string[] = [];
const people: string[] = [];
let event: Awaited<ReturnType<typeof demoEvent>>;

beforeAll(async () => {
  event = await demoEvent(databaseUrl);
});
afterAll(async () => {
  await removeScratchEntries(databaseUrl, entries);
  await removePeople(databaseUrl, people);
});

async function sign(session: HttpSession, entryId: string, fields: Record<string, string>) {
  const answer = await callServerAction(session, {
    action: SIGN,
    page: `/entries/${entryId}/waiver`,
    fields: { entryId, ...fields },
    state: { status: "idle" },
  });
  expect(answer.status).toBe(200);
  return actionState<State>(answer.text);
}

const waiverRows = (entryId: string) =>
  queryTestDb<{
    signer_id: string;
    signed_name: string;
    signed_at: Date;
    signer_ip: string | null;
    text_version: string;
    is_minor: number;
    guardian_email: string | null;
    guardian_token_hash: string | null;
    guardian_signed_at: Date | null;
    guardian_name: string | null;
    guardian_ip: string | null;
  }>(databaseUrl, "select * from waivers where entry_id = ? order by signed_at", [entryId]);

const passState = async (session: HttpSession, entryId: string) => {
  const html = await (await session.fetch(`/entries/${entryId}/pass`)).text();
  return { hasPass: html.includes("data-pass-url"), html };
};

describe("a driver's waiver", () => {
  it("refuses a name that is not the profile's, and stores nothing", async () => {
    const driver = await makePerson(databaseUrl, { name: "Rowan Ashdown-Pike" });
    people.push(driver.id);
    const entryId = await makeEntry(databaseUrl, event.id, { driverId: driver.id, paid: true });
    entries.push(entryId);
    const state = await sign(await signedIn(appUrl, driver.email), entryId, {
      signedName: "Rowan Pike",
    });
    expect(state.status).toBe("error");
    expect(state.fields?.signedName?.[0]).toMatch(/Rowan Ashdown-Pike/);
    expect(await waiverRows(entryId)).toHaveLength(0);
  });

  it("records the time, the address and the text's version, and mails the pass once signed on", async () => {
    const driver = await makePerson(databaseUrl, { name: "Rowan Ashdown-Pike" });
    people.push(driver.id);
    const entryId = await makeEntry(databaseUrl, event.id, { driverId: driver.id, paid: true });
    entries.push(entryId);
    const session = await signedIn(appUrl, driver.email);
    expect((await passState(session, entryId)).hasPass).toBe(false);
    const since = Date.now();
    const before = Date.now() - 1000;
    const state = await sign(session, entryId, { signedName: "  rowan   ASHDOWN-pike " });
    expect(state).toMatchObject({ status: "done" });
    const [row, ...more] = await waiverRows(entryId);
    expect(more).toHaveLength(0);
    expect(row?.signer_id).toBe(driver.id);
    expect(row?.text_version).toBe(event.waiver_version);
    // The app is reached directly on 127.0.0.1: `next start` writes that into X-Forwarded-For.
    expect(row?.signer_ip).toBe("127.0.0.1");
    expect(row?.signed_at.getTime()).toBeGreaterThanOrEqual(before);
    expect(row?.signed_at.getTime()).toBeLessThanOrEqual(Date.now() + 1000);
    expect(row?.is_minor).toBe(0);
    // Signed and paid: the pass is issued, and the driver is told once.
    expect((await passState(session, entryId)).hasPass).toBe(true);
    const mails = await waitForMail(mailboxUrl, since, (m) => m.to.includes(driver.email));
    expect(mails[0]?.subject).toMatch(/Your pass for .* is ready/);
    expect(linkIn(mails[0] ?? { to: [], subject: "", text: "", receivedAt: "" })).toBe(
      `${appUrl}/entries/${entryId}/pass`,
    );
    // Signing again changes nothing and sends nothing more.
    expect(await sign(session, entryId, { signedName: "Rowan Ashdown-Pike" })).toMatchObject({
      status: "done",
      message: "You have accepted this waiver already.",
    });
    await waitForQueueIdle(databaseUrl);
    expect(await waiverRows(entryId)).toHaveLength(1);
    expect(
      (await listMail(mailboxUrl, since)).filter((m) => m.to.includes(driver.email)),
    ).toHaveLength(1);
  });

  it("needs the co-driver's own acceptance too before the entry is signed on", async () => {
    const driver = await makePerson(databaseUrl, { name: "Imogen Tarrant" });
    const co = await makePerson(databaseUrl, { name: "Felix Tarrant" });
    people.push(driver.id, co.id);
    const entryId = await makeEntry(databaseUrl, event.id, {
      driverId: driver.id,
      coDriverId: co.id,
      paid: true,
    });
    entries.push(entryId);
    const driverSession = await signedIn(appUrl, driver.email);
    await sign(driverSession, entryId, { signedName: "Imogen Tarrant" });
    const missing = await passState(driverSession, entryId);
    expect(missing.hasPass).toBe(false);
    // The driver cannot sign for the co-driver: the name must be the signer's own.
    const forOther = await sign(driverSession, entryId, { signedName: "Felix Tarrant" });
    expect(forOther.fields?.signedName?.[0]).toMatch(/Imogen Tarrant/);
    expect(await waiverRows(entryId)).toHaveLength(1);
    await sign(await signedIn(appUrl, co.email), entryId, { signedName: "felix tarrant" });
    expect((await waiverRows(entryId)).map((r) => r.signer_id).sort()).toEqual(
      [driver.id, co.id].sort(),
    );
    expect((await passState(driverSession, entryId)).hasPass).toBe(true);
    // Another person's account may not sign on this entry.
    const stranger = await makePerson(databaseUrl, { name: "Nobody Here" });
    people.push(stranger.id);
    const refused = await sign(await signedIn(appUrl, stranger.email), entryId, {
      signedName: "Nobody Here",
    });
    expect(refused.status).toBe("error");
    expect(refused.message).toMatch(/does not allow that/);
  });
});

describe("a minor's waiver", () => {
  it("waits for the guardian, who accepts from the e-mailed link once", async () => {
    // Under 18 on the event date needs a parent's or guardian's acceptance — common practice
    // (no source).
    const minor = await makePerson(databaseUrl, {
      name: "Kit Hollowell",
      dateOfBirth: sixteenOn(event.event_date),
    });
    people.push(minor.id);
    const entryId = await makeEntry(databaseUrl, event.id, { driverId: minor.id, paid: true });
    entries.push(entryId);
    const session = await signedIn(appUrl, minor.email);

    const noGuardian = await sign(session, entryId, { signedName: "Kit Hollowell" });
    expect(noGuardian.status).toBe("error");
    expect(Object.keys(noGuardian.fields ?? {}).sort()).toEqual(["guardianEmail", "guardianName"]);
    expect(await waiverRows(entryId)).toHaveLength(0);

    const since = Date.now();
    const guardianEmail = `guardian-${entryId.slice(0, 8)}@waiver.test`;
    const asked = await sign(session, entryId, {
      signedName: "Kit Hollowell",
      guardianName: "Morgan Hollowell",
      guardianEmail,
    });
    expect(asked.status).toBe("done");
    const [row] = await waiverRows(entryId);
    expect(row?.is_minor).toBe(1);
    expect(row?.guardian_signed_at).toBeNull();
    // Not signed on, and the pass page says why.
    const waiting = await passState(session, entryId);
    expect(waiting.hasPass).toBe(false);
    expect(waiting.html).toContain("guardian");
    const registration = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from waivers where entry_id = ? and guardian_signed_at is null",
      [entryId],
    );
    expect(registration).toHaveLength(1);

    const [mail] = await waitForMail(mailboxUrl, since, (m) => m.to.includes(guardianEmail));
    expect(mail?.subject).toMatch(/Kit Hollowell asks you to accept the waiver/);
    const link = mail ? linkIn(mail) : undefined;
    expect(link).toMatch(new RegExp(`^${appUrl}/guardian/[A-Za-z0-9_-]{43}$`));
    const token = link?.split("/guardian/")[1] ?? "";
    // Only the SHA-256 of the token is stored.
    const { createHash } = await import("node:crypto");
    expect(row?.guardian_token_hash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(JSON.stringify(await waiverRows(entryId))).not.toContain(token);

    // The guardian needs no account: the link shows the event, the minor and the waiver.
    const guardian = new HttpSession(appUrl);
    const page = await guardian.fetch(`/guardian/${token}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Kit Hollowell");
    expect(html).toContain('data-testid="waiver-text"');

    const accept = async (guardianName: string) =>
      actionState<State>(
        (
          await callServerAction(guardian, {
            action: ACCEPT,
            page: `/guardian/${token}`,
            fields: { token, guardianName },
            state: { status: "idle" },
          })
        ).text,
      );
    const wrong = await accept("Someone Else");
    expect(wrong.status).toBe("error");
    expect(wrong.fields?.guardianName?.[0]).toMatch(/Morgan Hollowell/);

    const passSince = Date.now();
    expect(await accept(" morgan  hollowell ")).toMatchObject({ status: "done" });
    const [done] = await waiverRows(entryId);
    expect(done?.guardian_signed_at).not.toBeNull();
    expect(done?.guardian_ip).toBe("127.0.0.1");
    expect(done?.guardian_name).toBe("morgan  hollowell");
    expect((await passState(session, entryId)).hasPass).toBe(true);
    const passMail = await waitForMail(mailboxUrl, passSince, (m) => m.to.includes(minor.email));
    expect(passMail[0]?.subject).toMatch(/is ready/);

    // The link works once.
    const again = await accept("Morgan Hollowell");
    expect(again.status).toBe("error");
    expect(again.message).toMatch(/used already/);
    expect(await (await guardian.fetch(`/guardian/${token}`)).text()).toContain("Already accepted");
    const [still] = await waiverRows(entryId);
    expect(still?.guardian_signed_at?.getTime()).toBe(done?.guardian_signed_at?.getTime());
  });

  it("refuses a link that was never sent", async () => {
    const guardian = new HttpSession(appUrl);
    const token = "A".repeat(43);
    const html = await (await guardian.fetch(`/guardian/${token}`)).text();
    expect(html).toContain("This link does not work");
    const answer = actionState<State>(
      (
        await callServerAction(guardian, {
          action: ACCEPT,
          page: `/guardian/${token}`,
          fields: { token, guardianName: "Anyone" },
          state: { status: "idle" },
        })
      ).text,
    );
    expect(answer).toMatchObject({ status: "error" });
    expect(answer.message).toMatch(/not valid/);
  });
});
