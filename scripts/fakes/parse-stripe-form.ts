/**
 * Read a form body as the `stripe` SDK writes it (`a[b][0][c]=v`, indexed arrays, nested objects)
 * back into an object. Every value stays a string, as on the wire.
 */
export function parseStripeForm(body: string): Record<string, unknown> {
  const root: Record<string, unknown> = {};
  for (const [fullKey, value] of new URLSearchParams(body)) {
    const parts = fullKey.split(/\[|\]\[|\]/).filter((p) => p !== "");
    let node: Record<string, unknown> = root;
    parts.forEach((part, i) => {
      if (i === parts.length - 1) {
        node[part] = value;
        return;
      }
      const next = node[part];
      if (typeof next !== "object" || next === null) node[part] = {};
      node = node[part] as Record<string, unknown>;
    });
  }
  return arraysFromIndexedObjects(root) as Record<string, unknown>;
}

/** `{0: x, 1: y}` → `[x, y]`, all the way down. */
function arraysFromIndexedObjects(value: unknown): unknown {
  if (typeof value !== "object" || value === null) return value;
  const entries = Object.entries(value as Record<string, unknown>).map(
    ([k, v]) => [k, arraysFromIndexedObjects(v)] as const,
  );
  if (entries.length > 0 && entries.every(([k]) => /^\d+$/.test(k))) {
    return entries.sort((a, b) => Number(a[0]) - Number(b[0])).map(([, v]) => v);
  }
  return Object.fromEntries(entries);
}
