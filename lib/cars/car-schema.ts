import { z } from "zod";

/** A car in an entrant's garage, as typed into the form or sent to POST /api/cars. Strict: a
 * field the app does not know is refused, never silently dropped. */
export const carInputSchema = z.strictObject({
  make: z
    .string()
    .trim()
    .min(1, "Enter the make, e.g. Mazda")
    .max(60, "Keep the make under 60 characters"),
  model: z
    .string()
    .trim()
    .min(1, "Enter the model, e.g. MX-5")
    .max(80, "Keep the model under 80 characters"),
  year: z.coerce
    .number({ message: "Enter the year as a number, e.g. 2004" })
    .int("Enter a whole year, e.g. 2004")
    .min(1900, "Enter a year from 1900 on")
    .max(2100, "Enter a year before 2100"),
  colour: z
    .string()
    .trim()
    .min(1, "Enter the colour, so the tech line can spot it")
    .max(40, "Keep the colour under 40 characters"),
  notes: z.string().trim().max(500, "Keep notes under 500 characters").optional().default(""),
});

export type CarInput = z.input<typeof carInputSchema>;
export type Car = z.output<typeof carInputSchema> & { id: string };
