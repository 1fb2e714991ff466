import { createServer } from "node:net";
import { describe, expect, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { prepareDatabase } from "../support/prepare-database";
import { queryTestDb } from "../support/query-test-db";
import { startAppServer } from "../support/start-app-server";
import { testSeedDay } from "../support/test-clock";
import { createTestDatabase } from "../support/test-database";
import { testServiceEnv } from "../support/test-env";

// Defect: the test databases were seeded for a fixed day (2027-04-12, so the event was Saturday
// 17 April 2027) while the app issued and checked passes by the real clock: from 18 April 2027
// on, every pass was refused ("This event is over") and the suites failed. Now the app's time
// paths read one clock (lib/clock.ts: the real one, or PLUMBLINE_FAKE_NOW in demo mode) and the
// harness seeds relative to that same clock. This test runs the pass journey with the app's
// clock set after that day, and far ahead, each on a database seeded the harness's way.

/** A port nothing listens on now (127.0.0.1 only). */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** `next start` on its own port against `databaseUrl`, its clock set to `clock`. */
async function appAt(databaseUrl: string, clock: string) {
  const port = await freePort();
  return startAppServer({
    port,
    env: { ...testServiceEnv(databaseUrl, port), PLUMBLINE_FAKE_NOW: clock },
  });
}

/** The demo entrant's pass page: the pass URL the QR encodes and the token's claims. */
async function openPass(session: HttpSession, entryId: string) {
  const response = await session.fetch(`/entries/${entryId}/pass`);
  const html = await response.text();
  const url = /data-pass-url="([^"]+)"/.exec(html)?.[1] ?? null;
  const token = url?.split("/p/")[1] ?? null;
  const payload = token?.split(".")[1];
  const claims = payload
    ? (JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as {
        iat: number;
        exp: number;
      })
    : null;
  return { status: response.status, html, token, claims };
}

async function checkPass(appUrl: string, token: string) {
  const response = await fetch(`${appUrl}/p/${token}`);
  expect(response.status).toBe(200);
  const html = await response.text();
  return { valid: /data-valid="true"/.test(html), html };
}

const cases = [
  {
    what: "the day after the old fixed seed's event (Monday 19 April 2027)",
    clock: "2027-04-19T09:00:00.000Z",
    // The Saturday on or after the next day. Source: Gregorian calendar (checked with `date -u`).
    eventDate: "2027-04-24",
    // End of 24 April in London, on BST (UTC+1), is 23:00 UTC; plus the 2 h margin
    // (DEVELOPERS.md, Passes). Source: IANA tz database — BST from 28 March to 31 October 2027.
    expiresAt: "2027-04-25T01:00:00.000Z",
    afterEvent: "2027-04-25T12:00:00.000Z",
  },
  {
    what: "far ahead (Monday 2 June 2031)",
    clock: "2031-06-02T09:00:00.000Z",
    eventDate: "2031-06-07",
    // Source: IANA tz database — London on BST (UTC+1) in June 2031.
    expiresAt: "2031-06-08T01:00:00.000Z",
    afterEvent: "2031-06-08T12:00:00.000Z",
  },
];

describe("the pass journey on whatever day the tests run", () => {
  for (const c of cases) {
    it(`issues and checks a pass by the app's clock: ${c.what}`, async () => {
      const database = await createTestDatabase("clock");
      try {
        await prepareDatabase(database.url, { today: testSeedDay(new Date(c.clock)) });
        const [event] = await queryTestDb<{ event_date: string; time_zone: string }>(
          database.url,
          "select date_format(event_date, '%Y-%m-%d') as event_date, time_zone from events order by event_date limit 1",
        );
        expect(event).toEqual({ event_date: c.eventDate, time_zone: "Europe/London" });
        const [own] = await queryTestDb<{ id: string }>(
          database.url,
          "select e.id from entries e join users u on u.id = e.driver_id where u.email = ?",
          [demo.entrant],
        );
        const entryId = own?.id ?? "";

        // On the clock's day: the entrant gets a pass issued now (by that clock), good until
        // the end of the event's day at the venue plus the margin, and the server accepts it.
        const clockSeconds = Date.parse(c.clock) / 1000;
        let token = "";
        const app = await appAt(database.url, c.clock);
        try {
          const entrant = new HttpSession(app.url);
          await entrant.signInWithPassword(demo.entrant, demo.password);
          const pass = await openPass(entrant, entryId);
          expect(pass.status).toBe(200);
          expect(pass.html).not.toContain("This event is over");
          expect(pass.claims?.iat).toBeGreaterThanOrEqual(clockSeconds);
          expect(pass.claims?.iat).toBeLessThan(clockSeconds + 120); // the clock runs on from there
          expect(pass.claims?.exp).toBe(Date.parse(c.expiresAt) / 1000);
          token = pass.token ?? "";
          const [row] = await queryTestDb<{ issued_at: Date; expires_at: Date }>(
            database.url,
            "select issued_at, expires_at from passes where entry_id = ?",
            [entryId],
          );
          expect(row?.issued_at.getTime()).toBe((pass.claims?.iat ?? 0) * 1000);
          expect(row?.expires_at.toISOString()).toBe(c.expiresAt);
          expect((await checkPass(app.url, token)).valid).toBe(true);
        } finally {
          await app.stop();
        }

        // The day after the event, by the same clock: the pass is refused as expired, and the
        // entrant's page says the event is over instead of signing a new one.
        const later = await appAt(database.url, c.afterEvent);
        try {
          const check = await checkPass(later.url, token);
          expect(check.valid).toBe(false);
          expect(check.html).toContain("This pass has expired.");
          const entrant = new HttpSession(later.url);
          await entrant.signInWithPassword(demo.entrant, demo.password);
          const page = await openPass(entrant, entryId);
          expect(page.status).toBe(200);
          expect(page.html).toContain("This event is over, so passes are no longer issued.");
          expect(page.token).toBeNull();
        } finally {
          await later.stop();
        }
      } finally {
        await database.drop();
      }
    }, 180_000);
  }
});
