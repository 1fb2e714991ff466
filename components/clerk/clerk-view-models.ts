/** A constraint note as the clerk's page shows it: a broken rule and the drives it names.
 *  "blocks": a hard rule the server refuses to publish; "gave-way": a hard rule no grouping of
 *  these cars could meet (the builder would have had to accept it too); "soft": a preference. */
export type ConstraintNote = {
  rule: string;
  text: string;
  driveIds: string[];
  kind: "blocks" | "gave-way" | "soft";
};
