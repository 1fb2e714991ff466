/**
 * The latest of some ISO 8601 instants (compared as instants, not as text, so offsets do not
 * matter), or null when there is none that reads.
 */
export function latestInstant(instants: readonly string[]): string | null {
  let best: { iso: string; ms: number } | null = null;
  for (const iso of instants) {
    const ms = Date.parse(iso);
    if (Number.isNaN(ms)) continue;
    if (best === null || ms > best.ms) best = { iso, ms };
  }
  return best === null ? null : new Date(best.ms).toISOString();
}
