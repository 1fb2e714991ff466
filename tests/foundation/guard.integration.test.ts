import { beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
let eventId = "";

beforeAll(async () => {
  const [row] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from events order by event_date limit 1",
  );
  eventId = row?.id ?? "";
  expect(eventId).not.toBe("");
});

describe("the permission guard", () => {
  it("answers 401 to a signed-out request", async () => {
    const anonymous = new HttpSession(appUrl);
    expect((await anonymous.fetch(`/api/events/${eventId}/entries`)).status).toBe(401);
    expect((await anonymous.fetch("/api/cars")).status).toBe(401);
  });

  it("answers 403 when the role does not grant the permission", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    expect(entrant.hasCookie("authjs.session-token")).toBe(true);
    const response = await entrant.fetch(`/api/events/${eventId}/entries`);
    expect(response.status).toBe(403);
    const body = (await response.json()) as { error: { code: string } };
    expect(body.error.code).toBe("forbidden");
  });

  it("lets a scrutineer read the event's entries", async () => {
    const scrutineer = new HttpSession(appUrl);
    await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
    const response = await scrutineer.fetch(`/api/events/${eventId}/entries`);
    expect(response.status).toBe(200);
    const body = (await response.json()) as { entries: unknown[] };
    expect(body.entries.length).toBeGreaterThan(30);
  });

  it("refuses a wrong password and an unknown account alike", async () => {
    const a = new HttpSession(appUrl);
    await a.signInWithPassword(demo.scrutineer, "not-the-password");
    const b = new HttpSession(appUrl);
    await b.signInWithPassword("nobody@nowhere.test", "whatever");
    expect(a.hasCookie("authjs.session-token")).toBe(false);
    expect(b.hasCookie("authjs.session-token")).toBe(false);
  });

  it("answers a page an entrant may not open with 403, and sends a signed-out visitor to sign-in", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    expect((await entrant.fetch(`/tech/${eventId}`)).status).toBe(403);
    const anonymous = new HttpSession(appUrl);
    const response = await anonymous.fetch(`/tech/${eventId}`);
    expect([302, 303, 307]).toContain(response.status);
    expect(response.headers.get("location")).toMatch(/\/sign-in/);
  });
});
