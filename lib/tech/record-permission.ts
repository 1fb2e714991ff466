import type { Permission } from "../auth/permissions";
import type { TechRecord } from "../scrutineer/records/record-schema";

/** The permission a person needs to make a record of each kind. */
export const recordPermission: Record<TechRecord["kind"], Permission> = {
  reading: "readings.write",
  checklist: "readings.write",
  photo: "readings.write",
  note: "readings.write",
  void: "records.void",
  override: "verdicts.override",
};
