// Issue 8 A3: the demo only when asked. A deployment that does not set PLUMBLINE_MODE=demo is
// live: it refuses to start without its own AUTH_SECRET, never serves /demo/*, never accepts a
// session signed with the secret published in the repository, and the seed refuses to give
// accounts the published password.
import { spawn } from "node:child_process";
import path from "node:path";
import { encode } from "@auth/core/jwt";
import { afterAll, describe, expect, inject, it } from "vitest";
import { createDb, createPool } from "../../db/client";
import { migrateDatabase } from "../../db/migrate";
import { demo } from "../support/demo-accounts";
import { type LaunchedServer, launchAppServer } from "../support/launch-app-server";
import { queryTestDb } from "../support/query-test-db";
import { createTestDatabase } from "../support/test-database";
import { testPorts, testServiceEnv } from "../support/test-env";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
// The demo's secret as published in lib/env.ts (anyone who reads the repository has it).
const PUBLISHED_SECRET = "plumbline-demo-secret-not-for-production-use-000000";
const COOKIE = "authjs.session-token";

/** The test environment with the demo's request taken out, as a deployment that forgot it. */
function deploymentEnv(port: number, extra: Record<string, string>): Record<string, string> {
  const { PLUMBLINE_MODE: _asked, ...rest } = testServiceEnv(databaseUrl, port);
  return { ...rest, ...extra };
}

/** A session cookie for the organizer, signed with the published secret. */
async function forgedOrganizerCookie(): Promise<string> {
  const [organizer] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = ?",
    [demo.organizer],
  );
  const token = await encode({
    token: { sub: organizer?.id, email: demo.organizer, name: "Forged" },
    secret: PUBLISHED_SECRET,
    salt: COOKIE,
  });
  return `${COOKIE}=${token}`;
}

async function sessionEmail(baseUrl: string, cookie: string): Promise<string | undefined> {
  const response = await fetch(`${baseUrl}/api/auth/session`, { headers: { cookie } });
  if (!response.ok) return undefined;
  const body = (await response.json()) as { user?: { email?: string } } | null;
  return body?.user?.email;
}

const launched: LaunchedServer[] = [];
afterAll(async () => {
  await Promise.all(launched.map((server) => server.stop()));
});

describe("demo only when asked", () => {
  it("a forged demo cookie works on the demo (so the check below can fail)", async () => {
    expect(await sessionEmail(appUrl, await forgedOrganizerCookie())).toBe(demo.organizer);
  });

  it("a server without PLUMBLINE_MODE and without AUTH_SECRET refuses to start", async () => {
    const server = launchAppServer({
      port: testPorts.app + 7,
      env: deploymentEnv(testPorts.app + 7, {}),
    });
    launched.push(server);
    expect(await server.outcome, server.output()).toBe("exited");
    expect(server.exitCode()).not.toBe(0);
    expect(server.output()).toMatch(/AUTH_SECRET/);
  }, 90_000);

  it("a server without PLUMBLINE_MODE is live: no /demo pages, no published secret", async () => {
    const port = testPorts.app + 8;
    const server = launchAppServer({
      port,
      env: deploymentEnv(port, { AUTH_SECRET: "live-secret-for-this-test-only-0123456789abcdef" }),
    });
    launched.push(server);
    expect(await server.outcome, server.output()).toBe("healthy");
    for (const page of [
      "/demo/mailbox",
      "/demo/mailbox?to=organizer%40brackenmoor.test",
      "/demo/diagrams",
    ]) {
      expect((await fetch(`${server.url}${page}`)).status, page).toBe(404);
    }
    for (const page of ["/sign-in", "/sign-in/check-email"]) {
      const html = await (await fetch(`${server.url}${page}`)).text();
      expect(html, page).not.toContain("/demo/mailbox");
    }
    // Source: RFC 7519 §7.2 — a JWT whose signature does not verify with the server's key is
    // rejected; the published demo key must not be the server's.
    expect(await sessionEmail(server.url, await forgedOrganizerCookie())).toBeUndefined();
  }, 90_000);

  it("a live server refuses the published secret even when it is set on purpose", async () => {
    const port = testPorts.app + 7;
    const server = launchAppServer({
      port,
      env: deploymentEnv(port, { AUTH_SECRET: PUBLISHED_SECRET }),
    });
    launched.push(server);
    expect(await server.outcome, server.output()).toBe("exited");
    expect(server.output()).toMatch(/AUTH_SECRET/);
  }, 90_000);

  it("the seed refuses to create demo accounts unless the demo is asked for", async () => {
    const database = await createTestDatabase("live_seed");
    try {
      const pool = createPool(database.url, 2);
      await migrateDatabase(createDb(pool));
      await pool.end();
      const root = path.resolve(import.meta.dirname, "../..");
      const { PLUMBLINE_MODE: _asked, ...rest } = testServiceEnv(database.url);
      const result = await new Promise<{ code: number | null; output: string }>((resolve) => {
        const child = spawn(path.join(root, "node_modules/.bin/tsx"), ["scripts/seed.ts"], {
          cwd: root,
          env: {
            PATH: process.env.PATH ?? "",
            HOME: process.env.HOME ?? "",
            NODE_ENV: "production",
            ...rest,
          },
          stdio: ["ignore", "pipe", "pipe"],
        });
        let output = "";
        child.stdout?.on("data", (d: Buffer) => {
          output += d.toString();
        });
        child.stderr?.on("data", (d: Buffer) => {
          output += d.toString();
        });
        const timer = setTimeout(() => child.kill("SIGKILL"), 60_000);
        child.once("exit", (code) => {
          clearTimeout(timer);
          resolve({ code, output });
        });
      });
      expect(result.code, result.output).not.toBe(0);
      expect(result.output).toMatch(/PLUMBLINE_MODE=demo/);
      const users = await queryTestDb<{ n: number }>(
        database.url,
        "select count(*) as n from users",
      );
      expect(Number(users[0]?.n)).toBe(0);
    } finally {
      await database.drop();
    }
  }, 90_000);
});
