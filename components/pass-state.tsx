import { ClearedIcon, StoppedIcon } from "./icons/state-icons";

/** Whether a pass checked out, as word + icon + colour, with the plain reason when it did not. */
export function PassState({ valid, message }: { valid: boolean; message?: string }) {
  return (
    <div
      className={`flex items-start gap-3 rounded-xl border-2 p-4 ${
        valid
          ? "border-cleared-line bg-cleared-soft text-cleared"
          : "border-stopped-line bg-stopped-soft text-stopped"
      }`}
      role="status"
      data-testid="pass-state"
      data-valid={valid}
    >
      {valid ? (
        <ClearedIcon className="size-9 shrink-0" />
      ) : (
        <StoppedIcon className="size-9 shrink-0" />
      )}
      <div>
        <p className="text-2xl font-bold">{valid ? "Pass valid" : "Pass refused"}</p>
        {message ? <p className="text-lg font-semibold">{message}</p> : null}
      </div>
    </div>
  );
}
