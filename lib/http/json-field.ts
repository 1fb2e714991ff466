import { z } from "zod";

/** A form field that carries JSON (a list the page built), parsed and then checked by `schema`. */
export function jsonField<S extends z.ZodType>(schema: S) {
  return z
    .string({ message: "Missing" })
    .max(200_000, "That is too long.")
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: "custom", message: "Not readable; reload the page and try again." });
        return z.NEVER;
      }
    })
    .pipe(schema);
}
