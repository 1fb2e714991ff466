import { CORNER_LABELS, DIMENSION_LABELS } from "@/lib/scrutineer/measurement/dimension-labels";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { formatReadingValue } from "./format-reading-value";
import { sentenceCase } from "./sentence-case";

const answerWords = { pass: "passed", fail: "failed", "not-applicable": "not fitted" } as const;
const decisionWords = { cleared: "Cleared", "moved-up": "Moved up", held: "Held" } as const;

function shorten(text: string, max = 60): string {
  const flat = text.replace(/\s+/g, " ").trim();
  return flat.length <= max ? flat : `${flat.slice(0, max - 1).trimEnd()}…`;
}

type Words = {
  unitSystem: "mm" | "in";
  itemLabel: (itemId: string) => string | undefined;
  className: (classId: string) => string | undefined;
};

/** What the record says, without the car: "Wing overhang 150.5 mm", "Harness passed". */
function describeBody(record: TechRecord, words: Words, target?: TechRecord): string {
  switch (record.kind) {
    case "reading": {
      const p = record.payload;
      const corner = "corner" in p ? `, ${CORNER_LABELS[p.corner]}` : "";
      const what = sentenceCase(`${DIMENSION_LABELS[p.dimension]}${corner}`);
      return `${what} ${formatReadingValue(p.dimension, p.value, words.unitSystem)}`;
    }
    case "checklist": {
      const p = record.payload;
      return `${words.itemLabel(p.itemId) ?? "Checklist item"} ${answerWords[p.result]}`;
    }
    case "photo":
      return `Photo${record.payload.caption ? `: ${shorten(record.payload.caption)}` : ""}`;
    case "note":
      return `Note: “${shorten(record.payload.text)}”`;
    case "void": {
      const of = target && target.kind !== "void" ? ` of “${describeBody(target, words)}”` : "";
      return `Void${of}: ${shorten(record.payload.reason)}`;
    }
    case "override": {
      const p = record.payload;
      const to = p.classId === null ? "" : ` in ${words.className(p.classId) ?? p.classId}`;
      return `Override: ${decisionWords[p.status]}${to}`;
    }
  }
}

/**
 * One outbox line in people's words: "Car 37 · Wing overhang 150.5 mm",
 * "Car 37 · Corner weight, left front 312 kg", "Car 37 · Harness passed",
 * "Car 37 · Void of “Wing overhang 0 mm”: typed the wrong number".
 * @param itemLabel the checklist item's label by id (from the rule set)
 * @param className a class's name by id
 * @param findRecord the record a void cancels, when the phone knows it
 */
export function describeOutboxRecord(
  args: Words & {
    record: TechRecord;
    carNumber: number | undefined;
    findRecord?: (recordId: string) => TechRecord | undefined;
  },
): string {
  const { record } = args;
  const target =
    record.kind === "void" ? args.findRecord?.(record.payload.targetRecordId) : undefined;
  return `Car ${args.carNumber ?? "?"} · ${describeBody(record, args, target)}`;
}
