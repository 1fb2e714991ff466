import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import { ActionMessage } from "./action-message";
import { RunSheetDiffList } from "./run-sheet-diff-list";

/** The server's answer to publishing: its words, how many entrants were e-mailed and the diff it
 *  stored (which has the last word over the preview). */
export function PublishResult({ state, timeZone }: { state: ClerkActionState; timeZone: string }) {
  if (state.status !== "published") return <ActionMessage state={state} testId="publish-message" />;
  return (
    <section className="card space-y-2 border-cleared-line" data-testid="publish-result">
      <ActionMessage state={state} testId="publish-message" />
      <p className="text-base">
        Version <span className="tabular">{state.version}</span> is in force;{" "}
        <span className="tabular">{state.mailed}</span>{" "}
        {state.mailed === 1 ? "entrant" : "entrants"} e-mailed.
      </p>
      <RunSheetDiffList diff={state.diff} timeZone={timeZone} firstVersion={state.version === 1} />
    </section>
  );
}
