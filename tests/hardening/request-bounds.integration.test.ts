// Every request bounded and checked by one mechanism (lib/http/define-route.ts): bodies over
// their route's limit are refused 413 without being read, the wrong content type 415, and a
// cookie-carrying write from another site's page 403 (a forged request riding on a session).
import { beforeAll, describe, expect, inject, it } from "vitest";
import { BODY_LIMITS } from "@/lib/http/body-limits";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { techFixtures } from "../support/tech-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let entrant: HttpSession;

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  entrant = new HttpSession(appUrl);
  await entrant.signInWithPassword(demo.entrant, demo.password);
});

/** A body of `bytes` bytes sent as a stream with no Content-Length: the server must stop reading. */
function streamOf(bytes: number): ReadableStream<Uint8Array> {
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent >= bytes) return controller.close();
      const part = chunk.subarray(0, Math.min(chunk.length, bytes - sent));
      sent += part.length;
      controller.enqueue(part);
    },
  });
}

describe("body limits", () => {
  it("refuses a sync batch over 1 MB by its Content-Length with 413", async () => {
    const body = JSON.stringify({ deviceId: "p", records: ["x".repeat(BODY_LIMITS.sync)] });
    const response = await sam.fetch(`/api/events/${fx.eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body,
    });
    expect(response.status).toBe(413);
    const answer = (await response.json()) as { error: { message: string } };
    expect(answer.error.message).toMatch(/more than this address takes \(1 MB\)/);
  });

  it("stops reading a streamed sync body (no Content-Length) once it passes 1 MB", async () => {
    const response = await sam.fetch(`/api/events/${fx.eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: streamOf(50 * 1024 * 1024),
      duplex: "half",
    } as RequestInit);
    expect(response.status).toBe(413);
  });

  it("refuses a car over 64 KB with 413", async () => {
    const response = await entrant.fetch("/api/cars", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ make: "x".repeat(BODY_LIMITS.default) }),
    });
    expect(response.status).toBe(413);
  });

  it("refuses an upload over 13 MB with 413", async () => {
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(BODY_LIMITS.upload + 1)]), "big.jpg");
    const response = await sam.fetch(`/api/events/${fx.eventId}/uploads`, {
      method: "POST",
      body: form,
    });
    expect(response.status).toBe(413);
  });

  it("refuses a sync batch that is not JSON with 415", async () => {
    const response = await sam.fetch(`/api/events/${fx.eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "text/plain" },
      body: "{}",
    });
    expect(response.status).toBe(415);
  });
});

describe("multipart forms as browsers send them", () => {
  it("reads a form whose boundary has capitals (Chromium's), as the photo upload sends it", async () => {
    const boundary = "----WebKitFormBoundaryQz7XkPa9LmN2bVcD";
    const body = [
      `--${boundary}`,
      'Content-Disposition: form-data; name="recordId"',
      "",
      "not-a-uuid",
      `--${boundary}--`,
      "",
    ].join("\r\n");
    const response = await sam.fetch(`/api/events/${fx.eventId}/uploads`, {
      method: "POST",
      headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
      body,
    });
    // Read, then refused for its fields (422 naming recordId), not "the form could not be read".
    expect(response.status).toBe(422);
    const answer = (await response.json()) as { error: { fields?: Record<string, string[]> } };
    expect(answer.error.fields?.recordId).toBeDefined();
  });
});

describe("posts to pages (server actions, with or without the Next-Action header)", () => {
  it("refuses a form post cut short with 400, with or without an action id (was a 500)", async () => {
    for (const extra of [{}, { "next-action": "0000" }] as Record<string, string>[]) {
      const response = await new HttpSession(appUrl).fetch("/sign-in", {
        method: "POST",
        headers: { "content-type": "multipart/form-data; boundary=x", ...extra },
        body: "junk",
      });
      expect(response.status).toBe(400);
      expect(await response.text()).toBe("The form was cut short; send it again.");
    }
  });

  it("refuses a form post over 64 KB to the sign-in page unread, without an action id too", async () => {
    const response = await new HttpSession(appUrl).fetch("/sign-in", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: `email=${"a".repeat(BODY_LIMITS.signIn)}`,
    });
    expect(response.status).toBe(413);
  });
});

describe("the origin of cookie-carrying writes", () => {
  it("refuses a sync posted from another site's page with 403", async () => {
    const response = await sam.fetch(`/api/events/${fx.eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "http://evil.example" },
      body: JSON.stringify({ deviceId: "p", records: [{}] }),
    });
    expect(response.status).toBe(403);
    const answer = (await response.json()) as { error: { message: string } };
    expect(answer.error.message).toBe("This request did not come from a Plumbline page.");
  });

  it("refuses a car added from another site's page (Referer only) with 403", async () => {
    const response = await entrant.fetch("/api/cars", {
      method: "POST",
      headers: { "content-type": "application/json", referer: "http://evil.example/form" },
      body: JSON.stringify({}),
    });
    expect(response.status).toBe(403);
  });

  it("takes a write from the app's own origin", async () => {
    const response = await sam.fetch(`/api/events/${fx.eventId}/sync`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: new URL(appUrl).origin },
      body: JSON.stringify({ deviceId: "p", records: [{}] }),
    });
    expect(response.status).toBe(200);
  });
});
