import type { VerdictWord } from "../verdict-word";
import type { SignOnState } from "./sign-on-state";

/**
 * A car is ready to run — may go into a run group — only when it passed the tech line (cleared,
 * or moved up into a class it is legal in) and it is signed on. Either alone is not enough.
 */
export function isReadyToRun(status: VerdictWord, signOn: SignOnState): boolean {
  return (status === "cleared" || status === "moved-up") && signOn.signedOn;
}
