import type { SignOnState } from "../entries/sign-on-state";
import type { Drive } from "../paddock/drive";
import type { RunGroup } from "../paddock/run-group-plan";
import type { RunSheetPublication } from "../paddock/run-sheet-schema";
import type { ScheduleSettings } from "../paddock/schedule-settings";
import type { SessionCall } from "../paddock/session-call";
import type { VerdictWord } from "../verdict-word";

/** An open re-inspection of a car: who asked, when and why. */
export type OpenReinspection = {
  id: string;
  cause: "incident" | "protest" | "other";
  askedBy: string;
  askedAt: string;
  reason: string;
};

/** One car as the clerk of course sees it: tech state, sign-on and whether it may run. */
export type ClerkCar = {
  entryId: string;
  carNumber: number;
  car: string;
  drivers: string;
  declaredClassName: string;
  /** The class it runs in when cleared or moved up; null otherwise. */
  runsInClassName: string | null;
  status: VerdictWord;
  reason: string | null;
  signOn: SignOnState;
  withdrawn: boolean;
  reinspection: OpenReinspection | null;
  /** Cleared or moved up, signed on, not withdrawn: may be in a published run group. */
  ready: boolean;
};

/** A drive in the published run sheet that may no longer run, and why in words. */
export type FlaggedDrive = { driveId: string; entryId: string; carNumber: number; why: string };

/** Everything the clerk of course's page shows (GET /api/events/[eventId]/run-groups). */
export type ClerkView = {
  event: { id: string; name: string; timeZone: string; eventDate: string };
  cars: ClerkCar[];
  /** The drives of the ready cars: what the builder groups (a shared car gives two). */
  drives: Drive[];
  cap: { cars: number; source: string };
  draft: {
    groups: RunGroup[];
    settings: ScheduleSettings;
    capCars: number;
    revision: number;
    updatedAt: string;
  } | null;
  /** What the day looks like before the clerk has changed anything. */
  defaultSettings: ScheduleSettings;
  published: RunSheetPublication | null;
  versions: { version: number; publishedAt: string; publishedBy: string | null }[];
  calls: SessionCall[];
  flagged: FlaggedDrive[];
  /** The server's clock when this was read (the page ticks from it). */
  now: string;
};
