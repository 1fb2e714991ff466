import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldErrors, Resolver } from "react-hook-form";
import { entryDeclarationsSchema } from "../scrutineer/classes/entry-declarations-schema";
import { type DeclarationsFormValues, toDeclarationsInput } from "./declarations-form-values";

const engineResolver = zodResolver(entryDeclarationsSchema);

/** zod's own words for a missing or unreadable number, in the form's words. */
function plainWords(message: string | undefined): string | undefined {
  if (message === undefined) return undefined;
  if (/expected number, received (NaN|undefined)/.test(message)) return "Enter a number";
  if (/expected string, received undefined|Invalid ISO date/i.test(message)) {
    return "Enter the date printed on the sheet";
  }
  return message;
}

function reword(errors: Record<string, unknown>): void {
  for (const [key, value] of Object.entries(errors)) {
    // `ref` is the field's element: never walk into the DOM.
    if (key === "ref" || key === "types" || value === null || typeof value !== "object") continue;
    const node = value as { message?: string; ref?: unknown };
    if (typeof node.message === "string") node.message = plainWords(node.message);
    reword(value as Record<string, unknown>);
  }
}

/**
 * The declarations form's resolver: the engine's own `entryDeclarationsSchema` (through
 * zodResolver) over the form's values as declarations, so its plausibility rules (a dyno sheet
 * whose air pressure or vapour pressure cannot be true) give field messages in the browser
 * before anything is sent. Error paths are the schema's, which are the fields' names.
 */
export const declarationsResolver: Resolver<DeclarationsFormValues> = async (
  values,
  context,
  options,
) => {
  const result = await engineResolver(toDeclarationsInput(values), context, options as never);
  if (Object.keys(result.errors).length === 0) return { values, errors: {} };
  reword(result.errors as Record<string, unknown>);
  return { values: {}, errors: result.errors as FieldErrors<DeclarationsFormValues> };
};
