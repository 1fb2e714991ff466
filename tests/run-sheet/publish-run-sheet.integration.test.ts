// The clerk of course's run sheet against the real app, worker, MariaDB and mail fake: build from
// the cars ready to run, move a car, publish (only ready cars), republish with a diff, e-mail only
// the entrants a publication changes (with an iCalendar file read back by ical.js), session calls,
// and a re-inspection that sends a car back to Waiting until the chief scrutineer closes it.
import ICAL from "ical.js";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Drive } from "@/lib/paddock/drive";
import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import { actionState } from "../support/action-state";
import { callServerAction } from "../support/call-server-action";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { listMail } from "../support/mailbox";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { readingRecord, techFixtures } from "../support/tech-fixtures";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");
const ACTIONS = "app/(officials)/clerk/[eventId]/actions.ts";
const CHIEF_ACTIONS = "app/(officials)/tech/[eventId]/chief/actions.ts";
const settings = JSON.stringify({
  dayStart: "09:00",
  dayEnd: "17:00",
  sessionMinutes: 20,
  gapMinutes: 10,
  lunch: { start: "12:30", minutes: 45 },
  rounds: 3,
  briefing: { start: "08:15", minutes: 30 },
});

let fx: Awaited<ReturnType<typeof techFixtures>>;
let clerk: HttpSession;
let chief: HttpSession;

async function act(
  session: HttpSession,
  action: string,
  page: string,
  fields: Record<string, string>,
) {
  const answer = await callServerAction(session, {
    action,
    page,
    fields,
    state: { status: "idle" },
  });
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  return actionState<ClerkActionState>(answer.text);
}
const clerkAct = (name: string, fields: Record<string, string>) =>
  act(clerk, `${ACTIONS}#${name}`, `/clerk/${fx.eventId}`, { eventId: fx.eventId, ...fields });
const view = async () =>
  (await (await clerk.fetch(`/api/events/${fx.eventId}/run-groups`)).json()) as ClerkView;

async function cleanUp() {
  await waitForQueueIdle(databaseUrl);
  for (const table of [
    "session_calls",
    "run_group_publications",
    "run_group_drafts",
    "reinspections",
  ]) {
    await queryTestDb(databaseUrl, `delete from ${table} where event_id = ?`, [fx.eventId]);
  }
}

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  clerk = new HttpSession(appUrl);
  await clerk.signInWithPassword(demo.clerk, demo.password);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  await cleanUp();
});
afterAll(cleanUp);

describe("building, moving and publishing run groups", () => {
  let drives: Drive[];

  it("builds groups from the ready cars only, within the cap, one drive per driver", async () => {
    const before = await view();
    drives = before.drives;
    // Source: DOMAIN.md — only cleared (or moved-up) cars that are signed on go into run groups.
    const ready = before.cars.filter((c) => c.ready);
    expect(ready.length).toBeGreaterThan(3);
    for (const car of ready) expect(["cleared", "moved-up"]).toContain(car.status);
    expect(new Set(drives.map((d) => d.entryId))).toEqual(new Set(ready.map((c) => c.entryId)));
    const built = await clerkAct("buildRunGroupsAction", { settings, revision: "" });
    expect(built.status, JSON.stringify(built)).toBe("saved");
    const after = await view();
    const placed = after.draft?.groups.flatMap((g) => g.driveIds) ?? [];
    expect(placed.sort()).toEqual(drives.map((d) => d.driveId).sort());
    for (const group of after.draft?.groups ?? []) {
      expect(group.driveIds.length).toBeLessThanOrEqual(after.cap.cars);
    }
  });

  let firstVersion: number;
  it("publishes version 1 and e-mails every entrant on it an .ics of their sessions", async () => {
    const since = Date.now();
    const draft = (await view()).draft;
    const published = await clerkAct("publishRunSheetAction", {
      revision: String(draft?.revision),
    });
    if (published.status !== "published") throw new Error(JSON.stringify(published));
    firstVersion = published.version;
    expect(published.mailed).toBeGreaterThan(0);
    await waitForQueueIdle(databaseUrl);
    const mails = (await listMail(mailboxUrl, since)).filter((m) => /run sheet/.test(m.subject));
    expect(mails.length).toBe(published.mailed);
    const withCalendar = mails[0];
    const file = withCalendar?.attachments?.find((a) => a.filename?.endsWith(".ics"));
    expect(file?.contentType).toMatch(/^text\/calendar/);
    // Source: RFC 5545 (iCalendar), read by ical.js: one event per session of each drive
    // (3 rounds) plus the drivers' briefing.
    const calendar = new ICAL.Component(ICAL.parse(file?.content ?? ""));
    const events = calendar.getAllSubcomponents("vevent");
    const carNumber = Number(/Car (\d+)/.exec(withCalendar?.subject ?? "")?.[1]);
    const drivesOfCar = drives.filter((d) => d.carNumber === carNumber).length;
    expect(events.length).toBe(drivesOfCar * 3 + 1);
  });

  it("republishing after one move e-mails only that car, and the diff says who moved", async () => {
    const current = await view();
    const groups = current.draft?.groups ?? [];
    // A drive with no other drive of its car or driver, moved into a group with room: no hard
    // rule can stop it (cap, same car, same driver, back to back).
    const alone = (id: string) => {
      const d = drives.find((x) => x.driveId === id);
      return !drives.some(
        (x) => x.driveId !== id && (x.carKey === d?.carKey || x.driverKey === d?.driverKey),
      );
    };
    const from = groups.findIndex((g) => g.driveIds.some(alone));
    const to = groups.findIndex((g, i) => i !== from && g.driveIds.length < current.cap.cars);
    expect(from).toBeGreaterThanOrEqual(0);
    expect(to).toBeGreaterThanOrEqual(0);
    const mover = groups[from]?.driveIds.find(alone) ?? "";
    const moved = groups.map((g, i) => ({
      name: g.name,
      driveIds:
        i === from
          ? g.driveIds.filter((id) => id !== mover)
          : i === to
            ? [...g.driveIds, mover]
            : g.driveIds,
    }));
    const saved = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(moved),
      settings,
      revision: String(current.draft?.revision),
    });
    if (saved.status !== "saved") throw new Error(JSON.stringify(saved));
    const since = Date.now();
    const published = await clerkAct("publishRunSheetAction", { revision: String(saved.revision) });
    if (published.status !== "published") throw new Error(JSON.stringify(published));
    expect(published.version).toBe(firstVersion + 1);
    expect(published.diff.moved.map((m) => m.driveId)).toEqual([mover]);
    await waitForQueueIdle(databaseUrl);
    const mails = (await listMail(mailboxUrl, since)).filter((m) => /run sheet/.test(m.subject));
    const entry = drives.find((d) => d.driveId === mover);
    expect(mails.length).toBe(published.mailed);
    for (const mail of mails) expect(mail.subject).toContain(`Car ${entry?.carNumber}:`);
    expect(mails[0]?.text).toMatch(/moved from .+ to /);
  });

  it("publishing again with nothing changed is refused, and mails nobody", async () => {
    const current = await view();
    const since = Date.now();
    const again = await clerkAct("publishRunSheetAction", {
      revision: String(current.draft?.revision),
    });
    expect(again).toMatchObject({
      status: "error",
      message: expect.stringMatching(/^Nothing has changed since version \d+/),
    });
    expect((await view()).versions[0]?.version).toBe(current.versions[0]?.version);
    await waitForQueueIdle(databaseUrl);
    expect((await listMail(mailboxUrl, since)).filter((m) => /run sheet/.test(m.subject))).toEqual(
      [],
    );
  });

  it("two publishes of one draft at once make one version and mail nobody twice", async () => {
    const current = await view();
    const groups = current.draft?.groups ?? [];
    // Swap the first two groups' order: every entrant of both has new times.
    const swapped = [groups[1], groups[0], ...groups.slice(2)];
    const saved = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(swapped),
      settings,
      revision: String(current.draft?.revision),
    });
    if (saved.status !== "saved") throw new Error(JSON.stringify(saved));
    const since = Date.now();
    const answers = await Promise.all(
      [1, 2].map(() => clerkAct("publishRunSheetAction", { revision: String(saved.revision) })),
    );
    const published = answers.filter((a) => a.status === "published");
    expect(published).toHaveLength(1);
    expect(answers.filter((a) => a.status === "error")).toHaveLength(1);
    await waitForQueueIdle(databaseUrl);
    const mails = (await listMail(mailboxUrl, since)).filter((m) => /run sheet/.test(m.subject));
    const keys = mails.map((m) => `${m.to.join(",")} ${m.subject}`);
    expect(new Set(keys).size).toBe(keys.length);
    expect(mails.length).toBe(published[0]?.status === "published" ? published[0].mailed : -1);
  });

  it("refuses to publish a car that is not ready, and a stale draft", async () => {
    const current = await view();
    const notReady = current.cars.find((c) => !c.ready);
    if (!notReady) throw new Error("the demo has a car that is not ready");
    const groups = current.draft?.groups ?? [];
    const withIntruder = groups.map((g, i) =>
      i === 0 ? { ...g, driveIds: [...g.driveIds, `${notReady.entryId}:1`] } : g,
    );
    const saved = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(withIntruder),
      settings,
      revision: String(current.draft?.revision),
    });
    if (saved.status !== "saved") throw new Error(JSON.stringify(saved));
    const refused = await clerkAct("publishRunSheetAction", { revision: String(saved.revision) });
    expect(refused.status).toBe("error");
    expect(JSON.stringify(refused)).toContain(`car ${notReady.carNumber}`);
    const stale = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(groups),
      settings,
      revision: String(current.draft?.revision),
    });
    expect(stale).toMatchObject({ status: "error", message: expect.stringMatching(/Reload/) });
    // Put the draft back as published.
    const restored = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(groups),
      settings,
      revision: String(saved.revision),
    });
    expect(restored.status).toBe("saved");
  });
});

describe("during the day", () => {
  it("marks a session of the published sheet, and refuses one that is not on it", async () => {
    const ok = await clerkAct("callSessionAction", {
      sessionKey: "1-1",
      state: "on-track",
      note: "",
    });
    expect(ok).toMatchObject({ status: "done" });
    const no = await clerkAct("callSessionAction", {
      sessionKey: "9-9",
      state: "called",
      note: "",
    });
    expect(no).toMatchObject({ status: "error" });
    const noReason = await clerkAct("callSessionAction", {
      sessionKey: "1-1",
      state: "red-flag",
      note: "",
    });
    expect(noReason).toMatchObject({ status: "error", fields: { note: [expect.any(String)] } });
    expect((await view()).calls.map((c) => [c.sessionKey, c.state])).toEqual([["1-1", "on-track"]]);
  });

  it("a mark follows its group when a later version reorders the groups", async () => {
    const current = await view();
    const groups = current.draft?.groups ?? [];
    const first = groups[0]?.name;
    const saved = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify([groups[1], groups[0], ...groups.slice(2)]),
      settings,
      revision: String(current.draft?.revision),
    });
    if (saved.status !== "saved") throw new Error(JSON.stringify(saved));
    const published = await clerkAct("publishRunSheetAction", { revision: String(saved.revision) });
    expect(published.status).toBe("published");
    const after = await view();
    expect(after.published?.body.groups[1]?.name).toBe(first);
    // The group that was on track is now second in the rotation: its mark says 1-2.
    expect(after.calls.map((c) => [c.sessionKey, c.state])).toEqual([["1-2", "on-track"]]);
  });

  it("a re-inspection sends a published car back to Waiting until the chief closes it", async () => {
    const current = await view();
    const target = current.cars.find((c) => c.ready && c.status === "cleared");
    if (!target) throw new Error("the demo has a cleared car");
    const asked = await clerkAct("askReinspectionAction", {
      entryId: target.entryId,
      cause: "incident",
      askedBy: "Clerk of course",
      reason: "Contact with the tyre wall at the hairpin; check the wing mounts.",
    });
    expect(asked.status).toBe("done");
    await waitForQueueIdle(databaseUrl);
    const during = await view();
    const car = during.cars.find((c) => c.entryId === target.entryId);
    expect(car?.status).toBe("waiting");
    expect(car?.reason).toMatch(
      /^Sent back for re-inspection after an incident, asked by Clerk of course/,
    );
    expect(during.flagged.map((f) => f.entryId)).toContain(target.entryId);
    // The clerk takes the car off the sheet: its drivers are told, and their sessions cancelled.
    const groups = (during.draft?.groups ?? []).map((g) => ({
      ...g,
      driveIds: g.driveIds.filter((id) => !id.startsWith(`${target.entryId}:`)),
    }));
    const saved = await clerkAct("saveRunGroupsAction", {
      groups: JSON.stringify(groups),
      settings,
      revision: String(during.draft?.revision),
    });
    if (saved.status !== "saved") throw new Error(JSON.stringify(saved));
    const since = Date.now();
    const published = await clerkAct("publishRunSheetAction", { revision: String(saved.revision) });
    if (published.status !== "published") throw new Error(JSON.stringify(published));
    await waitForQueueIdle(databaseUrl);
    const told = (await listMail(mailboxUrl, since)).filter((m) =>
      m.subject.startsWith(
        `Car ${target.carNumber}: not on run sheet version ${published.version}`,
      ),
    );
    expect(told.length).toBeGreaterThan(0);
    // Source: RFC 5546 §3.2.5 (iTIP CANCEL), read by ical.js: the same events, cancelled.
    const cancel = new ICAL.Component(ICAL.parse(told[0]?.attachments?.[0]?.content ?? ""));
    expect(cancel.getFirstPropertyValue("method")).toBe("CANCEL");
    const cancelled = cancel.getAllSubcomponents("vevent");
    expect(cancelled.length).toBeGreaterThan(0);
    for (const e of cancelled) expect(e.getFirstPropertyValue("status")).toBe("CANCELLED");
    const open = car?.reinspection?.id ?? "";
    const close = (note: string) =>
      act(chief, `${CHIEF_ACTIONS}#closeReinspectionAction`, `/tech/${fx.eventId}/chief`, {
        eventId: fx.eventId,
        reinspectionId: open,
        note,
      });
    // Nothing recorded on the car since: the chief cannot close it yet.
    expect(await close("Mounts checked")).toMatchObject({
      status: "error",
      message: expect.stringMatching(/Nothing has been recorded/),
    });
    const scrutineer = new HttpSession(appUrl);
    await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
    const reading = readingRecord({
      entryId: target.entryId,
      officialId: await fx.userId(demo.scrutineer),
      deviceId: "reinspection-test",
      dimension: "wingTopFromGroundMm",
      valueMm: 1,
    });
    const sent = await postSync(scrutineer, fx.eventId, "reinspection-test", [
      {
        ...reading,
        kind: "note",
        payload: { text: "Wing mounts checked after the incident: tight." },
      },
    ]);
    expect(sent.status).toBe(200);
    expect(await close("Mounts checked, all tight")).toMatchObject({ status: "done" });
    await waitForQueueIdle(databaseUrl);
    const after = (await view()).cars.find((c) => c.entryId === target.entryId);
    expect(after?.status).toBe("cleared");
    expect(after?.reinspection).toBeNull();
  });
});
