/**
 * Shown with every verdict, on the phone and on the server. The engine computes; people decide.
 */
export const VERDICT_NOTICE =
  "Computed from the recorded readings and the event's rule set. The chief scrutineer has the final say, and the sanctioning body's rulebook and local law govern.";
