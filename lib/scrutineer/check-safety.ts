import { checkEquipmentValidity } from "./check-equipment-validity";
import type { EquipmentLabel } from "./equipment-label-schema";
import type { TechRecordOf } from "./record-schema";
import type { RuleSet } from "./rule-set-schema";
import type { ChecklistItem, SafetyStandard } from "./safety-rules-schema";
import type { SafetyItemResult } from "./verdict-schema";

function labelText(label: EquipmentLabel): string {
  switch (label.form) {
    case "not-valid-after-year":
      return `label "not valid after ${label.year}"`;
    case "manufacture-year":
      return `made ${label.year}`;
    case "manufacture-month":
      return `made ${String(label.month).padStart(2, "0")}/${label.year}`;
    case "date":
      return `dated ${label.date}`;
    case "standard-only":
      return "";
  }
}

function checkItem(
  item: ChecklistItem,
  answer: TechRecordOf<"checklist"> | undefined,
  standards: ReadonlyMap<string, SafetyStandard>,
  ruleSet: RuleSet,
  eventDate: string,
): SafetyItemResult {
  const base = {
    itemId: item.id,
    label: item.label,
    required: item.required,
    recordId: answer?.id ?? null,
    equipment: null,
  };
  if (answer === undefined) {
    return {
      ...base,
      outcome: item.required ? "waiting" : "not-applicable",
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
      reason: `${item.label}: record the standard and the label`,
    };
  }
  const standard = standards.get(p.equipment.standardId);
  const accepted = item.equipment.acceptedStandardIds.includes(p.equipment.standardId);
  if (standard === undefined || !accepted) {
    return {
      ...base,
      outcome: "fail",
      equipment: {
        standardId: p.equipment.standardId,
        standardName: standard?.name ?? null,
        validThrough: null,
        status: "not-accepted",
        daysLeft: null,
      },
      reason: `${item.label}: ${standard?.name ?? p.equipment.standardId} is not accepted for this item`,
    };
  }
  const validity = checkEquipmentValidity({
    standard,
    label: p.equipment.label,
    eventDate,
    warningDays: ruleSet.safety.expiryWarningDays,
  });
  const equipment = {
    standardId: standard.id,
    standardName: standard.name,
    validThrough: validity.validThrough,
    status: validity.status,
    daysLeft: validity.daysLeft,
  };
  const lt = labelText(p.equipment.label);
  const what = `${item.label} ${standard.name}${lt === "" ? "" : ` (${lt})`}`;
  switch (validity.status) {
    case "unreadable":
      return {
        ...base,
        outcome: "waiting",
        equipment,
        reason: `${what}: re-read the label — ${validity.problem ?? "it cannot be read"}`,
      };
    case "expired":
      return {
        ...base,
        outcome: "fail",
        equipment,
        reason: `${what}: expired, valid only through ${validity.validThrough}`,
      };
    case "expires-soon": {
      const days =
        validity.daysLeft === 0
          ? "the event day is its last valid day"
          : `expires in ${validity.daysLeft} days`;
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

/**
 * Checks every checklist item of the rule set against the latest answer for it, and certified
 * equipment against its standard's expiry policy on the event date. A failed item or expired or
 * unaccepted equipment holds the car (safety never moves a car up); expiring within the warning
 * window passes with a warning.
 * @returns the item results, and the ids of answers for items the rule set does not list
 */
export function checkSafety(
  ruleSet: RuleSet,
  answers: ReadonlyMap<string, TechRecordOf<"checklist">>,
  eventDate: string,
): { items: SafetyItemResult[]; unknownItemIds: string[] } {
  const standards = new Map(ruleSet.safety.standards.map((s) => [s.id, s]));
  const items = ruleSet.safety.checklist.map((item) =>
    checkItem(item, answers.get(item.id), standards, ruleSet, eventDate),
  );
  const listed = new Set(ruleSet.safety.checklist.map((i) => i.id));
  const unknownItemIds = [...answers.keys()].filter((id) => !listed.has(id)).sort();
  return { items, unknownItemIds };
}
