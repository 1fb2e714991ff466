// One sync batch as a phone's outbox sends it: fresh reading records (new UUID v7 ids, dated now)
// for a few cars, made the way the integration tests make them (tests/support/tech-fixtures.ts).
import { readingRecord } from "../../tests/support/tech-fixtures";
import { BATCH_SIZE } from "./bench-options";

/** The readings of one car's aero sheet, at plausible sizes (transport test data, not trade values). */
const SHEET: ReadonlyArray<[dimension: string, valueMm: number]> = [
  ["roofPeakFromGroundMm", 1340],
  ["wingTopFromGroundMm", 1560],
  ["wingOverhangMm", 90],
  ["bodyWidthMm", 1760],
  ["wingSpanMm", 1750],
  ["wingChordMm", 260],
];

export type SyncRecord = ReturnType<typeof readingRecord>;

/**
 * `size` records spread evenly over `entryIds` (one car's share in a row, as a scrutineer
 * measures a car through), made by `officialId` on `deviceId` at `at`.
 */
export function makeSyncBatch(opts: {
  entryIds: readonly string[];
  officialId: string;
  deviceId: string;
  size?: number;
  at?: Date;
}): SyncRecord[] {
  const size = opts.size ?? BATCH_SIZE;
  const at = opts.at ?? new Date();
  const perCar = Math.ceil(size / opts.entryIds.length);
  const records: SyncRecord[] = [];
  for (let i = 0; i < size; i += 1) {
    const entryId = opts.entryIds[Math.floor(i / perCar)] ?? opts.entryIds[0];
    const slot = SHEET[i % SHEET.length];
    if (entryId === undefined || slot === undefined) throw new Error("no car for the batch");
    records.push(
      readingRecord({
        entryId,
        officialId: opts.officialId,
        deviceId: opts.deviceId,
        dimension: slot[0],
        // Repeat readings scatter by a few tenths, as a tape read twice does.
        valueMm: slot[1] + ((i * 7) % 10) / 10,
        at: new Date(at.getTime() - (size - i)),
      }),
    );
  }
  return records;
}

/** The JSON body of POST /api/events/<id>/sync. */
export function syncBody(deviceId: string, records: readonly SyncRecord[]): string {
  return JSON.stringify({ deviceId, records });
}
