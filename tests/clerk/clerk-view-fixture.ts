import type { RunGroup } from "@/lib/paddock/run-group-plan";
import type { ClerkCar, ClerkView } from "@/lib/run-sheet/clerk-view";
import { defaultScheduleSettings } from "@/lib/run-sheet/default-schedule-settings";
import { drives, groups } from "./clerk-fixtures";

// An invented event for the clerk's page tests (demo data only).
const car = (n: number): ClerkCar => ({
  entryId: `e${n}`,
  carNumber: n,
  car: `Test car ${n}`,
  drivers: n === 3 ? "Driver 3, Driver 3b" : `Driver ${n}`,
  declaredClassName: "Kestrel",
  runsInClassName: "Kestrel",
  status: "cleared",
  reason: null,
  signOn: { signedOn: true, missing: [] },
  withdrawn: false,
  reinspection: null,
  ready: true,
});

export function clerkView(
  overrides: Partial<ClerkView> = {},
  draftGroups: RunGroup[] = groups,
): ClerkView {
  return {
    event: { id: "event-1", name: "Test day", timeZone: "Europe/London", eventDate: "2026-05-16" },
    cars: [1, 2, 3, 4, 5, 6].map(car),
    drives,
    cap: { cars: 3, source: "3 cars: set for the test" },
    draft: {
      groups: draftGroups,
      settings: defaultScheduleSettings,
      capCars: 3,
      revision: 1,
      updatedAt: "2026-05-15T18:00:00.000Z",
    },
    defaultSettings: defaultScheduleSettings,
    published: null,
    versions: [],
    calls: [],
    flagged: [],
    now: "2026-05-16T07:00:00.000Z",
    ...overrides,
  };
}
