import { randomUUID } from "node:crypto";
import type { RunSheet } from "../../lib/paddock/run-sheet-schema";
import type { SessionCallState } from "../../lib/paddock/session-call";
import { queryTestDb } from "./query-test-db";
import type { TestSheetCar } from "./test-run-sheet";

type ClassBody = { classes: { id: string; name: string }[] };

/**
 * The event's cars that passed the tech line (cleared or moved up), with their class and drivers,
 * as a test's run sheet takes them; `extraEntryIds` adds entries whatever their verdict.
 */
export async function listTestSheetCars(
  databaseUrl: string,
  eventId: string,
  extraEntryIds: string[] = [],
): Promise<TestSheetCar[]> {
  const [ruleSet] = await queryTestDb<{ body: string | ClassBody }>(
    databaseUrl,
    `select v.body from events e join rule_set_versions v on v.id = e.rule_set_version_id
      where e.id = ?`,
    [eventId],
  );
  const body =
    typeof ruleSet?.body === "string" ? (JSON.parse(ruleSet.body) as ClassBody) : ruleSet?.body;
  const classes = body?.classes ?? [];
  const extra = extraEntryIds.length > 0 ? extraEntryIds : [""];
  const rows = await queryTestDb<{
    entry_id: string;
    car_number: number;
    class_id: string;
    driver_id: string;
    driver_name: string;
    co_driver_id: string | null;
    co_driver_name: string | null;
  }>(
    databaseUrl,
    `select e.id as entry_id, e.car_number, coalesce(v.final_class, e.declared_class) as class_id,
            d.id as driver_id, d.name as driver_name, c.id as co_driver_id, c.name as co_driver_name
       from entries e
       join users d on d.id = e.driver_id
       left join users c on c.id = e.co_driver_id
       left join verdicts v on v.event_id = e.event_id and v.entry_id = e.id
      where e.event_id = ?
        and (v.status in ('cleared', 'moved-up') or e.id in (${extra.map(() => "?").join(", ")}))
      order by e.car_number`,
    [eventId, ...extra],
  );
  return rows.map((r) => {
    const rank = classes.findIndex((c) => c.id === r.class_id);
    return {
      entryId: r.entry_id,
      carNumber: r.car_number,
      classId: r.class_id,
      className: classes[rank]?.name ?? r.class_id,
      classRank: Math.max(0, rank),
      driver: { key: r.driver_id, name: r.driver_name },
      coDriver: r.co_driver_id ? { key: r.co_driver_id, name: r.co_driver_name ?? "" } : null,
    };
  });
}

/** Store a run sheet as the event's next published version, as the clerk of course (a test's
 *  stand-in for publishing through the clerk's page). Returns the row's id and version. */
export async function insertTestPublication(
  databaseUrl: string,
  { eventId, body, publishedAt }: { eventId: string; body: RunSheet; publishedAt: Date },
): Promise<{ id: string; version: number }> {
  const [clerk] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = 'clerk@brackenmoor.test'",
  );
  const [last] = await queryTestDb<{ version: number | null }>(
    databaseUrl,
    "select max(version) as version from run_group_publications where event_id = ?",
    [eventId],
  );
  const id = randomUUID();
  const version = Number(last?.version ?? 0) + 1;
  await queryTestDb(
    databaseUrl,
    `insert into run_group_publications (id, event_id, version, body, published_by, published_at)
     values (?, ?, ?, ?, ?, ?)`,
    [id, eventId, version, JSON.stringify(body), clerk?.id, publishedAt],
  );
  return { id, version };
}

/** Store one of the clerk of course's marks on a session (a test's stand-in for the call action). */
export async function insertTestSessionCall(
  databaseUrl: string,
  call: {
    eventId: string;
    sessionKey: string;
    state: SessionCallState;
    note: string | null;
    at: Date;
  },
): Promise<string> {
  const [clerk] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = 'clerk@brackenmoor.test'",
  );
  const id = randomUUID();
  await queryTestDb(
    databaseUrl,
    `insert into session_calls
       (id, event_id, session_key, group_name, round, state, note, called_at, called_by)
     select ?, ?, ?, json_unquote(json_extract(p.body, concat('$.groups[', ? - 1, '].name'))), ?,
            ?, ?, ?, ?
       from run_group_publications p where p.event_id = ? order by p.version desc limit 1`,
    [
      id,
      call.eventId,
      call.sessionKey,
      Number(call.sessionKey.split("-")[1]),
      Number(call.sessionKey.split("-")[0]),
      call.state,
      call.note,
      call.at,
      clerk?.id,
      call.eventId,
    ],
  );
  return id;
}

/** Take a test's publications and session calls out again. */
export async function removeTestPublications(
  databaseUrl: string,
  { publicationIds, callIds }: { publicationIds: string[]; callIds: string[] },
): Promise<void> {
  for (const id of callIds)
    await queryTestDb(databaseUrl, "delete from session_calls where id = ?", [id]);
  for (const id of publicationIds)
    await queryTestDb(databaseUrl, "delete from run_group_publications where id = ?", [id]);
}
