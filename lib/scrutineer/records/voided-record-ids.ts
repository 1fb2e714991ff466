import type { TechRecord } from "./record-schema";
import { resolveVoids } from "./resolve-voids";

/**
 * Ids of the records a void in force cancels: the tech line's one void rule
 * ({@link resolveVoids}), for screens that only need to strike records through. Linear.
 */
export function voidedRecordIds(records: ReadonlyArray<TechRecord>): Set<string> {
  return new Set(resolveVoids(records).voided);
}
