import type { Verdict } from "./verdict-schema";

/** A re-inspection asked for and not yet closed by the chief scrutineer. */
export type OpenReinspectionInput = {
  cause: "incident" | "protest" | "other";
  askedBy: string;
  /** When it was asked, already written in the event's local time ("14:05"). */
  askedAtText: string;
  askedAt: string;
  reason: string;
};

const causeWords = { incident: "after an incident", protest: "after a protest", other: "" };

/**
 * A car sent back to the tech line waits: whatever its records say, its verdict is Waiting until
 * the re-inspection is closed (a provisional result stands only until protest time has expired:
 * Motorsport UK NCR 2026 Ch.3 App.6, as DOMAIN.md notes). The computed verdict stays beside it.
 */
export function applyReinspection(verdict: Verdict, open: OpenReinspectionInput | null): Verdict {
  if (!open) return verdict;
  const cause = causeWords[open.cause];
  const reason = `Sent back for re-inspection${cause ? ` ${cause}` : ""}, asked by ${open.askedBy} at ${open.askedAtText}: ${open.reason.replace(/[.\s]+$/, "")}. Waiting until it has been looked at again.`;
  return {
    ...verdict,
    status: "waiting",
    reason,
    flags: verdict.flags.includes("reinspection")
      ? verdict.flags
      : [...verdict.flags, "reinspection"],
    reinspection: {
      cause: open.cause,
      askedBy: open.askedBy,
      askedAt: open.askedAt,
      reason: open.reason,
      computedStatus: verdict.status,
      computedClassId: verdict.classId,
      computedReason: verdict.reason,
    },
  };
}
