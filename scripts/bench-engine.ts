// Benchmark of the scrutineering engine (npm run bench:engine): evaluates synthetic entries
// built from a seeded pseudo-random generator and prints entries per second. Not a timed test.
// runEngineBench() returns the figures so the database comparison can be added beside it.
import { pathToFileURL } from "node:url";
import { demoRuleSet } from "../db/seed/demo-rule-set";
import type { Corner, LengthDimension, TechRecord } from "../lib/scrutineer/records/record-schema";
import type { EquipmentLabel, LabelForm } from "../lib/scrutineer/safety/equipment-label-schema";
import { evaluateEntry } from "../lib/scrutineer/verdicts/evaluate-entry";
import {
  type EvaluateEntryInput,
  evaluateEntryInputSchema,
} from "../lib/scrutineer/verdicts/evaluate-entry-input-schema";
import type { VerdictStatus } from "../lib/scrutineer/verdicts/verdict-schema";

/** What to build and how often to run it. */
export type EngineBenchOptions = {
  entries?: number;
  /** Readings per entry; the first 12 form a full tech sheet, extra ones repeat dimensions. */
  readingsPerEntry?: number;
  repetitions?: number;
  seed?: number;
  /** Also answer every checklist item (pass, labels in date), so verdicts are not all "waiting". */
  checklistAnswers?: boolean;
};

/** The figures one bench run produces. */
export type EngineBenchResult = {
  entries: number;
  readingsPerEntry: number;
  /** All records per entry (readings plus checklist answers): the rows a database would return. */
  recordsPerEntry: number;
  repetitions: number;
  /** One per repetition: evaluateEntry over every entry (inputs already validated). */
  runs: Array<{ ms: number; entriesPerSecond: number }>;
  medianEntriesPerSecond: number;
  /** One pass that validates each input with the zod schema first, as the sync endpoint would. */
  validateAndEvaluateEntriesPerSecond: number;
  statusCounts: Record<VerdictStatus, number>;
};

/** mulberry32: a small seeded generator, so every run builds the same entries. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function uuid7(entry: number, n: number): string {
  const ms = (1_747_382_400_000 + entry * 1000 + n).toString(16).padStart(12, "0");
  const tail = (entry * 1000 + n).toString(16).padStart(12, "0");
  return `${ms.slice(0, 8)}-${ms.slice(8, 12)}-7000-8000-${tail}`;
}

/** Twelve readings: a full demo tech sheet (no splitter) plus a second wing-top reading. */
const SHEET: ReadonlyArray<[LengthDimension | "cornerWeightKg" | "noiseDbA", Corner | null]> = [
  ["wingTopFromGroundMm", null],
  ["roofPeakFromGroundMm", null],
  ["wingOverhangMm", null],
  ["wingSpanMm", null],
  ["bodyWidthMm", null],
  ["wingChordMm", null],
  ["noiseDbA", null],
  ["cornerWeightKg", "lf"],
  ["cornerWeightKg", "rf"],
  ["cornerWeightKg", "lr"],
  ["cornerWeightKg", "rr"],
  ["wingTopFromGroundMm", null],
];

function labelFor(form: LabelForm): EquipmentLabel {
  switch (form) {
    case "not-valid-after-year":
      return { form, year: 2028 };
    case "manufacture-year":
      return { form, year: 2024 };
    case "manufacture-month":
      return { form, year: 2024, month: 3 };
    case "date":
      return { form, date: "2025-06-01" };
    case "standard-only":
      return { form };
  }
}

/** A passing answer for every checklist item of the demo rule set, labels in date on 2026-05-16. */
function checklistRecords(entry: number, entryId: string, firstN: number): TechRecord[] {
  const standards = new Map(demoRuleSet.safety.standards.map((s) => [s.id, s]));
  return demoRuleSet.safety.checklist.map((item, i): TechRecord => {
    const standardId = item.equipment?.acceptedStandardIds[0];
    const standard = standardId === undefined ? undefined : standards.get(standardId);
    return {
      id: uuid7(entry, firstN + i),
      entryId,
      officialId: "scrutineer-0",
      deviceId: `phone-${entry % 7}`,
      deviceTime: "2026-05-16T09:30:00+01:00",
      kind: "checklist",
      payload: {
        itemId: item.id,
        result: "pass",
        ...(standard === undefined
          ? {}
          : { equipment: { standardId: standard.id, label: labelFor(standard.labelForm) } }),
      },
    };
  });
}

/** Builds evaluateEntry inputs (not yet validated): synthetic cars on the demo rule set. */
export function buildBenchEntries(
  options: Required<
    Pick<EngineBenchOptions, "entries" | "readingsPerEntry" | "seed" | "checklistAnswers">
  >,
): unknown[] {
  const random = seededRandom(options.seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * random();
  const classIds = demoRuleSet.classes.map((c) => c.id);
  const out: unknown[] = [];
  for (let e = 0; e < options.entries; e += 1) {
    const entryId = `bench-${e}`;
    const roof = between(1250, 1400);
    const body = between(1700, 1850);
    const nominal: Record<string, number> = {
      wingTopFromGroundMm: roof + between(-20, 260),
      roofPeakFromGroundMm: roof,
      wingOverhangMm: between(-40, 240),
      wingSpanMm: body + between(-120, 70),
      bodyWidthMm: body,
      wingChordMm: between(180, 380),
      noiseDbA: between(96, 107),
    };
    const records: TechRecord[] = [];
    for (let r = 0; r < options.readingsPerEntry; r += 1) {
      const slot = SHEET[r % SHEET.length];
      if (slot === undefined) continue;
      const [dimension, corner] = slot;
      const header = {
        id: uuid7(e, r),
        entryId,
        officialId: `scrutineer-${r % 2}`,
        deviceId: `phone-${e % 7}`,
        deviceTime: "2026-05-16T09:00:00+01:00",
      };
      if (dimension === "cornerWeightKg" && corner !== null) {
        const value = between(250, 380);
        records.push({
          ...header,
          kind: "reading",
          payload: {
            dimension,
            corner,
            value,
            instrument: { id: "scales", name: "Corner scales", standardUncertainty: 0.5 },
          },
        });
      } else if (dimension !== "cornerWeightKg") {
        // Repeated readings scatter by ±1.5 around the car's true value; overhang may be negative.
        const raw = (nominal[dimension] ?? 0) + between(-1.5, 1.5);
        const value = dimension === "wingOverhangMm" ? raw : Math.max(0, raw);
        const instrument =
          dimension === "noiseDbA"
            ? { id: "meter", name: "Sound level meter", standardUncertainty: 0.7 }
            : { id: "tape", name: "Steel tape", standardUncertainty: 1 };
        records.push({ ...header, kind: "reading", payload: { dimension, value, instrument } });
      }
    }
    if (options.checklistAnswers)
      records.push(...checklistRecords(e, entryId, options.readingsPerEntry));
    out.push({
      ruleSet: demoRuleSet,
      entry: {
        entryId,
        declaredClassId: classIds[Math.floor(random() * classIds.length)] ?? "kestrel",
        declarations: {
          aero: { wing: true, splitter: false, diffuser: random() < 0.5 },
          dynoSheet: {
            power: { value: Math.round(between(120, 450)), unit: "hp" },
            measuredAt: "wheel",
            correction: "sae-j1349",
            date: "2025-06-01",
          },
          tyres:
            random() < 0.2
              ? { kind: "no-grade" }
              : { kind: "graded", treadwear: Math.round(between(60, 400)) },
          modificationPoints: Math.round(between(0, 60)),
          driverWeightKg: Math.round(between(60, 110)),
        },
      },
      records,
      eventDate: "2026-05-16",
      display: { length: e % 3 === 0 ? "in" : "mm" },
    });
  }
  return out;
}

/** Builds the entries, evaluates them `repetitions` times and returns the figures. */
export function runEngineBench(options: EngineBenchOptions = {}): EngineBenchResult {
  const entries = options.entries ?? 1000;
  const readingsPerEntry = options.readingsPerEntry ?? 12;
  const repetitions = options.repetitions ?? 5;
  const checklistAnswers = options.checklistAnswers ?? true;
  const raw = buildBenchEntries({
    entries,
    readingsPerEntry,
    seed: options.seed ?? 20260516,
    checklistAnswers,
  });
  const inputs: EvaluateEntryInput[] = raw.map((r) => evaluateEntryInputSchema.parse(r));
  const statusCounts: Record<VerdictStatus, number> = {
    waiting: 0,
    cleared: 0,
    "moved-up": 0,
    "re-measure": 0,
    held: 0,
  };
  for (const input of inputs) statusCounts[evaluateEntry(input).status] += 1; // warm-up, and the mix
  const runs: EngineBenchResult["runs"] = [];
  for (let rep = 0; rep < repetitions; rep += 1) {
    const started = performance.now();
    for (const input of inputs) evaluateEntry(input);
    const ms = performance.now() - started;
    runs.push({ ms, entriesPerSecond: (entries / ms) * 1000 });
  }
  const sorted = runs.map((r) => r.entriesPerSecond).sort((a, b) => a - b);
  const started = performance.now();
  for (const r of raw) evaluateEntry(evaluateEntryInputSchema.parse(r));
  const validateMs = performance.now() - started;
  return {
    entries,
    readingsPerEntry,
    recordsPerEntry:
      readingsPerEntry + (checklistAnswers ? demoRuleSet.safety.checklist.length : 0),
    repetitions,
    runs,
    medianEntriesPerSecond: sorted[Math.floor(sorted.length / 2)] ?? 0,
    validateAndEvaluateEntriesPerSecond: (entries / validateMs) * 1000,
    statusCounts,
  };
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const result = runEngineBench();
  console.log(
    `[bench:engine] ${result.entries} entries × ${result.readingsPerEntry} readings (${result.recordsPerEntry} records with the checklist answers), demo rule set`,
  );
  result.runs.forEach((r, i) => {
    console.log(
      `  run ${i + 1}: ${r.ms.toFixed(1)} ms  ${Math.round(r.entriesPerSecond).toLocaleString("en-GB")} entries/s`,
    );
  });
  console.log(
    `  median: ${Math.round(result.medianEntriesPerSecond).toLocaleString("en-GB")} entries/s`,
  );
  console.log(
    `  with zod validation of each input: ${Math.round(result.validateAndEvaluateEntriesPerSecond).toLocaleString("en-GB")} entries/s`,
  );
  console.log(
    `  verdicts: ${Object.entries(result.statusCounts)
      .map(([s, n]) => `${s} ${n}`)
      .join(", ")}`,
  );
  // The same rows from MariaDB, read as the server reads them, to put the engine's cost in scale.
  const { measureDbRead } = await import("./bench-db-read");
  const inputs = buildBenchEntries({
    entries: result.entries,
    readingsPerEntry: result.readingsPerEntry,
    seed: 20260516,
    checklistAnswers: true,
  }).map((r) => evaluateEntryInputSchema.parse(r));
  const db = await measureDbRead(inputs);
  const evaluateMs = (result.entries / result.medianEntriesPerSecond) * 1000;
  console.log(
    `  MariaDB: ${db.rows.toLocaleString("en-GB")} record rows — one query ${db.allAtOnceMs.toFixed(1)} ms, one query per entry ${db.perEntryMs.toFixed(1)} ms`,
  );
  console.log(
    `  ratio evaluate : read (one query) = ${(evaluateMs / db.allAtOnceMs).toFixed(2)} · evaluate : read (per entry) = ${(evaluateMs / db.perEntryMs).toFixed(2)}`,
  );
}
