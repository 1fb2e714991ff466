import { z } from "zod";
import { CORNER_LABELS, DIMENSION_LABELS } from "../measurement/dimension-labels";
import { READING_LIMITS } from "../measurement/reading-limits";
import { equipmentLabelSchema } from "../safety/equipment-label-schema";

/** Longest free text each record takes, in characters; forms on the phone enforce the same. */
export const RECORD_TEXT_LIMITS = {
  checklistComment: 2000,
  standardName: 200,
  photoCaption: 500,
  note: 4000,
  voidReason: 1000,
  overrideReason: 2000,
} as const;

/**
 * Longest identifying text a record carries, in characters: each fits the column or the key it
 * ends up in (`records.device_id` is 64, `users.id` 255, an object key 300), so a long one is
 * refused as that record's problem, never a database error for the whole batch.
 */
export const RECORD_KEY_LIMITS = {
  deviceId: 64,
  officialId: 255,
  entryId: 64,
  itemId: 64,
  standardId: 64,
  instrumentId: 64,
  instrumentName: 120,
  storageKey: 300,
} as const;

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

/**
 * The record schemas with each text's maximum passed through `bound`: the limits as they are for
 * what a phone sends, or no maximum for reading back what is already stored (a record stored
 * before a limit existed must never vanish from a car's verdict).
 */
function buildRecordSchemas(bound: (max: number) => number) {
  /** A required identifying text of at most `max` characters (the sync answer words the limit). */
  const key = (max: number) => z.string().min(1).max(bound(max));

  /** The tool a reading was taken with; its stated standard uncertainty is in the reading's unit. */
  const instrumentSchema = z.object({
    id: key(RECORD_KEY_LIMITS.instrumentId),
    name: key(RECORD_KEY_LIMITS.instrumentName),
    /** Type B standard uncertainty u (not expanded), in the unit of the dimension. */
    standardUncertainty: z.number().positive().finite(),
  });

  /** The conditions the scrutineer noted for the reading, compared with the rule set's. */
  const readingConditionsSchema = z.object({
    driverAboard: z.boolean().optional(),
    levelPad: z.boolean().optional(),
    tyrePressureKpa: z.number().positive().optional(),
  });

  const common = { instrument: instrumentSchema, conditions: readingConditionsSchema.optional() };

  const UNKNOWN_DIMENSION = `Unknown dimension; a reading is one of: ${Object.values(DIMENSION_LABELS).join(", ")}`;

  /** The cap that applies to a dimension's readings (and to its instrument's uncertainty). */
  function limitOf(dimension: Dimension): { max: number; unit: string } {
    if (dimension === "cornerWeightKg") return READING_LIMITS.cornerWeight;
    if (dimension === "noiseDbA") return READING_LIMITS.noise;
    return READING_LIMITS.length;
  }

  /**
   * One measured value of one named dimension: a finite number within a plausible magnitude
   * ({@link READING_LIMITS}), not negative unless the dimension is signed. Messages name the
   * dimension as people do ("The wing span cannot be negative").
   */
  const readingPayloadSchema = z
    .discriminatedUnion(
      "dimension",
      [
        z.object({ dimension: z.enum(LENGTH_DIMENSIONS), value: z.number(), ...common }),
        z.object({
          dimension: z.literal("cornerWeightKg"),
          corner: z.enum(CORNERS, {
            error: `Say which corner: ${Object.values(CORNER_LABELS).join(", ")}`,
          }),
          value: z.number(),
          ...common,
        }),
        z.object({ dimension: z.literal("noiseDbA"), value: z.number(), ...common }),
      ],
      { error: (issue) => (issue.code === "invalid_union" ? UNKNOWN_DIMENSION : undefined) },
    )
    .superRefine((r, ctx) => {
      const label = DIMENSION_LABELS[r.dimension];
      const { max, unit } = limitOf(r.dimension);
      const signed =
        r.dimension !== "cornerWeightKg" && r.dimension !== "noiseDbA"
          ? SIGNED_DIMENSIONS.includes(r.dimension)
          : false;
      if (r.value < 0 && !signed) {
        ctx.addIssue({
          code: "custom",
          path: ["value"],
          message: `The ${label} cannot be negative`,
        });
      }
      if (Math.abs(r.value) > max) {
        ctx.addIssue({
          code: "custom",
          path: ["value"],
          message: `The ${label} cannot be more than ${max} ${unit}; check the number and unit`,
        });
      }
      if (r.instrument.standardUncertainty > max) {
        ctx.addIssue({
          code: "custom",
          path: ["instrument", "standardUncertainty"],
          message: `An instrument's uncertainty for the ${label} cannot be more than ${max} ${unit}`,
        });
      }
    });

  /** A checklist answer for one safety item of the rule set. */
  const checklistPayloadSchema = z.object({
    itemId: key(RECORD_KEY_LIMITS.itemId),
    result: z.enum(["pass", "fail", "not-applicable"]),
    equipment: z
      .object({
        standardId: key(RECORD_KEY_LIMITS.standardId),
        /** The standard's name as the scrutineer saw it, so a reason can name it even if a later
         * rule-set version no longer lists the id. */
        standardName: z.string().max(bound(RECORD_TEXT_LIMITS.standardName)).optional(),
        label: equipmentLabelSchema,
      })
      .optional(),
    comment: z.string().max(bound(RECORD_TEXT_LIMITS.checklistComment)).optional(),
  });

  /** The chief scrutineer's decision, which replaces the computed verdict until voided. */
  const overridePayloadSchema = z
    .object({
      status: z.enum(["cleared", "moved-up", "held"]),
      classId: key(RECORD_KEY_LIMITS.itemId).nullable(),
      reason: z
        .string()
        .max(bound(RECORD_TEXT_LIMITS.overrideReason))
        .trim()
        .min(5, "Write the reason for the override"),
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

  const base = {
    /** UUID v7 made on the device (time-ordered). */
    id: z.uuid({ version: "v7" }),
    entryId: key(RECORD_KEY_LIMITS.entryId),
    officialId: key(RECORD_KEY_LIMITS.officialId),
    deviceId: key(RECORD_KEY_LIMITS.deviceId),
    /** The device's clock when the record was made, ISO 8601 with offset. */
    deviceTime: z.iso.datetime({ offset: true }),
  };

  const recordVariants = [
    z.object({ ...base, kind: z.literal("reading"), payload: readingPayloadSchema }),
    z.object({ ...base, kind: z.literal("checklist"), payload: checklistPayloadSchema }),
    z.object({
      ...base,
      kind: z.literal("photo"),
      payload: z.object({
        storageKey: key(RECORD_KEY_LIMITS.storageKey),
        caption: z.string().max(bound(RECORD_TEXT_LIMITS.photoCaption)).optional(),
      }),
    }),
    z.object({
      ...base,
      kind: z.literal("note"),
      payload: z.object({ text: z.string().min(1).max(bound(RECORD_TEXT_LIMITS.note)) }),
    }),
    z.object({
      ...base,
      kind: z.literal("void"),
      payload: z.object({
        targetRecordId: z.uuid({ version: "v7" }),
        reason: z
          .string()
          .max(bound(RECORD_TEXT_LIMITS.voidReason))
          .trim()
          .min(3, "Say why the record is void"),
      }),
    }),
    z.object({ ...base, kind: z.literal("override"), payload: overridePayloadSchema }),
  ] as const;
  return {
    instrumentSchema,
    readingPayloadSchema,
    checklistPayloadSchema,
    overridePayloadSchema,
    recordVariants,
  };
}

const bounded = buildRecordSchemas((max) => max);
const unbounded = buildRecordSchemas(() => Number.MAX_SAFE_INTEGER);

/** The tool a reading was taken with; its stated standard uncertainty is in the reading's unit. */
export const instrumentSchema = bounded.instrumentSchema;
/**
 * One measured value of one named dimension: a finite number within a plausible magnitude
 * ({@link READING_LIMITS}), not negative unless the dimension is signed.
 */
export const readingPayloadSchema = bounded.readingPayloadSchema;
/** See {@link readingPayloadSchema}. */
export type ReadingPayload = z.infer<typeof readingPayloadSchema>;
/** A checklist answer for one safety item of the rule set. */
export const checklistPayloadSchema = bounded.checklistPayloadSchema;
/** See {@link checklistPayloadSchema}. */
export type ChecklistPayload = z.infer<typeof checklistPayloadSchema>;
/** The chief scrutineer's decision, which replaces the computed verdict until voided. */
export const overridePayloadSchema = bounded.overridePayloadSchema;
/** See {@link overridePayloadSchema}. */
export type OverridePayload = z.infer<typeof overridePayloadSchema>;

/**
 * An immutable tech-line record as stored and read back: no text maximum (what was stored under
 * older limits still counts), and fields the engine does not use, such as the server's receive
 * time, dropped. The phone makes them, the server stores them, and
 * `evaluateEntry` derives the verdict from all of an entry's records.
 */
export const recordSchema = z.discriminatedUnion("kind", [...unbounded.recordVariants]);

/**
 * A record as a phone sends it to the sync route: strict, so a record with a field the server
 * does not know is refused with words, never stored with the field silently dropped.
 */
export const incomingRecordSchema = z.discriminatedUnion("kind", [
  bounded.recordVariants[0].strict(),
  bounded.recordVariants[1].strict(),
  bounded.recordVariants[2].strict(),
  bounded.recordVariants[3].strict(),
  bounded.recordVariants[4].strict(),
  bounded.recordVariants[5].strict(),
]);

/** One record; see {@link recordSchema}. */
export type TechRecord = z.infer<typeof recordSchema>;
/** A record of one kind. */
export type TechRecordOf<K extends TechRecord["kind"]> = Extract<TechRecord, { kind: K }>;
