import { buildSchedule } from "@/lib/paddock/build-schedule";
import { checkRunGroups } from "@/lib/paddock/check-run-groups";
import { diffRunSheets, type RunSheetDiff } from "@/lib/paddock/diff-run-sheets";
import type { RunGroup } from "@/lib/paddock/run-group-plan";
import type { RunSheet } from "@/lib/paddock/run-sheet-schema";
import type { ScheduleSettings } from "@/lib/paddock/schedule-settings";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import type { ConstraintNote } from "./clerk-view-models";
import type { GroupSession } from "./run-group-card";
import { toConstraintNotes } from "./to-constraint-notes";

export type RunSheetPreview = {
  notes: ConstraintNote[];
  explanations: Record<string, string>;
  sessionsByGroup: GroupSession[][];
  scheduleWarnings: string[];
  /** The sheet as it would be published now, and what changes against the version in force. */
  sheet: RunSheet | null;
  diff: RunSheetDiff | null;
};

/**
 * What the clerk's groups and settings would give if published now: the live constraint check
 * (the same checkRunGroups the server runs before publishing), each group's session times and the
 * difference from the published run sheet. Runs in the browser after every change.
 */
export function previewRunSheet({
  view,
  groups,
  settings,
  capCars,
}: {
  view: ClerkView;
  groups: RunGroup[];
  settings: ScheduleSettings;
  capCars: number;
}): RunSheetPreview {
  if (groups.length === 0) {
    return {
      notes: [],
      explanations: {},
      sessionsByGroup: [],
      scheduleWarnings: [],
      sheet: null,
      diff: null,
    };
  }
  const check = checkRunGroups({ drives: view.drives, capCars, groups });
  const schedule = buildSchedule({
    eventDate: view.event.eventDate,
    timeZone: view.event.timeZone,
    settings,
    groupCount: groups.length,
  });
  const sessionsByGroup: GroupSession[][] = groups.map(() => []);
  for (const s of schedule.sessions) sessionsByGroup[s.groupIndex - 1]?.push(s);
  const onSheet = new Set(groups.flatMap((g) => g.driveIds));
  const sheet: RunSheet = {
    timeZone: view.event.timeZone,
    eventDate: view.event.eventDate,
    drives: view.drives.filter((d) => onSheet.has(d.driveId)),
    groups,
    settings,
    sessions: schedule.sessions,
    blocks: schedule.blocks,
    explanations: check.explanations,
    gaveWay: [...check.hard, ...check.soft].map(({ rule, driveIds, text }) => ({
      rule,
      driveIds,
      text,
    })),
    cap: { cars: capCars, source: view.cap.source },
  };
  return {
    notes: toConstraintNotes(check),
    explanations: check.explanations,
    sessionsByGroup,
    scheduleWarnings: schedule.warnings,
    sheet,
    diff: diffRunSheets(view.published?.body ?? null, sheet),
  };
}
