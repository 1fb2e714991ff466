import type { DayBlock, ScheduledSession } from "../paddock/scheduled-session";
import type { SessionCall } from "../paddock/session-call";
import type { VerdictWord } from "../verdict-word";

/** One car on the public paddock board: number, class and where it stands. No personal details. */
export type BoardCar = {
  carNumber: number;
  declaredClass: string;
  finalClass: string | null;
  status: VerdictWord;
};

/** Why a car on the published run sheet may no longer run, in words read across the paddock. */
export type BoardDriveFlag = {
  kind: "withdrawn" | "held" | "re-measure" | "waiting";
  words: string;
};

/**
 * One drive on the published run sheet as the paddock sees it: the car number and the class it
 * runs in, never the driver's name. A shared car's two drives are "driver 1 of 2" and "2 of 2".
 */
export type BoardDrive = {
  /** `${carNumber}-${slot}`: unique on a sheet (car numbers are unique in an event). */
  key: string;
  carNumber: number;
  className: string;
  slot: 1 | 2;
  /** The car has two drives on this sheet (two drivers share it). */
  shared: boolean;
  /** The car's verdict now; null when it has been withdrawn since the sheet was published. */
  status: VerdictWord | null;
  /** Set when the car may no longer run as published (held, back at the tech line, withdrawn). */
  flag: BoardDriveFlag | null;
};

/** One run group of the published sheet, in the rotation's order (index from 1). */
export type BoardGroup = { index: number; name: string; drives: BoardDrive[] };

/** The latest published run sheet, cut down to what the paddock wall shows. */
export type BoardRunSheet = {
  version: number;
  publishedAt: string;
  groups: BoardGroup[];
  sessions: ScheduledSession[];
  blocks: DayBlock[];
};

/**
 * GET /api/events/[eventId]/board: everything the paddock board shows. The live state of the day
 * (on track now, next, after, shifts) is computed in the browser from `runSheet`, `calls` and the
 * clock, so the board keeps moving on time with no signal.
 */
export type Board = {
  eventName: string;
  timeZone: string;
  /** The event's date at the venue (YYYY-MM-DD). */
  eventDate: string;
  /** The server's clock when this was read (ISO instant); the browser keeps its offset to it. */
  updatedAt: string;
  cars: BoardCar[];
  runSheet: BoardRunSheet | null;
  /** The clerk of course's marks on the sessions, oldest first (empty before the first). */
  calls: SessionCall[];
};

/**
 * The board as a screen last heard it: the payload, its ETag, when it arrived by this screen's
 * clock, and the server's clock minus this screen's at that moment (so "now" on the board follows
 * the server even when the TV's own clock is off). Kept in IndexedDB for a reload with no signal.
 */
export type BoardSnapshot = {
  board: Board;
  etag: string | null;
  /** This screen's clock when the server last answered (ms since the epoch). */
  heardAt: number;
  /** Server clock minus this screen's clock, ms (0 when unknown). */
  offsetMs: number;
};
