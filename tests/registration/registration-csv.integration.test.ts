import { beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let eventId = "";
let entries = 0;

beforeAll(async () => {
  const [event] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from events order by event_date limit 1",
  );
  eventId = event?.id ?? "";
  const [count] = await queryTestDb<{ n: number }>(
    databaseUrl,
    "select count(*) as n from entries where event_id = ? and status = 'entered'",
    [eventId],
  );
  entries = Number(count?.n);
});

async function signedIn(email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  await session.signInWithPassword(email, demo.password);
  return session;
}

const csvPath = (query = "") => `/api/events/${eventId}/registration/csv${query}`;

describe("GET /api/events/:id/registration/csv", () => {
  it("gives the registrar every entry as CSV, header first, CRLF line ends", async () => {
    const response = await (await signedIn(demo.registrar)).fetch(csvPath());
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toMatch(/^text\/csv; charset=utf-8/);
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="sign-on-/);
    const body = await response.text();
    // Source: RFC 4180 §2 rules 1 and 3 — CRLF after each record, an optional header line.
    const lines = body.split("\r\n");
    expect(lines.at(-1)).toBe("");
    expect(lines[0]).toBe("Car,Driver(s),Car make and model,Class,Waiver,Fee");
    expect(lines.length - 2).toBe(entries);
    // The seed's minor without a guardian's signature is in it, worded as on screen.
    expect(body).toContain(",Needs guardian,");
  });

  it("searches and sorts as the page does", async () => {
    const session = await signedIn(demo.registrar);
    const body = await (await session.fetch(csvPath("?q=7&sort=car&dir=desc"))).text();
    const cars = body
      .split("\r\n")
      .slice(1)
      .filter(Boolean)
      .map((line) => Number(line.split(",")[0]));
    expect(cars.length).toBeGreaterThan(0);
    for (const car of cars) expect(String(car).startsWith("7")).toBe(true);
    expect(cars).toEqual([...cars].sort((a, b) => b - a));
  });

  it("answers 401 signed out, 403 to roles without registration.check, 422 for a bad sort", async () => {
    expect((await new HttpSession(appUrl).fetch(csvPath())).status).toBe(401);
    for (const email of [demo.clerk, demo.scrutineer, demo.entrant]) {
      const response = await (await signedIn(email)).fetch(csvPath());
      expect(response.status, email).toBe(403);
      expect(await response.text()).not.toContain("Driver(s)");
    }
    const bad = await (await signedIn(demo.registrar)).fetch(csvPath("?sort=password"));
    expect(bad.status).toBe(422);
  });
});
