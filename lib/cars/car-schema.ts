import { z } from "zod";
import { carLengthSchema } from "./car-length-schema";
import { CAR_SIZE_LIMITS, EARLIEST_MODEL_YEAR, latestModelYear } from "./car-size-limits";

/**
 * A car in an entrant's garage, as typed into the form or sent to POST /api/cars and
 * PATCH /api/cars/[carId]. Strict: a field the app does not know is refused, never silently
 * dropped. `thisYear` is the calendar year now (the browser's, or the server's clock): the model
 * year runs from 1900 to next year's model year (see `latestModelYear`). Body width and roof
 * height are text in mm or in, stored in millimetres (null when not given).
 */
export function carInputSchemaFor({ thisYear }: { thisYear: number }) {
  const latest = latestModelYear(thisYear);
  return z.strictObject({
    make: z
      .string({ message: "Enter the make, e.g. Mazda" })
      .trim()
      .min(1, "Enter the make, e.g. Mazda")
      .max(60, "Keep the make to 60 characters"),
    model: z
      .string({ message: "Enter the model, e.g. MX-5" })
      .trim()
      .min(1, "Enter the model, e.g. MX-5")
      .max(80, "Keep the model to 80 characters"),
    year: z.coerce
      .number({ message: "Enter the model year as a number, e.g. 2004" })
      .int("Enter a whole year, e.g. 2004")
      .min(EARLIEST_MODEL_YEAR, `Enter a model year from ${EARLIEST_MODEL_YEAR} on`)
      .max(latest, `Enter a model year no later than ${latest} (next year's models are on sale)`),
    colour: z
      .string({ message: "Enter the colour, so the tech line can spot it" })
      .trim()
      .min(1, "Enter the colour, so the tech line can spot it")
      .max(40, "Keep the colour to 40 characters"),
    notes: z.string().trim().max(500, "Keep notes to 500 characters").optional().default(""),
    bodyWidth: carLengthSchema({
      what: "body width",
      range: CAR_SIZE_LIMITS.bodyWidthMm,
    })
      .optional()
      .transform((mm) => mm ?? null),
    roofHeight: carLengthSchema({
      what: "roof height",
      range: CAR_SIZE_LIMITS.roofHeightMm,
    })
      .optional()
      .transform((mm) => mm ?? null),
  });
}

/** The schema as of the device's own year (the form in the browser; tests pass their own). */
export const carInputSchema = carInputSchemaFor({ thisYear: new Date().getFullYear() });

export type CarInput = z.input<typeof carInputSchema>;
export type CarFields = z.output<typeof carInputSchema>;

/** A car as the garage shows it: lengths in millimetres, retired or not. */
export type Car = Omit<CarFields, "bodyWidth" | "roofHeight"> & {
  id: string;
  bodyWidthMm: number | null;
  roofHeightMm: number | null;
  retiredAt: string | null;
  files: CarFileSummary[];
};

/** One current file of a car (a photo or the dyno sheet), as its owner's garage lists it. */
export type CarFileSummary = {
  id: string;
  kind: "front" | "side" | "rear" | "dyno-sheet";
  contentType: string;
  byteSize: number;
  widthPx: number | null;
  heightPx: number | null;
  url: string;
};
