import type { SessionCallState } from "@/lib/paddock/session-call";

/** A constraint note as the clerk's page shows it: a broken rule and the drives it names.
 *  `blocks` is true for a hard rule the server refuses to publish. */
export type ConstraintNote = {
  rule: string;
  text: string;
  driveIds: string[];
  kind: "blocks" | "gave-way" | "soft";
};

/** One session of the published schedule as the day has gone so far. */
export type LiveSessionView = {
  key: string;
  round: number;
  groupIndex: number;
  startsAt: string;
  endsAt: string;
  expectedStartsAt: string;
  expectedEndsAt: string;
  state: "planned" | SessionCallState;
  note: string | null;
  shiftedMinutes: number;
};

/** What changes for the drivers between the last published run sheet and this one. */
export type DiffView = {
  moved: {
    driveId: string;
    carNumber: number;
    driverName: string;
    from: string | null;
    to: string | null;
  }[];
  timesChanged: { groupName: string; round: number; from: string | null; to: string | null }[];
};
