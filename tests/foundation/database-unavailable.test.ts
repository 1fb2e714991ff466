import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "@/db/database-unavailable";

// Errors as mysql2 (npm) and Node raise them; the codes and numbers are MariaDB's and Node's
// (from memory: 1213 ER_LOCK_DEADLOCK, 1053 ER_SERVER_SHUTDOWN, ECONNREFUSED).
describe("isDatabaseUnavailable: a 503 for the database away, a 500 for anything else", () => {
  it("knows a refused or lost database connection, also wrapped as Drizzle wraps it", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:3307"), {
      code: "ECONNREFUSED",
      fatal: true,
    });
    expect(isDatabaseUnavailable(refused)).toBe(true);
    expect(isDatabaseUnavailable(new Error("Failed query", { cause: refused }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("shutdown"), { errno: 1053 }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("deadlock"), { errno: 1213 }))).toBe(true);
  });

  it("leaves the same network codes from elsewhere (S3, SMTP) and other errors alone", () => {
    const s3 = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:4568"), {
      code: "ECONNREFUSED",
    });
    expect(isDatabaseUnavailable(s3)).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("x is undefined"))).toBe(false);
    expect(isDatabaseUnavailable(Object.assign(new Error("dup"), { errno: 1062 }))).toBe(false);
  });
});
