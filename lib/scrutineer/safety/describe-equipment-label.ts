import type { EquipmentLabel } from "./equipment-label-schema";

/**
 * A label as the scrutineer recorded it, in words for a reason: `"not valid after 2026"`,
 * "made 2025", "made 02/2013", "dated 2024-05-16", or null for a label that shows only the
 * standard.
 */
export function describeEquipmentLabel(label: EquipmentLabel): string | null {
  switch (label.form) {
    case "not-valid-after-year":
      return `"not valid after ${label.year}"`;
    case "manufacture-year":
      return `made ${label.year}`;
    case "manufacture-month":
      return `made ${String(label.month).padStart(2, "0")}/${label.year}`;
    case "date":
      return `dated ${label.date}`;
    case "standard-only":
      return null;
  }
}
