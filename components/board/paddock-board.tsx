"use client";
import { useQuery } from "@tanstack/react-query";
import { Caution } from "@/components/caution";
import { boardDay } from "@/lib/board/board-day";
import { formatWallClock } from "@/lib/paddock/format-wall-clock";
import { BOARD_REFETCH_MS, boardQuery } from "@/lib/query/board-queries";
import { BoardStatusLine } from "./board-status-line";
import { DayShifts } from "./day-shifts";
import { RunSheetGroups } from "./run-sheet-groups";
import { SessionPanel } from "./session-panel";
import { TechStateBoard } from "./tech-state-board";
import { useKeptBoard } from "./use-kept-board";
import { useScreenClock } from "./use-screen-clock";

/** Three missed refreshes in a row: the board says it is not current. */
const UNREACHABLE_AFTER_MS = 3 * BOARD_REFETCH_MS;

/**
 * The paddock board for everyone, on a phone or a TV: on track now, the next group to call and
 * the one after, the day's changes, the whole run sheet and every car's state at the tech line.
 * "Now" is worked out here from the last answer and the clock, so the board keeps moving on time
 * with no signal, and says how old its information is.
 */
export function PaddockBoard({ eventId }: { eventId: string }) {
  const { data, isError, fetchStatus } = useQuery(boardQuery(eventId));
  useKeptBoard(eventId, data);
  const screenMs = useScreenClock(data?.heardAt ?? 0);
  if (!data)
    return (
      <p className="card">
        {isError ? "The board cannot be reached right now." : "Loading the board…"}
      </p>
    );
  const { board } = data;
  const ageMs = screenMs - data.heardAt;
  const unreachable = isError || fetchStatus === "paused" || ageMs > UNREACHABLE_AFTER_MS;
  const now = new Date(screenMs + data.offsetMs).toISOString();
  const day = board.runSheet
    ? boardDay({ runSheet: board.runSheet, calls: board.calls, timeZone: board.timeZone, now })
    : null;
  const between = day?.block
    ? `${day.block.kind === "lunch" ? "Lunch break" : "Drivers’ briefing"} until ${formatWallClock(day.block.endsAt, board.timeZone)}.`
    : "Nothing on track.";
  return (
    <div className="space-y-3 2xl:space-y-4" data-testid="paddock-board">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <p
          className="tabular font-narrow text-4xl font-bold 2xl:text-6xl"
          data-testid="board-clock"
        >
          <span className="sr-only">Time at the venue: </span>
          {formatWallClock(now, board.timeZone)}
        </p>
        <BoardStatusLine ageMs={ageMs} unreachable={unreachable} />
      </div>
      {day && board.runSheet ? (
        <>
          <div className="grid gap-3 lg:grid-cols-3" data-testid="board-now">
            <SessionPanel
              label="On track now"
              slot={day.onTrack}
              timeZone={board.timeZone}
              empty={between}
              testId="board-on-track"
              emphasis
            />
            <SessionPanel
              label="Next to call"
              slot={day.next}
              timeZone={board.timeZone}
              empty="No more sessions today."
              testId="board-next"
              emphasis={false}
            />
            <SessionPanel
              label="After that"
              slot={day.after}
              timeZone={board.timeZone}
              empty="No more sessions today."
              testId="board-after"
              emphasis={false}
            />
          </div>
          <DayShifts shifts={day.shifts} />
        </>
      ) : (
        <p className="card text-xl" data-testid="no-run-sheet">
          The clerk of course has not published a run sheet yet. Until then, nobody is called to
          run: below is where each car stands at the tech line.
        </p>
      )}
      <div className="2xl:[&_aside>div]:text-xl">
        <Caution>
          The run sheet as published by the clerk of course governs, and the chief scrutineer has
          the final say on every car. Listen for calls at the dummy grid; this board can lag.
        </Caution>
      </div>
      {day && board.runSheet ? (
        <RunSheetGroups
          runSheet={board.runSheet}
          live={day.live}
          timeZone={board.timeZone}
          onTrackGroup={day.onTrack?.group.index ?? null}
        />
      ) : null}
      <TechStateBoard cars={board.cars} />
    </div>
  );
}
