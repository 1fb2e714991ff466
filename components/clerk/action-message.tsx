import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import { ClearedIcon, StoppedIcon } from "../icons/state-icons";

/** What the server answered to the clerk's last action, in its own words. */
export function ActionMessage({ state, testId }: { state: ClerkActionState; testId: string }) {
  if (state.status === "idle") return null;
  if (state.status === "error") {
    return (
      <p
        className="flex items-start gap-2 rounded-lg border-2 border-stopped-line bg-stopped-soft p-3 text-base font-semibold text-stopped"
        role="alert"
        data-testid={testId}
      >
        <StoppedIcon className="mt-0.5 size-5 shrink-0" />
        {state.message}
      </p>
    );
  }
  return (
    <p
      className="flex items-start gap-2 text-base font-semibold text-cleared"
      role="status"
      data-testid={testId}
    >
      <ClearedIcon className="mt-0.5 size-5 shrink-0" />
      {state.message}
    </p>
  );
}
