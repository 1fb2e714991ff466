import { queryTestDb } from "../../tests/support/query-test-db";
import { e2eDatabaseUrl } from "./e2e-database-url";

/**
 * For each entry, from the server's database: when its stored verdict was computed and when the
 * latest of its records was received (ms; null when there is none). A verdict is fresh when it
 * was computed at or after the latest receive time.
 */
export async function serverVerdictTimes(
  entryIds: string[],
): Promise<Record<string, { computedAt: number | null; lastReceivedAt: number | null }>> {
  const marks = entryIds.map(() => "?").join(", ");
  const rows = await queryTestDb<{
    id: string;
    computed_at: Date | null;
    received_at: Date | null;
  }>(
    e2eDatabaseUrl(),
    `select e.id,
            (select v.computed_at from verdicts v where v.entry_id = e.id) as computed_at,
            (select max(r.received_at) from records r where r.entry_id = e.id) as received_at
       from entries e where e.id in (${marks})`,
    entryIds,
  );
  return Object.fromEntries(
    rows.map((r) => [
      r.id,
      {
        computedAt: r.computed_at ? r.computed_at.getTime() : null,
        lastReceivedAt: r.received_at ? r.received_at.getTime() : null,
      },
    ]),
  );
}
