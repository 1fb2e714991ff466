import { z } from "zod";
import { dynoAmbientProblem } from "../power-to-weight/dyno-ambient-problem";
import { CORRECTION_STANDARDS } from "../rule-sets/rule-set-schema";
import { convertTemperature } from "../units/convert-temperature";
import { formatDecimal } from "../units/format-decimal";

/** Air temperatures a dyno sheet can plausibly print, in °C (exclusive). */
const AIR_TEMPERATURE_C = { min: -60, max: 70 } as const;

/** A dyno sheet's fields, without the check that its ambient conditions can be true. */
const dynoSheetFields = z.object({
  power: z.object({
    value: z.number().positive("Power must be more than 0").finite(),
    unit: z.enum(["hp", "PS", "kW"]),
  }),
  measuredAt: z.enum(["wheel", "crank"]),
  /** The standard the printed figure is corrected to; "uncorrected" for observed power. */
  correction: z.enum(CORRECTION_STANDARDS),
  /** Ambient conditions printed on the sheet; needed to convert between standards. */
  ambient: z
    .object({
      pressure: z.object({
        value: z.number().positive(),
        unit: z.enum(["kPa", "hPa", "mbar", "inHg"]),
      }),
      /** Vapour pressure, if printed; without it the air is taken as dry. */
      vapourPressure: z
        .object({ value: z.number().min(0), unit: z.enum(["kPa", "hPa", "mbar", "inHg"]) })
        .optional(),
      temperature: z
        .object({ value: z.number(), unit: z.enum(["C", "F"]) })
        .superRefine((t, ctx) => {
          // The range is in °C; a °F figure is converted before it is checked.
          const c = convertTemperature(t.value, t.unit, "C");
          if (c > AIR_TEMPERATURE_C.min && c < AIR_TEMPERATURE_C.max) return;
          const [lo, hi] = [AIR_TEMPERATURE_C.min, AIR_TEMPERATURE_C.max].map((x) =>
            formatDecimal(convertTemperature(x, "C", t.unit), 1),
          );
          ctx.addIssue({
            code: "custom",
            path: ["value"],
            message: `The dyno sheet's air temperature must be between ${lo} °${t.unit} and ${hi} °${t.unit}`,
          });
        }),
    })
    .nullable()
    .default(null),
  date: z.iso.date(),
});
/** A dyno sheet as stored (possibly before its pressures were checked); see {@link dynoSheetSchema}. */
export type DynoSheet = z.infer<typeof dynoSheetFields>;
/** The ambient conditions printed on a dyno sheet. */
export type DynoAmbient = NonNullable<DynoSheet["ambient"]>;

/**
 * A dyno sheet as the entrant uploads it: its air pressure within what weather and altitude
 * give, its vapour pressure below the air pressure and within what air at its temperature can
 * hold ({@link dynoAmbientProblem}). A sheet that cannot be true is refused here, with a message
 * that names the figure.
 */
export const dynoSheetSchema = dynoSheetFields.superRefine((sheet, ctx) => {
  if (sheet.ambient === null) return;
  const problem = dynoAmbientProblem(sheet.ambient);
  if (problem === null) return;
  ctx.addIssue({
    code: "custom",
    path: ["ambient"],
    message: `The dyno sheet cannot be true: ${problem}; check the figures on the sheet`,
  });
});

function declarationsSchema<S extends z.ZodType<DynoSheet>>(sheet: S) {
  return z.object({
    aero: z
      .object({
        wing: z.boolean().default(false),
        splitter: z.boolean().default(false),
        diffuser: z.boolean().default(false),
      })
      .default({ wing: false, splitter: false, diffuser: false }),
    dynoSheet: sheet.nullable().default(null),
    /** Tyres fitted: a UTQG treadwear grade, or none (race tyres). Absent = not declared yet. */
    tyres: z
      .discriminatedUnion("kind", [
        z.object({
          kind: z.literal("graded"),
          treadwear: z
            .number()
            .int("A treadwear grade is a whole number (as on the sidewall)")
            .min(0, "A treadwear grade is 0 or more")
            .max(2000, "A treadwear grade is at most 2000 (as on the sidewall)"),
        }),
        z.object({ kind: z.literal("no-grade") }),
      ])
      .nullable()
      .default(null),
    modificationPoints: z
      .number()
      .min(0, "Modification points cannot be below 0")
      .nullable()
      .default(null),
    driverWeightKg: z
      .number()
      .positive("A driver's weight is more than 0 kg")
      .max(250, "A driver's weight is at most 250 kg")
      .nullable()
      .default(null),
    /** Ballast fitted when weighed. */
    ballastKg: z.number().min(0, "Ballast cannot be below 0 kg").default(0),
    engine: z
      .object({
        displacementCc: z.number().positive("Displacement must be more than 0 cc"),
        forcedInduction: z.boolean(),
      })
      .nullable()
      .default(null),
  });
}

/** What the entrant declares for an entry; the scrutineer's readings check the measurable parts. */
export const entryDeclarationsSchema = declarationsSchema(dynoSheetSchema);
/**
 * Declarations as stored, read back for evaluation: the same fields, but a dyno sheet saved before
 * its pressures were checked still reads, so the engine can refuse it in the verdict's words
 * (`correctedPowerKw`) instead of the whole recompute failing on it.
 */
export const storedEntryDeclarationsSchema = declarationsSchema(dynoSheetFields);
/** Declarations after defaults. */
export type EntryDeclarations = z.output<typeof entryDeclarationsSchema>;
/** Declarations as sent, before defaults. */
export type EntryDeclarationsInput = z.input<typeof entryDeclarationsSchema>;
