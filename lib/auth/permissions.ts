import type { Role } from "./roles";

/** Everything a signed-in person may do within one event. Code checks these, never role names. */
export type Permission =
  | "event.read"
  | "event.manage"
  | "rule-sets.manage"
  | "officials.manage"
  | "entries.read"
  | "entries.manage"
  | "registration.check"
  | "tech.read"
  /** The chief scrutineer's report of every car examined, with each rejection: written for the
   *  clerk of course (Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.3.1). */
  | "tech-report.read"
  | "readings.write"
  | "records.void"
  | "verdicts.override"
  | "run-groups.write"
  | "run-groups.publish"
  | "results.publish"
  | "own-entries.read"
  | "own-entries.write";

const official: Permission[] = ["event.read", "entries.read"];

export const rolePermissions: Record<Role, readonly Permission[]> = {
  organizer: [
    ...official,
    "event.manage",
    "rule-sets.manage",
    "officials.manage",
    "entries.manage",
    "tech.read",
  ],
  registrar: [...official, "entries.manage", "registration.check"],
  "chief-scrutineer": [
    ...official,
    "tech.read",
    "readings.write",
    "records.void",
    "verdicts.override",
    "tech-report.read",
  ],
  scrutineer: [...official, "tech.read", "readings.write"],
  "clerk-of-course": [
    ...official,
    "tech.read",
    "tech-report.read",
    "run-groups.write",
    "run-groups.publish",
    "results.publish",
  ],
  entrant: ["event.read", "own-entries.read", "own-entries.write"],
};

/** True when any of the roles grants the permission. */
export function can(roles: readonly Role[], permission: Permission): boolean {
  return roles.some((role) => rolePermissions[role].includes(permission));
}
