/**
 * Printed and exported with every tech result and report: they are computed and provisional.
 * The chief scrutineer has the final say at the tech line and the sanctioning body's rulebook
 * governs; provisional results become final when the protest time has expired (Motorsport UK
 * NCR 2026 Ch.3 App.6, DOMAIN.md "During the day").
 */
export const RESULTS_NOTICE =
  "Provisional. Computed by Plumbline from the tech line's records; the chief scrutineer has the final say and the sanctioning body's rulebook governs. Results become final only when the protest time has expired.";
