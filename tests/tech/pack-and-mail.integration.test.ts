import { beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { readingRecord, techFixtures } from "../support/tech-fixtures";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");

type Pack = {
  etag: string;
  recordsCursor: string | null;
  partial: boolean;
  entries: unknown[];
  records: { id: string; receivedAt: string }[];
  passKeys: { kid: string; x: string }[];
  ruleSet: { classes: unknown[] };
};

let fx: Awaited<ReturnType<typeof techFixtures>>;
let scrutineer: HttpSession;

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  scrutineer = new HttpSession(appUrl);
  await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
});

describe("GET /api/events/[eventId]/pack", () => {
  it("gives an official the whole pack with an ETag, and 304 when nothing changed", async () => {
    const response = await scrutineer.fetch(`/api/events/${fx.eventId}/pack`);
    expect(response.status).toBe(200);
    const pack = (await response.json()) as Pack;
    expect(response.headers.get("etag")).toBe(pack.etag);
    expect(pack.entries.length).toBe(40);
    expect(pack.ruleSet.classes.length).toBe(4);
    expect(pack.passKeys[0]?.x).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const again = await scrutineer.fetch(`/api/events/${fx.eventId}/pack`, {
      headers: { "if-none-match": pack.etag },
    });
    expect(again.status).toBe(304);
  });

  it("sends only the records received since the phone's cursor, and a new ETag", async () => {
    const first = (await (await scrutineer.fetch(`/api/events/${fx.eventId}/pack`)).json()) as Pack;
    const record = readingRecord({
      entryId: await fx.entryByNumber(7),
      officialId: await fx.userId(demo.scrutineer),
      deviceId: "phone-p",
      dimension: "wingChordMm",
      valueMm: 240,
    });
    await postSync(scrutineer, fx.eventId, "phone-p", [record]);
    const response = await scrutineer.fetch(
      `/api/events/${fx.eventId}/pack?since=${encodeURIComponent(first.recordsCursor ?? "")}`,
      { headers: { "if-none-match": first.etag } },
    );
    expect(response.status).toBe(200);
    const delta = (await response.json()) as Pack;
    expect(delta.partial).toBe(true);
    expect(delta.etag).not.toBe(first.etag);
    expect(delta.records.map((r) => r.id)).toContain(record.id);
    expect(delta.records.length).toBeLessThan(first.records.length);
    const cursor = Date.parse(first.recordsCursor ?? "");
    for (const r of delta.records) expect(Date.parse(r.receivedAt)).toBeGreaterThan(cursor);
  });

  it("refuses an entrant (403) and a malformed cursor (422)", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    expect((await entrant.fetch(`/api/events/${fx.eventId}/pack`)).status).toBe(403);
    expect((await scrutineer.fetch(`/api/events/${fx.eventId}/pack?since=yesterday`)).status).toBe(
      422,
    );
  });
});

describe("results posted by e-mail", () => {
  it("e-mails the driver and co-driver when a car's verdict changes, with the reason", async () => {
    // Car 7 is shared by the demo driver and co-driver; a failed safety item holds it.
    const entryId = await fx.entryByNumber(7);
    const record = {
      ...readingRecord({
        entryId,
        officialId: await fx.userId(demo.scrutineer),
        deviceId: "phone-m",
        dimension: "x",
        valueMm: 0,
      }),
      kind: "checklist",
      payload: { itemId: "battery", result: "fail", comment: "Battery loose in its tray." },
    };
    const [before] = await queryTestDb<{ status: string }>(
      databaseUrl,
      "select status from verdicts where entry_id = ?",
      [entryId],
    );
    expect(before?.status ?? "waiting", "car 7 must not be held before this test").not.toBe("held");
    const since = Date.now() - 1000;
    const response = await postSync(scrutineer, fx.eventId, "phone-m", [record]);
    expect(response.status).toBe(200);
    await waitForQueueIdle(databaseUrl); // the worker re-derives the verdict and sends the mail
    for (const to of [demo.entrant, demo.codriver]) {
      const { messages } = (await (await fetch(`${mailboxUrl}/messages?to=${to}`)).json()) as {
        messages: { subject: string; text: string; receivedAt: string }[];
      };
      const mail = messages.find(
        (m) => Date.parse(m.receivedAt) >= since && m.subject.startsWith("Car 7: Held"),
      );
      expect(mail, `a verdict e-mail to ${to}`).toBeDefined();
      expect(mail?.text).toMatch(/battery/i);
      expect(mail?.text).toContain(`/entries/${entryId}`);
    }
  });
});
