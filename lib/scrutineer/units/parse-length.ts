import { z } from "zod";
import { READING_LIMITS } from "../measurement/reading-limits";
import { convertLength } from "./convert-length";
import type { LengthUnit } from "./unit-factors";

/** What {@link parseLength} returns: millimetres, or a message a person can act on. */
export type ParseLengthResult =
  | { ok: true; mm: number; unit: LengthUnit }
  | { ok: false; message: string };

/** Options for {@link parseLength}. */
export type ParseLengthOptions = {
  /** Unit assumed when the text has none (the event's display unit). Without it a unit is required. */
  defaultUnit?: "mm" | "in";
  /** Signed readings (overhang) may be negative; everything else may not. */
  allowNegative?: boolean;
  /** Largest magnitude accepted, in mm; default 100 000 mm (100 m). */
  maxAbsMm?: number;
};

const VULGAR: Record<string, number> = {
  "½": 1 / 2,
  "¼": 1 / 4,
  "¾": 3 / 4,
  "⅛": 1 / 8,
  "⅜": 3 / 8,
  "⅝": 5 / 8,
  "⅞": 7 / 8,
};

const UNIT_WORDS: ReadonlyArray<[RegExp, LengthUnit]> = [
  [/^(mm|millimet(er|re)s?)$/i, "mm"],
  [/^(cm|centimet(er|re)s?)$/i, "cm"],
  [/^(m|met(er|re)s?)$/i, "m"],
  [/^(in|ins|inch|inches|")$/i, "in"],
  [/^(ft|foot|feet|')$/i, "ft"],
];

/** How to write a length, led by the event's own unit (inches first when none is given). */
function exampleFor(unit: "mm" | "in" | undefined): string {
  return unit === "mm"
    ? 'write it like 1638.3 mm, 64.5 in or 64 1/2"'
    : 'write it like 64.5 in, 64 1/2" or 1638.3 mm';
}

/** Reads an unsigned amount: 64.5, 5., .5, 1/4, 64 1/2, 64-1/2, 64½. Returns null when it is not one. */
function parseAmount(text: string): number | { error: string } | null {
  const t = text.trim();
  let m = /^(\d+(?:\.\d*)?|\.\d+)$/.exec(t); // "5." is 5
  if (m?.[1] !== undefined) return Number(m[1]);
  m = /^(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)$/.exec(t);
  if (m?.[2] !== undefined && m[3] !== undefined) {
    const whole = m[1] === undefined ? 0 : Number(m[1]);
    const num = Number(m[2]);
    const den = Number(m[3]);
    if (den === 0) return { error: "a fraction cannot have 0 below the line" };
    return whole + num / den;
  }
  m = /^(\d+)?\s*([½¼¾⅛⅜⅝⅞])$/.exec(t);
  if (m?.[2] !== undefined) return (m[1] === undefined ? 0 : Number(m[1])) + (VULGAR[m[2]] ?? 0);
  return null;
}

function unitOf(word: string): LengthUnit | null {
  for (const [re, unit] of UNIT_WORDS) if (re.test(word)) return unit;
  return null;
}

/**
 * Parses a length typed or spoken at the tech line into millimetres (full precision).
 * Accepts mm, cm, m, in (in, inch, ", ''), ft (ft, ') and feet-and-inches (5' 4 1/2"), decimals
 * (64.5, 5.), fractions (1/4, 64 1/2, 64-1/2, 64½). Rejects anything else with a message that
 * says what to fix: the number, the unit, or their order.
 */
export function parseLength(text: string, options: ParseLengthOptions = {}): ParseLengthResult {
  const maxAbsMm = options.maxAbsMm ?? READING_LIMITS.length.max;
  const example = exampleFor(options.defaultUnit);
  const t = text
    .replace(/[−–]/g, "-")
    .replace(/[″”“]/g, '"')
    .replace(/[′’‘]/g, "'")
    .replace(/''/g, '"') // two apostrophes for inches: 6''
    .replace(/⁄/g, "/")
    .trim()
    .replace(/([a-z])\.$/i, "$1"); // "5 in." → "5 in"
  if (t === "") return { ok: false, message: `Enter a length; ${example}.` };
  if (t.length > 40) return { ok: false, message: `That is too long for one length; ${example}.` };
  if (t.includes(",")) {
    return {
      ok: false,
      message: `Use a point for decimals and no thousands separator; ${example}.`,
    };
  }
  const signMatch = /^([+-])\s*/.exec(t);
  const negative = signMatch?.[1] === "-";
  const body = signMatch ? t.slice(signMatch[0].length) : t;

  let mm: number | null = null;
  let unit: LengthUnit | null = null;

  const feetInches = /^(.+?)\s*(?:'|ft|feet|foot)\s*(.+?)\s*(?:"|in|ins|inch|inches)?$/i.exec(body);
  if (feetInches?.[1] !== undefined && feetInches[2] !== undefined) {
    const feet = parseAmount(feetInches[1]);
    const inches = parseAmount(feetInches[2]);
    if (typeof feet === "number" && typeof inches === "number") {
      mm = convertLength(feet, "ft", "mm") + convertLength(inches, "in", "mm");
      unit = "in";
    }
  }

  if (mm === null) {
    // A unit word in any script, so "12 мм" is an unknown unit rather than a missing one.
    const split = /^(.*?)\s*([\p{L}"']+)$/u.exec(body);
    const amountText = split?.[1] ?? body;
    const unitText = split?.[2];
    const inside = /^(.*?\d)\s*([\p{L}"']+)\s*(\d.*)$/u.exec(body);
    if (unitText === undefined && inside?.[2] !== undefined && unitOf(inside[2]) !== null) {
      return {
        ok: false,
        message: `Check the order in "${text.trim()}": the unit goes after the number, and feet before inches (5' 3"); ${example}.`,
      };
    }
    if (amountText === "" || (unitText === undefined && /\p{L}/u.test(body))) {
      return { ok: false, message: `Could not read "${text.trim()}" as a length; ${example}.` };
    }
    const amount = parseAmount(amountText);
    if (amount === null) {
      return {
        ok: false,
        message: `Could not read the number in "${text.trim()}"; ${example}.`,
      };
    }
    if (typeof amount !== "number")
      return { ok: false, message: `Check "${text.trim()}": ${amount.error}.` };
    if (unitText !== undefined) {
      unit = unitOf(unitText);
      if (unit === null) {
        return { ok: false, message: `Unknown unit "${unitText}"; use mm or in (${example}).` };
      }
    } else if (options.defaultUnit !== undefined) {
      unit = options.defaultUnit;
    } else {
      return { ok: false, message: `Add a unit, mm or in; ${example}.` };
    }
    mm = convertLength(amount, unit, "mm");
  }

  if (unit === null || !Number.isFinite(mm)) {
    return { ok: false, message: `Could not read "${text.trim()}" as a length; ${example}.` };
  }
  const signed = negative ? -mm : mm;
  if (negative && mm !== 0 && options.allowNegative !== true) {
    return { ok: false, message: "This reading cannot be negative." };
  }
  if (Math.abs(signed) > maxAbsMm) {
    return {
      ok: false,
      message: `"${text.trim()}" is longer than any car; check the number and unit.`,
    };
  }
  return { ok: true, mm: negative && mm === 0 ? 0 : signed, unit };
}

/**
 * A zod schema that turns length text into millimetres, with the parser's message as the issue,
 * for forms and route handlers.
 */
export function lengthTextSchema(options: ParseLengthOptions = {}) {
  return z.string().transform((text, ctx) => {
    const result = parseLength(text, options);
    if (result.ok) return result.mm;
    ctx.addIssue({ code: "custom", message: result.message });
    return z.NEVER;
  });
}
