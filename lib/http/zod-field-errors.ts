import type { z } from "zod";
import type { FieldErrors } from "../errors";

/** Turn a zod error into `{ "car.year": ["Enter a year between 1900 and 2100"] }`. */
export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join(".") : "_";
    const list = fields[key] ?? [];
    list.push(issue.message);
    fields[key] = list;
  }
  return fields;
}
