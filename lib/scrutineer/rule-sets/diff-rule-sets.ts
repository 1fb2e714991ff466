import { stableStringify } from "../records/stable-stringify";
import type { RuleSet } from "./rule-set-schema";

/** One changed value between two rule-set versions. */
export type RuleSetChange = {
  /** e.g. "classes[merlin].aero.wing.height.maxMm"; items with an id are keyed by it. */
  path: string;
  before: unknown;
  after: unknown;
};

const MAX_DEPTH = 12;

function isRecord(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === "object" && !Array.isArray(v);
}

function hasIds(v: unknown[]): v is Array<{ id: string }> {
  return v.every((x) => isRecord(x) && typeof x.id === "string");
}

function walk(path: string, a: unknown, b: unknown, out: RuleSetChange[], depth: number): void {
  if (stableStringify(a) === stableStringify(b)) return;
  if (depth >= MAX_DEPTH) {
    out.push({ path, before: a, after: b });
    return;
  }
  if (Array.isArray(a) && Array.isArray(b) && hasIds(a) && hasIds(b)) {
    const ids = [...new Set([...a.map((x) => x.id), ...b.map((x) => x.id)])];
    for (const id of ids) {
      walk(
        `${path}[${id}]`,
        a.find((x) => x.id === id),
        b.find((x) => x.id === id),
        out,
        depth + 1,
      );
    }
    const orderA = a.map((x) => x.id).join(",");
    const orderB = b.map((x) => x.id).join(",");
    if (orderA !== orderB && a.length === b.length)
      out.push({ path: `${path}(order)`, before: orderA, after: orderB });
    return;
  }
  if (isRecord(a) && isRecord(b)) {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
    for (const key of keys)
      walk(path === "" ? key : `${path}.${key}`, a[key], b[key], out, depth + 1);
    return;
  }
  out.push({ path, before: a, after: b });
}

/**
 * Lists what changed between two rule-set versions, value by value, so a re-evaluation can say
 * which limits moved. Classes, standards and checklist items are matched by id.
 */
export function diffRuleSets(before: RuleSet, after: RuleSet): RuleSetChange[] {
  const out: RuleSetChange[] = [];
  walk("", before, after, out, 0);
  return out.filter((c) => c.path !== "version");
}
