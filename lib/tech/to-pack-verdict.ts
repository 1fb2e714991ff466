import type { PackVerdict } from "../offline/event-pack-schema";
import type { Verdict } from "../scrutineer/verdicts/verdict-schema";
import { needsChiefScrutineer } from "./needs-chief-scrutineer";

/** The parts of a stored verdict the short form reads (older stored verdicts lack some). */
type VerdictLike = Pick<Verdict, "status" | "classId" | "reason" | "flags"> &
  Partial<Pick<Verdict, "override" | "rejectedOverride" | "implausibleReadings">>;

/**
 * A verdict in the short form phones and boards use: status, class, reason, flags, and who
 * decided an override (or whose override was not applied, and why) with their device time, and
 * why each implausible reading cannot be true.
 */
export function toPackVerdict(args: {
  entryId: string;
  verdict: VerdictLike;
  computedAt: Date;
}): PackVerdict {
  const { verdict } = args;
  const override = verdict.override ?? null;
  const rejected = verdict.rejectedOverride ?? null;
  return {
    entryId: args.entryId,
    status: verdict.status,
    classId: verdict.classId,
    reason: verdict.reason,
    flags: verdict.flags,
    needsChief: needsChiefScrutineer(verdict),
    override: override && { officialId: override.officialId, deviceTime: override.deviceTime },
    rejectedOverride: rejected && {
      officialId: rejected.officialId,
      deviceTime: rejected.deviceTime,
      problem: rejected.problem,
    },
    implausibleReadings: (verdict.implausibleReadings ?? []).map((r) => r.why),
    computedAt: args.computedAt.toISOString(),
  };
}
