import type { VerdictWord } from "../verdict-word";
import type { BoardDriveFlag } from "./board-schema";

/**
 * Whether a car on the published run sheet may still run, from where it stands now: withdrawn
 * (no longer entered), held, to be re-measured, or back at the tech line waiting for a verdict
 * (a re-inspection after an incident or a protest returns it there). Cleared or moved up: null.
 * @param status the car's verdict now, or null when the entry is withdrawn
 */
export function driveFlag(status: VerdictWord | null): BoardDriveFlag | null {
  switch (status) {
    case null:
      return { kind: "withdrawn", words: "Withdrawn since the run sheet was published" };
    case "held":
      return { kind: "held", words: "Held at the tech line" };
    case "re-measure":
      return { kind: "re-measure", words: "To be re-measured at the tech line" };
    case "waiting":
      return { kind: "waiting", words: "Back at the tech line, waiting for a verdict" };
    default:
      return null;
  }
}
