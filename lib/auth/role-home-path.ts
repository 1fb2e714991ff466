import type { Role } from "./roles";

/** Where each role starts its day, most senior first (a person may hold several). */
const homes: { role: Role; path: (eventId: string) => string }[] = [
  { role: "organizer", path: (id) => `/organizer/${id}` },
  { role: "chief-scrutineer", path: (id) => `/tech/${id}/chief` },
  { role: "clerk-of-course", path: (id) => `/clerk/${id}` },
  { role: "registrar", path: (id) => `/registration/${id}` },
  { role: "scrutineer", path: (id) => `/tech/${id}` },
  { role: "entrant", path: () => "/garage" },
];

/** The home page of a person's most senior role in an event, or null with no role. */
export function roleHomePath(eventId: string, roles: readonly Role[]): string | null {
  const home = homes.find((h) => roles.includes(h.role));
  return home ? home.path(eventId) : null;
}

/** Every role home a person has in an event, most senior first. */
export function roleHomePaths(
  eventId: string,
  roles: readonly Role[],
): { role: Role; path: string }[] {
  return homes
    .filter((h) => roles.includes(h.role))
    .map((h) => ({ role: h.role, path: h.path(eventId) }));
}
