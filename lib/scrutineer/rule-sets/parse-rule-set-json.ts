import type { z } from "zod";
import { type RuleSet, ruleSetSchema } from "./rule-set-schema";

/** One problem found in a rule set as written: where (a readable path) and what to do. */
export type RuleSetIssue = {
  /** Dot path into the JSON, e.g. "classes.1.aero.wing.height.maxMm"; "" for the whole text. */
  path: string;
  /** The same place in words, e.g. "Class 2 (Merlin) › aero › wing › height › maxMm". */
  where: string;
  message: string;
};

/** What {@link parseRuleSetJson} returns. */
export type ParseRuleSetJsonResult =
  | { ok: true; ruleSet: RuleSet; body: unknown }
  | { ok: false; issues: RuleSetIssue[]; body: unknown };

/** Largest rule set accepted, in characters (a full ladder with a checklist is ~15 000). */
export const MAX_RULE_SET_CHARS = 200_000;

function lineAndColumn(text: string, position: number): { line: number; column: number } {
  const before = text.slice(0, position);
  const line = before.split("\n").length;
  return { line, column: position - before.lastIndexOf("\n") };
}

function syntaxMessage(text: string, error: unknown): string {
  const raw = error instanceof Error ? error.message : String(error);
  const position = /position (\d+)/.exec(raw)?.[1];
  const detail = raw.replace(/\s*in JSON at position \d+.*$/s, "").replace(/^JSON\.parse: /, "");
  if (position === undefined) return `This is not valid JSON (${detail}).`;
  const { line, column } = lineAndColumn(text, Number(position));
  return `This is not valid JSON: ${detail} at line ${line}, column ${column}.`;
}

function className(body: unknown, index: number): string | null {
  if (body === null || typeof body !== "object") return null;
  const classes = (body as { classes?: unknown }).classes;
  if (!Array.isArray(classes)) return null;
  const item: unknown = classes[index];
  if (item === null || typeof item !== "object") return null;
  const name = (item as { name?: unknown; id?: unknown }).name ?? (item as { id?: unknown }).id;
  return typeof name === "string" && name !== "" ? name : null;
}

/** Words for a path: list positions counted from 1, and a class named where the JSON names it. */
export function describeRuleSetPath(path: ReadonlyArray<PropertyKey>, body: unknown): string {
  if (path.length === 0) return "The rule set";
  const parts: string[] = [];
  for (let i = 0; i < path.length; i += 1) {
    const key = path[i];
    const next = path[i + 1];
    if (key === "classes" && typeof next === "number") {
      const name = className(body, next);
      parts.push(`Class ${next + 1}${name === null ? "" : ` (${name})`}`);
      i += 1;
    } else if (typeof key === "number") {
      parts.push(`item ${key + 1}`);
    } else {
      parts.push(String(key));
    }
  }
  return parts.join(" › ");
}

const KIND_WORDS: Record<string, string> = {
  number: "a number",
  string: "text",
  boolean: "true or false",
  object: "an object ({ … })",
  array: "a list ([ … ])",
  null: "null",
};

function kindOf(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "array";
  return typeof value;
}

/** A schema issue in words an organizer can act on; zod's own wording otherwise. */
function issueMessage(issue: z.core.$ZodIssue, body: unknown): string {
  if (issue.code !== "invalid_type") return issue.message;
  let value: unknown = body;
  for (const key of issue.path) {
    value =
      value !== null && typeof value === "object"
        ? (value as Record<PropertyKey, unknown>)[key]
        : undefined;
  }
  const expected = KIND_WORDS[issue.expected] ?? issue.expected;
  if (value === undefined) return `Missing: give ${expected}.`;
  return `Expected ${expected}, found ${KIND_WORDS[kindOf(value)] ?? kindOf(value)}.`;
}

/**
 * Reads a rule set as an organizer writes it (JSON text) and validates it with the rule-set
 * schema. Every problem comes back with its place, so a form can show it beside the field.
 */
export function parseRuleSetJson(text: string): ParseRuleSetJsonResult {
  if (text.length > MAX_RULE_SET_CHARS) {
    return {
      ok: false,
      body: null,
      issues: [
        {
          path: "",
          where: "The rule set",
          message: `That is over ${MAX_RULE_SET_CHARS.toLocaleString("en-GB")} characters; is it the right file?`,
        },
      ],
    };
  }
  if (text.trim() === "") {
    return {
      ok: false,
      body: null,
      issues: [
        { path: "", where: "The rule set", message: "Paste or upload the rule set (JSON)." },
      ],
    };
  }
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch (error) {
    return {
      ok: false,
      body: null,
      issues: [{ path: "", where: "The rule set", message: syntaxMessage(text, error) }],
    };
  }
  const parsed = ruleSetSchema.safeParse(body);
  if (parsed.success) return { ok: true, ruleSet: parsed.data, body };
  return {
    ok: false,
    body,
    issues: parsed.error.issues.map((issue) => ({
      path: issue.path.map(String).join("."),
      where: describeRuleSetPath(issue.path, body),
      message: issueMessage(issue, body),
    })),
  };
}
