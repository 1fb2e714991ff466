import { can } from "../auth/permissions";
import type { Role } from "../auth/roles";
import type { TechRecord } from "../scrutineer/records/record-schema";
import { recordPermission } from "./record-permission";

/** What the person may not do, in words, for each kind of record. */
const cannot: Record<TechRecord["kind"], string> = {
  reading: "record readings",
  checklist: "answer the safety checklist",
  photo: "add photos",
  note: "add notes",
  void: "void records",
  override: "override verdicts",
};

/**
 * Why the signed-in official may not make this record, or null when they may. A void is allowed
 * with `records.void` (the chief scrutineer voids anyone's record), or with `readings.write` when
 * the record it voids is the official's own and of the same car: a scrutineer can take back a
 * typo, never another official's reading. Only `records.void` voids a void: a void of a void
 * undoes the first (the one void rule, `lib/scrutineer/records/resolve-voids.ts`), which is the chief
 * scrutineer's call, and chains of voids are how a hostile phone would load the engine.
 * `target` is the voided record's kind, author and entry as the server knows them (stored, or
 * earlier in the same batch), or null when it is unknown.
 */
export function recordRefusal(args: {
  record: TechRecord;
  userId: string;
  roles: readonly Role[];
  target: { kind: TechRecord["kind"]; entryId: string; officialId: string } | null;
}): string | null {
  const { record, userId, roles, target } = args;
  if (record.officialId !== userId) {
    return "Made under another official's sign-in; sign in as them to send it.";
  }
  if (record.kind !== "void" || can(roles, recordPermission.void)) {
    return can(roles, recordPermission[record.kind])
      ? null
      : `Your role in this event cannot ${cannot[record.kind]}.`;
  }
  if (!can(roles, "readings.write")) return `Your role in this event cannot ${cannot.void}.`;
  if (target === null) {
    return "The record to void is not on the server (it may have been refused), so there is nothing of yours to void.";
  }
  if (target.kind === "void") {
    return "Only the chief scrutineer can undo a void; ask them to void it.";
  }
  if (target.officialId !== userId) {
    return "You can void only your own records; ask the chief scrutineer to void another official's.";
  }
  if (target.entryId !== record.entryId) {
    return "The record to void belongs to another car.";
  }
  return null;
}
