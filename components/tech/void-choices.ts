import { DIMENSION_LABELS, dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import type { Dimension, TechRecord, TechRecordOf } from "@/lib/scrutineer/records/record-schema";
import { voidedRecordIds } from "@/lib/scrutineer/records/voided-record-ids";
import { formatClockTime } from "@/lib/tech/format-clock-time";
import { formatReadingValue } from "./format-reading-value";
import { sentenceCase } from "./sentence-case";

/** One reading or checklist answer the chief scrutineer may void. */
export type VoidChoice = { id: string; label: string; voided: boolean };
/** Records of one kind: one dimension's readings, or the checklist answers. */
export type VoidGroup = { key: string; label: string; choices: VoidChoice[] };

const RESULT_WORDS = { pass: "pass", fail: "fail", "not-applicable": "not applicable" } as const;
const DIMENSION_ORDER = Object.keys(DIMENSION_LABELS) as Dimension[];

/**
 * An entry's readings and checklist answers for the void list, grouped by kind (each dimension,
 * then the checklist), newest first by device time, each as people say it — "Wing overhang
 * 150.5 mm — Dev Patel, 10:42:07" — with the ones already void marked.
 */
export function voidChoices(args: {
  records: ReadonlyArray<TechRecord>;
  checklistLabel: (itemId: string) => string | undefined;
  officialName: (officialId: string) => string | undefined;
  unitSystem: "mm" | "in";
  timeZone: string;
}): VoidGroup[] {
  // The engine's own void rule: a void counts unless it is itself voided; loops count as none.
  const voided = voidedRecordIds(args.records);
  const byAt = (a: TechRecord, b: TechRecord) =>
    Date.parse(b.deviceTime) - Date.parse(a.deviceTime) || (a.id < b.id ? 1 : -1);
  const tail = (r: TechRecord) =>
    ` — ${args.officialName(r.officialId) ?? "an official no longer listed"}, ${formatClockTime(r.deviceTime, args.timeZone)}`;
  const choice = (r: TechRecord, what: string): VoidChoice => ({
    id: r.id,
    label: `${voided.has(r.id) ? "Already void: " : ""}${what}${tail(r)}`,
    voided: voided.has(r.id),
  });
  const groups: VoidGroup[] = [];
  for (const dimension of DIMENSION_ORDER) {
    const readings = args.records
      .filter(
        (r): r is TechRecordOf<"reading"> =>
          r.kind === "reading" && r.payload.dimension === dimension,
      )
      .sort(byAt);
    if (readings.length === 0) continue;
    groups.push({
      key: dimension,
      label: sentenceCase(DIMENSION_LABELS[dimension]),
      choices: readings.map((r) => {
        const corner = "corner" in r.payload ? r.payload.corner : null;
        const value = formatReadingValue(dimension, r.payload.value, args.unitSystem);
        return choice(r, `${sentenceCase(dimensionLabel(dimension, corner))} ${value}`);
      }),
    });
  }
  const answers = args.records
    .filter((r): r is TechRecordOf<"checklist"> => r.kind === "checklist")
    .sort(byAt);
  if (answers.length > 0) {
    groups.push({
      key: "checklist",
      label: "Safety checklist",
      choices: answers.map((r) => {
        const item = args.checklistLabel(r.payload.itemId) ?? `Item "${r.payload.itemId}"`;
        return choice(r, `${sentenceCase(item)}: ${RESULT_WORDS[r.payload.result]}`);
      }),
    });
  }
  return groups;
}
