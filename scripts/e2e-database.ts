// scripts/e2e-database.ts create → prints the URL of a fresh, migrated, demo-seeded test database.
// scripts/e2e-database.ts drop <url> → drops it. Used by scripts/test.sh around Playwright.
import mysql from "mysql2/promise";
import { prepareDatabase } from "../tests/support/prepare-database";
import { testSeedDay } from "../tests/support/test-clock";
import { createTestDatabase } from "../tests/support/test-database";

const [command, arg] = process.argv.slice(2);
if (command === "create") {
  // The browser's clock (the phone's: device times, the offline pass check, the outbox's waits)
  // is the real one and cannot follow a fake server clock, so the browser tests run on the real
  // clock, seeded relative to it.
  if (process.env.PLUMBLINE_FAKE_NOW) {
    console.error("The browser tests run on the real clock: unset PLUMBLINE_FAKE_NOW.");
    process.exit(2);
  }
  const database = await createTestDatabase("e2e");
  await prepareDatabase(database.url, { today: testSeedDay(new Date()) });
  process.stdout.write(database.url);
} else if (command === "drop" && arg) {
  const url = new URL(arg);
  const name = url.pathname.slice(1);
  if (!/^plumbline_test_[a-z0-9_]+$/.test(name)) throw new Error(`refusing to drop ${name}`);
  url.pathname = "/";
  const conn = await mysql.createConnection(url.toString());
  await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await conn.end();
} else {
  console.error("usage: e2e-database.ts create | drop <url>");
  process.exit(2);
}
