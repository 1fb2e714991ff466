import type { TechRecordOf } from "../records/record-schema";
import { midSentence } from "../units/mid-sentence";
import type { SafetyItemResult } from "../verdicts/verdict-schema";
import { checkEquipmentValidity } from "./check-equipment-validity";
import { describeEquipmentLabel } from "./describe-equipment-label";
import { equipmentSubject } from "./equipment-subject";
import type { ChecklistItem, SafetyStandard } from "./safety-rules-schema";

/**
 * Checks one checklist item against its latest answer, and certified equipment against its
 * standard's expiry policy on the event date. A label recorded in another form than the
 * standard's, or dated after the event day, is re-read, never passed. Reasons name items and
 * standards as people do, never by internal id.
 * @param standards the rule set's standards by id
 * @param eventDate ISO "YYYY-MM-DD" in the venue's time zone
 */
export function checkSafetyItem(args: {
  item: ChecklistItem;
  answer: TechRecordOf<"checklist"> | undefined;
  standards: ReadonlyMap<string, SafetyStandard>;
  eventDate: string;
  warningDays: number;
}): SafetyItemResult {
  const { item, answer, standards } = args;
  const base = {
    itemId: item.id,
    label: item.label,
    required: item.required,
    recordId: answer?.id ?? null,
    equipment: null,
    missing: [],
  };
  const itemWords = midSentence(item.label);
  if (answer === undefined) {
    return {
      ...base,
      outcome: item.required ? "waiting" : "not-applicable",
      missing: item.required ? [item.label] : [],
      reason: item.required
        ? `${item.label}: not checked yet`
        : `${item.label}: not checked (optional)`,
    };
  }
  const p = answer.payload;
  if (p.result === "not-applicable") {
    return item.notApplicableAllowed
      ? { ...base, outcome: "not-applicable", reason: `${item.label}: not applicable` }
      : {
          ...base,
          outcome: "waiting",
          missing: [`a pass or a fail for the ${itemWords}`],
          reason: `${item.label}: needs a pass or a fail; "not applicable" is not accepted for it`,
        };
  }
  if (p.result === "fail") {
    const note = p.comment === undefined || p.comment.trim() === "" ? "" : ` (${p.comment.trim()})`;
    return { ...base, outcome: "fail", reason: `${item.label}: failed at the tech line${note}` };
  }
  if (item.equipment === null) return { ...base, outcome: "pass", reason: `${item.label}: passed` };
  if (p.equipment === undefined) {
    return {
      ...base,
      outcome: "waiting",
      missing: [`record the ${itemWords} standard and label`],
      reason: `${item.label}: record the standard and the label`,
    };
  }
  const standard = standards.get(p.equipment.standardId);
  const accepted = item.equipment.acceptedStandardIds.includes(p.equipment.standardId);
  if (standard === undefined || !accepted) {
    const asRecorded = p.equipment.standardName?.trim() || null;
    return {
      ...base,
      outcome: "fail",
      equipment: {
        standardId: p.equipment.standardId,
        standardName: standard?.name ?? asRecorded,
        validThrough: null,
        status: "not-accepted",
        daysLeft: null,
      },
      reason:
        standard !== undefined
          ? `${item.label}: ${standard.name} is not accepted for this item`
          : asRecorded !== null
            ? `${item.label}: ${asRecorded} (as recorded) is a standard this rule set does not accept`
            : `${item.label}: recorded with a standard this rule set does not accept`,
    };
  }
  const validity = checkEquipmentValidity({
    standard,
    label: p.equipment.label,
    eventDate: args.eventDate,
    warningDays: args.warningDays,
  });
  const equipment = {
    standardId: standard.id,
    standardName: standard.name,
    validThrough: validity.validThrough,
    status: validity.status,
    daysLeft: validity.daysLeft,
  };
  const recorded = describeEquipmentLabel(p.equipment.label);
  const lt = p.equipment.label.form === "not-valid-after-year" ? `label ${recorded}` : recorded;
  const what = `${equipmentSubject(item.label, standard.name)}${lt === null ? "" : ` (${lt})`}`;
  switch (validity.status) {
    case "unreadable":
      return {
        ...base,
        outcome: "waiting",
        equipment,
        missing: [`re-read the ${itemWords} label`],
        reason: `${item.label} ${validity.problem ?? "label cannot be read"}; re-read the label`,
      };
    case "expired":
      return {
        ...base,
        outcome: "fail",
        equipment,
        reason: `${what}: expired, valid only through ${validity.validThrough}`,
      };
    case "expires-soon": {
      const left = validity.daysLeft ?? 0;
      const days =
        left === 0
          ? "the event day is its last valid day"
          : `expires in ${left} ${left === 1 ? "day" : "days"}`;
      return {
        ...base,
        outcome: "pass",
        equipment,
        reason: `${what}: valid through ${validity.validThrough} — ${days}`,
      };
    }
    case "valid":
      return {
        ...base,
        outcome: "pass",
        equipment,
        reason:
          validity.validThrough === null
            ? `${what}: valid`
            : `${what}: valid through ${validity.validThrough}`,
      };
  }
}
