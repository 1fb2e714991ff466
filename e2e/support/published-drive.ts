import { queryTestDb } from "../../tests/support/query-test-db";

/** A car's first drive on run sheet `version`, with its driver's e-mail and entry. */
export async function publishedDrive(version: number, carNumber: number) {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (run through scripts/e2e.sh)");
  const [row] = await queryTestDb<{ event_id: string; body: string | object }>(
    url,
    "select event_id, body from run_group_publications where version = ? order by published_at desc limit 1",
    [version],
  );
  if (!row) throw new Error(`no run sheet version ${version}`);
  const body = (typeof row.body === "string" ? JSON.parse(row.body) : row.body) as {
    drives: { driveId: string; entryId: string; carNumber: number; driverKey: string }[];
    groups: { name: string; driveIds: string[] }[];
  };
  const drive = body.drives.find((d) => d.carNumber === carNumber && d.driveId.endsWith(":1"));
  if (!drive) throw new Error(`car ${carNumber} is not on run sheet version ${version}`);
  const group = body.groups.find((g) => g.driveIds.includes(drive.driveId));
  const [user] = await queryTestDb<{ email: string }>(url, "select email from users where id = ?", [
    drive.driverKey,
  ]);
  if (!group || !user) throw new Error("drive without group or driver");
  return {
    eventId: row.event_id,
    entryId: drive.entryId,
    carNumber: drive.carNumber,
    groupName: group.name,
    email: user.email,
    drivesOfCar: body.drives.filter((d) => d.entryId === drive.entryId).length,
  };
}

/** The newest message to `address` since `since` whose subject matches, from the SMTP fake. */
export async function mailFor(address: string, since: number, subject: RegExp) {
  const mailbox = process.env.MAILBOX_URL ?? "http://127.0.0.1:2780";
  for (let attempt = 0; attempt < 75; attempt += 1) {
    const response = await fetch(`${mailbox}/messages?to=${encodeURIComponent(address)}`);
    const { messages } = (await response.json()) as {
      messages: {
        receivedAt: string;
        subject: string;
        text: string;
        attachments?: { filename: string | null; contentType: string; content: string }[];
      }[];
    };
    const found = messages.find(
      (m) => Date.parse(m.receivedAt) >= since && subject.test(m.subject),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail matching ${subject} for ${address}`);
}

/** Start the run-sheet story from an empty sheet: the event's drafts, publications and session
 *  marks removed (a fixture reset, so the spec does not depend on what ran before it). */
export async function clearRunSheets(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (run through scripts/e2e.sh)");
  for (const table of ["session_calls", "run_group_publications", "run_group_drafts"]) {
    await queryTestDb(url, `delete from ${table}`);
  }
}
