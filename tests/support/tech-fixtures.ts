import { v7 as uuidv7 } from "uuid";
import { queryTestDb } from "./query-test-db";

/** The demo event's id, an entry by car number, and an official's user id, from the test database. */
export async function techFixtures(databaseUrl: string) {
  const [event] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from events order by event_date limit 1",
  );
  if (!event) throw new Error("no event in the test database");
  const entryByNumber = async (carNumber: number) => {
    const [row] = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from entries where event_id = ? and car_number = ?",
      [event.id, carNumber],
    );
    if (!row) throw new Error(`no car ${carNumber}`);
    return row.id;
  };
  const entryNumbers = async () =>
    (
      await queryTestDb<{ id: string; car_number: number }>(
        databaseUrl,
        "select id, car_number from entries where event_id = ? order by car_number",
        [event.id],
      )
    ).map((r) => ({ id: r.id, carNumber: r.car_number }));
  const userId = async (email: string) => {
    const [row] = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from users where email = ?",
      [email],
    );
    if (!row) throw new Error(`no user ${email}`);
    return row.id;
  };
  return { eventId: event.id, entryByNumber, entryNumbers, userId };
}

/** A reading record as a phone makes it (test data for the transport, not a trade value). */
export function readingRecord(opts: {
  entryId: string;
  officialId: string;
  deviceId: string;
  dimension: string;
  valueMm: number;
  uncertaintyMm?: number;
  at?: Date;
}) {
  const at = opts.at ?? new Date();
  return {
    id: uuidv7({ msecs: at.getTime() }),
    kind: "reading",
    entryId: opts.entryId,
    officialId: opts.officialId,
    deviceId: opts.deviceId,
    deviceTime: at.toISOString(),
    payload: {
      dimension: opts.dimension,
      value: opts.valueMm,
      instrument: {
        id: "tape",
        name: "Steel tape",
        standardUncertainty: opts.uncertaintyMm ?? 0.5,
      },
      conditions: { levelPad: true },
    },
  };
}

/** Count stored records with these ids. */
export async function countRecords(databaseUrl: string, ids: string[]): Promise<number> {
  if (ids.length === 0) return 0;
  const rows = await queryTestDb<{ n: number }>(
    databaseUrl,
    `select count(*) as n from records where id in (${ids.map(() => "?").join(",")})`,
    ids,
  );
  return Number(rows[0]?.n ?? 0);
}
