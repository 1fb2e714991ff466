import type { ChecklistPayload } from "@/lib/scrutineer/records/record-schema";

/** What the checklist item's label fields hold: the standard and the label as typed. */
export type LabelFields = { standardId: string; year: string; month: string; date: string };

/**
 * The label fields as the latest answer recorded them, so a reloaded car card shows what was
 * entered (not the first standard and blank years). Without an answer, or with a standard this
 * item no longer accepts, the standard falls back to the first accepted one.
 * @param acceptedStandardIds the item's accepted standards, in the rule set's order
 */
export function labelFieldsFromAnswer(
  answer: ChecklistPayload | undefined,
  acceptedStandardIds: ReadonlyArray<string>,
): LabelFields {
  const fallback = acceptedStandardIds[0] ?? "";
  const equipment = answer?.equipment;
  if (equipment === undefined || !acceptedStandardIds.includes(equipment.standardId)) {
    return { standardId: fallback, year: "", month: "", date: "" };
  }
  const { label } = equipment;
  return {
    standardId: equipment.standardId,
    year: "year" in label ? String(label.year) : "",
    month: label.form === "manufacture-month" ? String(label.month) : "",
    date: label.form === "date" ? label.date : "",
  };
}
