import { z } from "zod";

/** The forms a safety label takes, as the scrutineer reads it off the item. */
export const LABEL_FORMS = [
  "not-valid-after-year",
  "manufacture-year",
  "manufacture-month",
  "date",
  "standard-only",
] as const;
/** One of {@link LABEL_FORMS}. */
export type LabelForm = (typeof LABEL_FORMS)[number];

const year = z.number().int().min(1950).max(2200);

/**
 * What is printed on the label: "not valid after YYYY", a manufacture year, a manufacture
 * month/year, a dated stamp or check date, or only the standard (helmets).
 */
export const equipmentLabelSchema = z.discriminatedUnion("form", [
  z.object({ form: z.literal("not-valid-after-year"), year }),
  z.object({ form: z.literal("manufacture-year"), year }),
  z.object({ form: z.literal("manufacture-month"), year, month: z.number().int().min(1).max(12) }),
  z.object({ form: z.literal("date"), date: z.iso.date() }),
  z.object({ form: z.literal("standard-only") }),
]);
/** A label as read; see {@link equipmentLabelSchema}. */
export type EquipmentLabel = z.infer<typeof equipmentLabelSchema>;
