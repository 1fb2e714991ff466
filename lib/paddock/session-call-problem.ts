import type { SessionCallState } from "./session-call";

const allowed: Record<SessionCallState | "planned", readonly SessionCallState[]> = {
  planned: ["called", "on-track"],
  called: ["on-track", "cut-short"],
  "on-track": ["red-flag", "finished", "cut-short"],
  "red-flag": ["on-track", "finished", "cut-short"],
  // Back on track: a finish marked by mistake, or the clerk restarts the session.
  finished: ["on-track"],
  "cut-short": ["on-track"],
};

const words: Record<SessionCallState | "planned", string> = {
  planned: "not called yet",
  called: "called",
  "on-track": "on track",
  "red-flag": "stopped by a red flag",
  finished: "finished",
  "cut-short": "cut short",
};

/**
 * Why a mark cannot be put on a session now, in words, or null when it can: marks follow a
 * session's life (called → on track → red flag / finished / cut short; a finished or cut-short
 * session may go back on track). Pure.
 */
export function sessionCallProblem({
  current,
  next,
}: {
  current: SessionCallState | "planned";
  next: SessionCallState;
}): string | null {
  if (allowed[current].includes(next)) return null;
  return `This session is ${words[current]}: it cannot be marked ${words[next]} now.`;
}
