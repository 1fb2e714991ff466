import type { RunGroup } from "@/lib/paddock/run-group-plan";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import type { ConstraintNote } from "./clerk-view-models";

/** Why the run sheet cannot be published as it stands, in words; empty when it can. The server
 *  checks all of this again and has the last word. */
export function publishBlockers({
  view,
  groups,
  notes,
  saving,
  saveFailed,
}: {
  view: ClerkView;
  groups: RunGroup[];
  notes: ConstraintNote[];
  saving: boolean;
  saveFailed: boolean;
}): string[] {
  if (groups.length === 0) return ["Build run groups first."];
  const out: string[] = [];
  const ready = new Set(view.drives.map((d) => d.driveId));
  const notReady = groups.flatMap((g) => g.driveIds).filter((id) => !ready.has(id));
  if (notReady.length > 0) {
    out.push(
      `${notReady.length} drive${notReady.length === 1 ? " is" : "s are"} in a group but no longer ready to run: move ${notReady.length === 1 ? "it" : "them"} out or build again.`,
    );
  }
  const blocking = notes.filter((n) => n.kind === "blocks").length;
  if (blocking > 0) {
    out.push(
      `${blocking} broken rule${blocking === 1 ? " blocks" : "s block"} publishing (see the warnings above the groups).`,
    );
  }
  if (saving) out.push("Saving the draft…");
  if (saveFailed) out.push("The last change is not saved: see above.");
  return out;
}
