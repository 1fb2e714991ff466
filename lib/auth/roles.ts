/** Roles an official holds for one event (stored in event_officials). */
export const eventRoles = [
  "organizer",
  "registrar",
  "chief-scrutineer",
  "scrutineer",
  "clerk-of-course",
] as const;

export type EventRole = (typeof eventRoles)[number];

/** Entrant is derived: a user who drives (or co-drives, or owns the car of) an entry in the event. */
export type Role = EventRole | "entrant";

export const roleLabels: Record<Role, string> = {
  organizer: "Organizer",
  registrar: "Registrar",
  "chief-scrutineer": "Chief scrutineer",
  scrutineer: "Scrutineer",
  "clerk-of-course": "Clerk of course",
  entrant: "Entrant",
};
