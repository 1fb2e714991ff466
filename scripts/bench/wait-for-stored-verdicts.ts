import type { Pool, RowDataPacket } from "mysql2/promise";

export type StoredBatch = { entryIds: readonly string[]; receivedAt: string | Date | null };

/**
 * Wait until every car these batches wrote to has a verdict computed at or after its latest
 * batch's receive time (a worker may still be busy with a burst), so one measurement never
 * runs beside the last one's recomputes and no car is removed while a job is about to recompute
 * it. Bounded: false after `timeoutMs`.
 */
export async function waitForStoredVerdicts(
  pool: Pool,
  batches: readonly StoredBatch[],
  timeoutMs = 30_000,
): Promise<boolean> {
  const wanted = new Map<string, number>();
  for (const b of batches) {
    if (b.receivedAt === null) continue;
    const at = new Date(b.receivedAt).getTime();
    for (const id of b.entryIds) wanted.set(id, Math.max(wanted.get(id) ?? 0, at));
  }
  if (wanted.size === 0) return true;
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const [rows] = await pool.query<RowDataPacket[]>(
      "select entry_id as id, computed_at as at from verdicts where entry_id in (?)",
      [[...wanted.keys()]],
    );
    const computed = new Map(rows.map((r) => [String(r.id), new Date(r.at).getTime()]));
    if ([...wanted].every(([id, at]) => (computed.get(id) ?? -1) >= at)) return true;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return false;
}
