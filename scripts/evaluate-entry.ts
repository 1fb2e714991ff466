// Evaluate one entry from a JSON file and print the verdict as JSON.
//   npx tsx scripts/evaluate-entry.ts input.json     (input: see evaluateEntryInputSchema)
//   npx tsx scripts/evaluate-entry.ts -              (read the input from stdin)
//   npx tsx scripts/evaluate-entry.ts --example      (print an example input for the demo rule set)
// Exit codes: 0 verdict printed; 64 usage; 65 input failed validation; 66 file unreadable or not JSON.
import { readFileSync } from "node:fs";
import { z } from "zod";
import { demoRuleSet } from "../db/seed/demo-rule-set";
import { evaluateEntry } from "../lib/scrutineer/verdicts/evaluate-entry";
import {
  type EvaluateEntryInputRaw,
  evaluateEntryInputSchema,
} from "../lib/scrutineer/verdicts/evaluate-entry-input-schema";

function example(): EvaluateEntryInputRaw {
  const at = (n: number) => ({
    id: `01960000-0000-7000-8000-${n.toString(16).padStart(12, "0")}`,
    entryId: "entry-17",
    officialId: "scrutineer-dev",
    deviceId: "phone-3",
    deviceTime: `2026-05-16T08:${String(10 + n).padStart(2, "0")}:00+01:00`,
  });
  const tape = { id: "tape-2", name: "5 m steel tape", standardUncertainty: 1 };
  const gauge = { id: "gauge-1", name: "Height gauge", standardUncertainty: 0.5 };
  const scale = { id: "scales-1", name: "Corner scales", standardUncertainty: 0.5 };
  return {
    ruleSet: demoRuleSet,
    entry: {
      entryId: "entry-17",
      declaredClassId: "merlin",
      declarations: {
        aero: { wing: true, splitter: true, diffuser: false },
        dynoSheet: {
          power: { value: 231, unit: "hp" },
          measuredAt: "wheel",
          correction: "sae-j1349",
          date: "2025-08-30",
        },
        tyres: { kind: "graded", treadwear: 200 },
        modificationPoints: 18,
        driverWeightKg: 82,
      },
    },
    records: [
      {
        ...at(1),
        kind: "reading",
        payload: { dimension: "wingTopFromGroundMm", value: 1395, instrument: gauge },
      },
      {
        ...at(2),
        kind: "reading",
        payload: { dimension: "roofPeakFromGroundMm", value: 1302, instrument: gauge },
      },
      {
        ...at(3),
        kind: "reading",
        payload: { dimension: "wingOverhangMm", value: 96, instrument: tape },
      },
      {
        ...at(4),
        kind: "reading",
        payload: { dimension: "wingSpanMm", value: 1640, instrument: tape },
      },
      {
        ...at(5),
        kind: "reading",
        payload: { dimension: "bodyWidthMm", value: 1725, instrument: tape },
      },
      {
        ...at(6),
        kind: "reading",
        payload: { dimension: "wingChordMm", value: 280, instrument: tape },
      },
      {
        ...at(7),
        kind: "reading",
        payload: { dimension: "splitterProtrusionMm", value: 60, instrument: tape },
      },
      {
        ...at(8),
        kind: "reading",
        payload: { dimension: "splitterWidthMm", value: 1700, instrument: tape },
      },
      {
        ...at(9),
        kind: "reading",
        payload: { dimension: "cornerWeightKg", corner: "lf", value: 352, instrument: scale },
      },
      {
        ...at(10),
        kind: "reading",
        payload: { dimension: "cornerWeightKg", corner: "rf", value: 340, instrument: scale },
      },
      {
        ...at(11),
        kind: "reading",
        payload: { dimension: "cornerWeightKg", corner: "lr", value: 301, instrument: scale },
      },
      {
        ...at(12),
        kind: "reading",
        payload: { dimension: "cornerWeightKg", corner: "rr", value: 296, instrument: scale },
      },
      {
        ...at(13),
        kind: "reading",
        payload: {
          dimension: "noiseDbA",
          value: 101.2,
          instrument: { id: "meter-1", name: "Sound level meter", standardUncertainty: 0.7 },
        },
      },
      {
        ...at(14),
        kind: "checklist",
        payload: {
          itemId: "harness",
          result: "pass",
          equipment: {
            standardId: "fia-8853-2016",
            label: { form: "manufacture-year", year: 2022 },
          },
        },
      },
      {
        ...at(15),
        kind: "checklist",
        payload: {
          itemId: "helmet",
          result: "pass",
          equipment: { standardId: "snell-sa2015", label: { form: "standard-only" } },
        },
      },
      { ...at(16), kind: "checklist", payload: { itemId: "battery", result: "pass" } },
      {
        ...at(17),
        kind: "checklist",
        payload: {
          itemId: "seat",
          result: "pass",
          equipment: {
            standardId: "fia-8862-2009",
            label: { form: "manufacture-year", year: 2019 },
          },
        },
      },
      {
        ...at(18),
        kind: "checklist",
        payload: {
          itemId: "extinguisher",
          result: "pass",
          equipment: {
            standardId: "extinguisher-service",
            label: { form: "date", date: "2025-03-12" },
          },
        },
      },
      { ...at(19), kind: "checklist", payload: { itemId: "kill-switch", result: "pass" } },
      { ...at(20), kind: "checklist", payload: { itemId: "towing-eyes", result: "pass" } },
      { ...at(21), kind: "checklist", payload: { itemId: "catch-tank", result: "not-applicable" } },
      { ...at(22), kind: "checklist", payload: { itemId: "roll-cage", result: "pass" } },
      { ...at(23), kind: "checklist", payload: { itemId: "window-net", result: "not-applicable" } },
      { ...at(24), kind: "checklist", payload: { itemId: "transponder", result: "pass" } },
    ],
    eventDate: "2026-05-16",
    display: { length: "mm" },
  };
}

function readInput(path: string): unknown {
  try {
    return JSON.parse(readFileSync(path === "-" ? 0 : path, "utf8"));
  } catch (error) {
    console.error(
      `Cannot read ${path === "-" ? "stdin" : path} as JSON: ${error instanceof Error ? error.message : String(error)}`,
    );
    process.exit(66);
  }
}

const arg = process.argv[2];
if (arg === undefined || arg === "--help" || arg === "-h") {
  console.error("Usage: npx tsx scripts/evaluate-entry.ts <input.json | - | --example>");
  process.exit(arg === undefined ? 64 : 0);
}
if (arg === "--example") {
  process.stdout.write(`${JSON.stringify(example(), null, 2)}\n`);
  process.exit(0);
}
const parsed = evaluateEntryInputSchema.safeParse(readInput(arg));
if (!parsed.success) {
  console.error(z.prettifyError(parsed.error));
  process.exit(65);
}
process.stdout.write(`${JSON.stringify(evaluateEntry(parsed.data), null, 2)}\n`);
