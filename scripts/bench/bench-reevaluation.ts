// P3: re-evaluating every entry with the engine ÷ reading their records from MariaDB in one
// query (the engine bench and its database half, scripts/bench-engine.ts and bench-db-read.ts).
import { evaluateEntryInputSchema } from "../../lib/scrutineer/verdicts/evaluate-entry-input-schema";
import { measureDbRead } from "../bench-db-read";
import { buildBenchEntries, runEngineBench } from "../bench-engine";
import type { BenchSizes } from "./bench-options";
import { type Figure, type FigureRun, makeFigure } from "./figure";

const SEED = 20260516;
const READINGS_PER_ENTRY = 12;

export async function benchReevaluation(opts: {
  sizes: BenchSizes;
  log: (line: string) => void;
}): Promise<Figure> {
  const { sizes } = opts;
  const engine = runEngineBench({
    entries: sizes.engineEntries,
    readingsPerEntry: READINGS_PER_ENTRY,
    repetitions: sizes.repetitions,
    seed: SEED,
  });
  const inputs = buildBenchEntries({
    entries: sizes.engineEntries,
    readingsPerEntry: READINGS_PER_ENTRY,
    seed: SEED,
    checklistAnswers: true,
  }).map((r) => evaluateEntryInputSchema.parse(r));
  const db = await measureDbRead(inputs, sizes.repetitions);
  const runs: FigureRun[] = engine.runs.map((run, i) => {
    const readMs = db.allAtOnceRuns[i] ?? Number.NaN;
    return {
      value: run.ms / readMs,
      detail: {
        evaluateMs: Number(run.ms.toFixed(1)),
        readOneQueryMs: Number(readMs.toFixed(1)),
        entriesPerSecond: Math.round(run.entriesPerSecond),
        recordRows: db.rows,
      },
    };
  });
  runs.forEach((r, i) => {
    opts.log(
      `P3 run ${i + 1}: evaluate ${r.detail.evaluateMs} ms, read ${r.detail.readOneQueryMs} ms (${db.rows} rows)`,
    );
  });
  return makeFigure(
    {
      id: "P3",
      label: "re-evaluate/read",
      unit: "ratio",
      target: null,
      definition: `evaluateEntry over ${sizes.engineEntries} synthetic entries (${engine.recordsPerEntry} records each, inputs validated beforehand) ÷ reading their ${db.rows} records from MariaDB in one query (mysql2 + Drizzle, parsed as the server parses them), in the bench process`,
    },
    runs,
  );
}
