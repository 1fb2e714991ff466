import { z } from "zod";
import { equipmentLabelSchema } from "./equipment-label-schema";

/** Length dimensions a scrutineer reads, all in millimetres. */
export const LENGTH_DIMENSIONS = [
  "wingTopFromGroundMm",
  "roofPeakFromGroundMm",
  "wingOverhangMm",
  "wingSpanMm",
  "endPlateThicknessMm",
  "bodyWidthMm",
  "splitterProtrusionMm",
  "splitterWidthMm",
  "wingChordMm",
] as const;
/** One of {@link LENGTH_DIMENSIONS}. */
export type LengthDimension = (typeof LENGTH_DIMENSIONS)[number];

/** Dimensions whose reading may be negative: overhang (+ = wing behind) and splitter protrusion. */
export const SIGNED_DIMENSIONS: ReadonlyArray<LengthDimension> = [
  "wingOverhangMm",
  "splitterProtrusionMm",
];

/** Every dimension a reading can carry; the suffix is the unit of `value`. */
export type Dimension = LengthDimension | "cornerWeightKg" | "noiseDbA";

/** Scale corners: left/right, front/rear. */
export const CORNERS = ["lf", "rf", "lr", "rr"] as const;
/** One of {@link CORNERS}. */
export type Corner = (typeof CORNERS)[number];

/** The tool a reading was taken with; its stated standard uncertainty is in the reading's unit. */
export const instrumentSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
  /** Type B standard uncertainty u (not expanded), in the unit of the dimension. */
  standardUncertainty: z.number().positive().finite(),
});

/** The conditions the scrutineer noted for the reading, compared with the rule set's. */
export const readingConditionsSchema = z.object({
  driverAboard: z.boolean().optional(),
  levelPad: z.boolean().optional(),
  tyrePressureKpa: z.number().positive().optional(),
});

const common = { instrument: instrumentSchema, conditions: readingConditionsSchema.optional() };

/** One measured value of one named dimension. */
export const readingPayloadSchema = z
  .discriminatedUnion("dimension", [
    z.object({ dimension: z.enum(LENGTH_DIMENSIONS), value: z.number().finite(), ...common }),
    z.object({
      dimension: z.literal("cornerWeightKg"),
      corner: z.enum(CORNERS),
      value: z.number().finite().min(0),
      ...common,
    }),
    z.object({ dimension: z.literal("noiseDbA"), value: z.number().finite().min(0), ...common }),
  ])
  .superRefine((r, ctx) => {
    if (r.dimension !== "cornerWeightKg" && r.dimension !== "noiseDbA") {
      if (r.value < 0 && !SIGNED_DIMENSIONS.includes(r.dimension)) {
        ctx.addIssue({
          code: "custom",
          path: ["value"],
          message: `${r.dimension} cannot be negative`,
        });
      }
    }
  });
/** See {@link readingPayloadSchema}. */
export type ReadingPayload = z.infer<typeof readingPayloadSchema>;

/** A checklist answer for one safety item of the rule set. */
export const checklistPayloadSchema = z.object({
  itemId: z.string().min(1),
  result: z.enum(["pass", "fail", "not-applicable"]),
  equipment: z.object({ standardId: z.string().min(1), label: equipmentLabelSchema }).optional(),
  comment: z.string().max(2000).optional(),
});
/** See {@link checklistPayloadSchema}. */
export type ChecklistPayload = z.infer<typeof checklistPayloadSchema>;

/** The chief scrutineer's decision, which replaces the computed verdict until voided. */
export const overridePayloadSchema = z
  .object({
    status: z.enum(["cleared", "moved-up", "held"]),
    classId: z.string().min(1).nullable(),
    reason: z.string().trim().min(5, "Write the reason for the override"),
  })
  .superRefine((o, ctx) => {
    if (o.status === "held" && o.classId !== null) {
      ctx.addIssue({ code: "custom", path: ["classId"], message: "A held car has no class" });
    }
    if (o.status !== "held" && o.classId === null) {
      ctx.addIssue({
        code: "custom",
        path: ["classId"],
        message: "Name the class the car runs in",
      });
    }
  });
/** See {@link overridePayloadSchema}. */
export type OverridePayload = z.infer<typeof overridePayloadSchema>;

const base = {
  /** UUID v7 made on the device (time-ordered). */
  id: z.uuid({ version: "v7" }),
  entryId: z.string().min(1),
  officialId: z.string().min(1),
  deviceId: z.string().min(1),
  /** The device's clock when the record was made, ISO 8601 with offset. */
  deviceTime: z.iso.datetime({ offset: true }),
};

/**
 * An immutable tech-line record. The phone makes them, the server stores them, and
 * `evaluateEntry` derives the verdict from all of an entry's records.
 */
export const recordSchema = z.discriminatedUnion("kind", [
  z.object({ ...base, kind: z.literal("reading"), payload: readingPayloadSchema }),
  z.object({ ...base, kind: z.literal("checklist"), payload: checklistPayloadSchema }),
  z.object({
    ...base,
    kind: z.literal("photo"),
    payload: z.object({ storageKey: z.string().min(1), caption: z.string().max(500).optional() }),
  }),
  z.object({
    ...base,
    kind: z.literal("note"),
    payload: z.object({ text: z.string().min(1).max(4000) }),
  }),
  z.object({
    ...base,
    kind: z.literal("void"),
    payload: z.object({
      targetRecordId: z.uuid({ version: "v7" }),
      reason: z.string().trim().min(3, "Say why the record is void"),
    }),
  }),
  z.object({ ...base, kind: z.literal("override"), payload: overridePayloadSchema }),
]);
/** One record; see {@link recordSchema}. */
export type TechRecord = z.infer<typeof recordSchema>;
/** A record of one kind. */
export type TechRecordOf<K extends TechRecord["kind"]> = Extract<TechRecord, { kind: K }>;
