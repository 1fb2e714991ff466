import { z } from "zod";
import { LABEL_FORMS } from "./equipment-label-schema";

const id = z.string().regex(/^[a-z0-9][a-z0-9-]*$/, "Use lower-case letters, digits and hyphens");

/**
 * How a standard's label turns into a last valid day. Chosen per standard in the rule set,
 * because sanctioning bodies compute the same item differently.
 * - end-of-label-year: valid through 31 Dec of the label year
 * - years-after-label-year: valid through 31 Dec of (label year + years)
 * - years-from-label-month: valid through the last day of the label month, `years` later
 * - years-from-label-date: valid through the label date `years` later (month labels: end of month)
 * - valid-through-date: the standard itself is accepted through a fixed date (helmet lists)
 * - no-expiry: the label carries no validity limit
 */
export const expiryPolicySchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("end-of-label-year") }),
  z.object({ kind: z.literal("years-after-label-year"), years: z.number().int().min(0).max(50) }),
  z.object({ kind: z.literal("years-from-label-month"), years: z.number().int().min(0).max(50) }),
  z.object({ kind: z.literal("years-from-label-date"), years: z.number().int().min(0).max(50) }),
  z.object({ kind: z.literal("valid-through-date"), date: z.iso.date() }),
  z.object({ kind: z.literal("no-expiry") }),
]);
/** See {@link expiryPolicySchema}. */
export type ExpiryPolicy = z.infer<typeof expiryPolicySchema>;

/** Which label forms each policy can read. */
export const POLICY_LABEL_FORMS: Record<
  ExpiryPolicy["kind"],
  ReadonlyArray<(typeof LABEL_FORMS)[number]>
> = {
  "end-of-label-year": ["not-valid-after-year", "manufacture-year", "manufacture-month"],
  "years-after-label-year": ["not-valid-after-year", "manufacture-year", "manufacture-month"],
  "years-from-label-month": ["manufacture-month", "date"],
  "years-from-label-date": ["date", "manufacture-month"],
  "valid-through-date": LABEL_FORMS,
  "no-expiry": LABEL_FORMS,
};

/** A safety standard the rule set accepts, with the label it carries and its expiry policy. */
export const safetyStandardSchema = z.object({
  id,
  /** As printed, e.g. "FIA 8853-2016". */
  name: z.string().min(1),
  /** What the standard covers, e.g. "harness". */
  item: z.string().min(1),
  labelForm: z.enum(LABEL_FORMS),
  policy: expiryPolicySchema,
  /** Where the policy comes from, for the organizer and the chief scrutineer. */
  source: z.string().optional(),
});
/** See {@link safetyStandardSchema}. */
export type SafetyStandard = z.infer<typeof safetyStandardSchema>;

/** One line of the tech sheet's safety checklist. */
export const checklistItemSchema = z.object({
  id,
  label: z.string().min(1),
  /** What the scrutineer looks for, shown on the car card. */
  guidance: z.string().optional(),
  required: z.boolean().default(true),
  notApplicableAllowed: z.boolean().default(false),
  /** When the item is certified equipment: the standards accepted for it. */
  equipment: z
    .object({ acceptedStandardIds: z.array(id).min(1) })
    .nullable()
    .default(null),
});
/** See {@link checklistItemSchema}. */
export type ChecklistItem = z.infer<typeof checklistItemSchema>;

/** The safety part of a rule set. Safety never moves a car up: a failure holds it. */
export const safetyRulesSchema = z.object({
  /** Items expiring within this many days of the event are valid but flagged. */
  expiryWarningDays: z.number().int().min(0).max(366).default(30),
  standards: z.array(safetyStandardSchema),
  checklist: z.array(checklistItemSchema),
});
/** See {@link safetyRulesSchema}. */
export type SafetyRules = z.infer<typeof safetyRulesSchema>;
