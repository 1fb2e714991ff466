/** A place a signed-in person can start: one role's home in one event. */
export type HomeChoice = { path: string; eventStatus: string };

/**
 * Where to send someone straight after sign-in, or null to let them choose. One place: there.
 * None: the garage. Several: on the day of a running event, its most senior role home (the
 * day's job comes first; the choice is a tap away on /home?all=1); otherwise they choose.
 * `choices` come most senior first within each event, soonest event first.
 */
export function pickHomePath(choices: readonly HomeChoice[]): string | null {
  const paths = [...new Set(choices.map((c) => c.path))];
  if (paths.length === 0) return "/garage";
  if (paths.length === 1) return paths[0] ?? null;
  return choices.find((c) => c.eventStatus === "running")?.path ?? null;
}
