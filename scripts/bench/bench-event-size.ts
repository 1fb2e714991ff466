// P7: a large event against the 40-entry demo. (a) one batch's sync time in each — it should not
// grow with the event; (b) the event pack a phone downloads in full, and a partial refresh
// (?since=<recordsCursor> with If-None-Match) after another phone synced one batch, in bytes
// unpacked and gzipped.
import type { Pool, RowDataPacket } from "mysql2/promise";
import { createDb } from "../../db/client";
import { BATCH_SIZE, type BenchSizes } from "./bench-options";
import type { Official } from "./bench-phone-burst";
import { fetchPack, type PackFetch } from "./fetch-pack";
import { type Figure, type FigureRun, makeFigure } from "./figure";
import { postPhoneBatch } from "./post-phone-batch";
import { seedLargeEvent } from "./seed-large-event";
import { percentile } from "./summarize";
import { type StoredBatch, waitForStoredVerdicts } from "./wait-for-stored-verdicts";

type Sizes = { full: PackFetch; partial: PackFetch; partialRecords: number };

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

async function countMails(pool: Pool, eventId: string, since: Date): Promise<number> {
  const [rows] = await pool.query<RowDataPacket[]>(
    "select count(*) as n from mail_log where event_id = ? and created_at >= ?",
    [eventId, since],
  );
  return Number(rows[0]?.n ?? 0);
}

/** The event's cars that are through the tech line and cleared (or moved up). */
async function clearedCars(pool: Pool, eventId: string): Promise<string[]> {
  const [rows] = await pool.query<RowDataPacket[]>(
    `select entry_id as id from verdicts where event_id = ? and status in ('cleared', 'moved-up')
      order by entry_id`,
    [eventId],
  );
  return rows.map((r) => String(r.id));
}

export async function benchEventSize(opts: {
  appUrl: string;
  pool: Pool;
  demoEventId: string;
  /** Makes the timed batches and reads the packs. */
  phone: Official;
  /** Another phone, whose batch the partial refresh brings. */
  otherPhone: Official;
  sizes: BenchSizes;
  log: (line: string) => void;
}): Promise<Figure[]> {
  const { sizes } = opts;
  const seedStarted = performance.now();
  const large = await seedLargeEvent(createDb(opts.pool), {
    demoEventId: opts.demoEventId,
    officials: [opts.phone.officialId, opts.otherPhone.officialId],
    entries: sizes.largeEventEntries,
    recordsPerEntry: sizes.largeEventRecordsPerEntry,
  });
  opts.log(
    `P7: seeded an event of ${sizes.largeEventEntries} entries, ${large.records} records, in ${((performance.now() - seedStarted) / 1000).toFixed(1)} s`,
  );
  // Both events' batches go to as many cleared cars, in the same turn: a batch that changes a
  // verdict costs more (an e-mail, sent within the request where no worker runs), so each
  // event must see as many first visits as the other.
  const demoCars = await clearedCars(opts.pool, opts.demoEventId);
  const largeCars = await clearedCars(opts.pool, large.eventId);
  const carCount = Math.min(demoCars.length, largeCars.length);
  const events = [
    { name: "demo", eventId: opts.demoEventId, cars: demoCars.slice(0, carCount) },
    { name: "large", eventId: large.eventId, cars: largeCars.slice(0, carCount) },
  ] as const;
  const cookie = opts.phone.session.cookieHeader();
  const turn = new Map<string, number>();
  const phoneFor = (official: Official, cars: readonly string[], deviceId: string) => {
    const k = turn.get(deviceId + cars[0]) ?? 0;
    turn.set(deviceId + cars[0], k + 1);
    const first = (2 * k) % cars.length;
    return {
      ...official,
      deviceId,
      entryIds: [cars[first] ?? "", cars[(first + 1) % cars.length] ?? ""],
    };
  };
  // Warm up both events' pack and sync paths (the first pack also makes the event's pass key).
  const untimed: StoredBatch[] = [];
  const lastWrite = new Map<string, number>();
  let cursorLagMs = 0;
  for (const e of events) {
    const pack = await fetchPack({ appUrl: opts.appUrl, eventId: e.eventId, cookie });
    // The cursor trails the pack's own time (a safety margin): a partial carries whatever was
    // received in that margin before the full pack too.
    const lag =
      Date.parse(pack.body?.generatedAt ?? "") - Date.parse(pack.body?.recordsCursor ?? "");
    if (Number.isFinite(lag)) cursorLagMs = Math.min(60_000, Math.max(cursorLagMs, lag));
    const warm = await postPhoneBatch(e.eventId, phoneFor(opts.phone, e.cars, "bench-p7-warm"));
    untimed.push({ entryIds: warm.pendingEntryIds, receivedAt: warm.receivedAt });
    lastWrite.set(e.eventId, Date.now());
  }
  // So that every partial carries the other phone's one batch and nothing older, each full pack
  // waits until the event's last write is older than that margin.
  const settle = async (eventId: string) => {
    const wait = (lastWrite.get(eventId) ?? 0) + cursorLagMs + 500 - Date.now();
    if (wait > 0) await new Promise((resolve) => setTimeout(resolve, wait));
  };

  // (b) pack sizes, all repetitions first, before the timed batches add to the events.
  const packRuns: { demo: Sizes; large: Sizes }[] = [];
  for (let rep = 0; rep < sizes.repetitions; rep += 1) {
    const got: Partial<Record<"demo" | "large", Sizes>> = {};
    for (const e of events) {
      await settle(e.eventId);
      const full = await fetchPack({ appUrl: opts.appUrl, eventId: e.eventId, cookie });
      if (full.status !== 200 || !full.body?.recordsCursor || !full.etag)
        throw new Error(`P7: the ${e.name} event's pack answered ${full.status}`);
      const other = await postPhoneBatch(
        e.eventId,
        phoneFor(opts.otherPhone, e.cars, "bench-p7-other-phone"),
      );
      if (!other.ok) throw new Error(`P7: the other phone's batch failed: ${other.problem}`);
      untimed.push({ entryIds: other.pendingEntryIds, receivedAt: other.receivedAt });
      lastWrite.set(e.eventId, Date.now());
      const partial = await fetchPack({
        appUrl: opts.appUrl,
        eventId: e.eventId,
        cookie,
        since: full.body.recordsCursor,
        ifNoneMatch: full.etag,
        phoneHas: {
          entriesTag: full.body.entriesTag,
          ruleSetVersionId: full.body.ruleSetVersionId,
        },
      });
      if (partial.status !== 200)
        throw new Error(`P7: the ${e.name} event's partial pack answered ${partial.status}`);
      got[e.name] = { full, partial, partialRecords: partial.body?.records?.length ?? 0 };
    }
    if (!got.demo || !got.large) throw new Error("P7: a pack is missing");
    packRuns.push({ demo: got.demo, large: got.large });
    opts.log(
      `P7b run ${rep + 1}: full pack demo ${kb(got.demo.full.rawBytes)} (${kb(got.demo.full.gzipBytes)} gzip), ${sizes.largeEventEntries} entries ${kb(got.large.full.rawBytes)} (${kb(got.large.full.gzipBytes)} gzip); partial demo ${kb(got.demo.partial.rawBytes)} (${kb(got.demo.partial.gzipBytes)}), ${sizes.largeEventEntries} entries ${kb(got.large.partial.rawBytes)} (${kb(got.large.partial.gzipBytes)})`,
    );
  }

  // (a) one batch's sync time in each event, the order alternating between repetitions.
  await waitForStoredVerdicts(opts.pool, untimed);
  const syncRuns: FigureRun[] = [];
  for (let rep = 0; rep < sizes.repetitions; rep += 1) {
    const p50: Record<string, number> = {};
    const mails: Record<string, number> = {};
    const order = rep % 2 === 0 ? events : [...events].reverse();
    for (const e of order) {
      const times: number[] = [];
      const stored: StoredBatch[] = [];
      const phaseStarted = new Date();
      for (let i = 0; i < sizes.eventSyncBatches; i += 1) {
        const phone = phoneFor(opts.phone, e.cars, "bench-p7-phone");
        const answer = await postPhoneBatch(e.eventId, phone);
        if (!answer.ok)
          throw new Error(`P7: a batch to the ${e.name} event failed: ${answer.problem}`);
        times.push(answer.ms);
        stored.push({ entryIds: answer.pendingEntryIds, receivedAt: answer.receivedAt });
      }
      // A queued recompute still running would load the other event's batches.
      await waitForStoredVerdicts(opts.pool, stored);
      p50[e.name] = percentile(times, 50);
      // Verdict e-mails these batches caused (sent inside the sync request where no worker runs).
      mails[e.name] = await countMails(opts.pool, e.eventId, phaseStarted);
    }
    const demoMs = p50.demo ?? Number.NaN;
    const largeMs = p50.large ?? Number.NaN;
    syncRuns.push({
      value: largeMs / demoMs,
      detail: {
        demoP50Ms: Math.round(demoMs),
        largeP50Ms: Math.round(largeMs),
        demoMails: mails.demo ?? 0,
        largeMails: mails.large ?? 0,
      },
    });
    opts.log(
      `P7a run ${rep + 1}: one batch p50 demo ${Math.round(demoMs)} ms (${mails.demo} verdict mails), ${sizes.largeEventEntries} entries ${Math.round(largeMs)} ms (${mails.large} mails)`,
    );
  }

  const n = sizes.largeEventEntries;
  const packFigure = (
    id: string,
    label: string,
    pick: (s: Sizes) => number,
    what: string,
  ): Figure => {
    const runs = packRuns.map((r) => ({
      value: pick(r.large) / pick(r.demo),
      detail: {
        demoBytes: pick(r.demo),
        largeBytes: pick(r.large),
        demoPartialRecords: r.demo.partialRecords,
        largePartialRecords: r.large.partialRecords,
      },
    }));
    const mid = packRuns[Math.floor((packRuns.length - 1) / 2)];
    return {
      ...makeFigure(
        {
          id,
          label,
          unit: "ratio",
          target: null,
          definition: `${what}, event of ${n} entries × ${sizes.largeEventRecordsPerEntry} records ÷ the 40-entry demo`,
        },
        runs,
      ),
      note: mid ? `demo ${kb(pick(mid.demo))}, ${n} entries ${kb(pick(mid.large))}` : undefined,
    };
  };
  const partialWords = `GET /api/events/<id>/pack?format=2&since=<recordsCursor>&entries=<entriesTag>&rules=<rule-set version> with If-None-Match (as the tech line asks) after another phone synced one batch of ${BATCH_SIZE}`;
  return [
    makeFigure(
      {
        id: "P7a",
        label: `one batch sync ${n}/40 entries`,
        unit: "ratio",
        target: { op: "≈", value: 1 },
        definition: `p50 of ${sizes.eventSyncBatches} sequential batches of ${BATCH_SIZE} records (2 cleared cars each, the same number of cars taken in the same turn in both events) into an event of ${n} entries ÷ the same into the 40-entry demo; should not grow with the event`,
      },
      syncRuns,
    ),
    packFigure(
      "P7b full",
      `full pack ${n}/40 entries`,
      (s) => s.full.rawBytes,
      "GET /api/events/<id>/pack, bytes of JSON",
    ),
    packFigure(
      "P7b full gz",
      `full pack gzip ${n}/40`,
      (s) => s.full.gzipBytes,
      "the same, gzip bytes",
    ),
    packFigure("P7b partial", `partial pack ${n}/40`, (s) => s.partial.rawBytes, partialWords),
    packFigure(
      "P7b partial gz",
      `partial pack gzip ${n}/40`,
      (s) => s.partial.gzipBytes,
      `${partialWords}, gzip bytes`,
    ),
  ];
}
