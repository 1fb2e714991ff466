import { z } from "zod";
import { convertLength } from "../scrutineer/units/convert-length";
import { parseLength } from "../scrutineer/units/parse-length";

/** "1640 mm" or "64.6 in", whichever the figure was given in, for a message. */
function both(mm: number): string {
  const inches = Math.round(convertLength(mm, "mm", "in") * 10) / 10;
  return `${Math.round(mm)} mm (${inches} in)`;
}

/**
 * A car's own length (body width, roof height) typed as text in mm or in ("1640", "1640 mm",
 * "64.5 in", `64.5"`), read by the tech line's parser (a number with no unit is millimetres), and
 * held inside a plausible range for a car. Empty text is "not given" (null). Output: mm or null.
 */
export function carLengthSchema(opts: { what: string; range: { min: number; max: number } }) {
  return z
    .string({ message: `Enter the ${opts.what} as text, e.g. 1640 mm or 64.5 in` })
    .max(40, `Keep the ${opts.what} short, e.g. 1640 mm or 64.5 in`)
    .transform((text, ctx) => {
      const t = text.trim();
      if (t === "") return null;
      const parsed = parseLength(t, { defaultUnit: "mm" });
      if (!parsed.ok) {
        ctx.addIssue({ code: "custom", message: parsed.message });
        return z.NEVER;
      }
      const { min, max } = opts.range;
      if (parsed.mm < min || parsed.mm > max) {
        // A bare number that would fit in inches was most likely typed in inches.
        const asInches = convertLength(Number(t), "in", "mm");
        const hint =
          /^\d+(\.\d+)?$/.test(t) && asInches >= min && asInches <= max
            ? ` Did you mean ${t} in? Add "in" after the number.`
            : "";
        ctx.addIssue({
          code: "custom",
          message: `A car's ${opts.what} is between ${both(min)} and ${both(max)}; ${t} reads as ${both(parsed.mm)}.${hint}`,
        });
        return z.NEVER;
      }
      return Math.round(parsed.mm * 10) / 10;
    });
}
