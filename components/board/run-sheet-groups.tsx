import type { BoardRunSheet } from "@/lib/board/board-schema";
import { formatWallClock, formatWallClockSpan } from "@/lib/paddock/format-wall-clock";
import type { LiveSession } from "@/lib/paddock/live-session";
import { DriveTile } from "./drive-tile";

/** The whole published run sheet: every group with its cars and its sessions' times in the
 *  venue's zone (as the day now expects them; a moved session shows its planned start too). */
export function RunSheetGroups({
  runSheet,
  live,
  timeZone,
  onTrackGroup,
}: {
  runSheet: BoardRunSheet;
  live: LiveSession[];
  timeZone: string;
  onTrackGroup: number | null;
}) {
  const blocks = runSheet.blocks.map(
    (b) =>
      `${b.kind === "briefing" ? "Drivers’ briefing" : "Lunch"} ${formatWallClockSpan(b.startsAt, b.endsAt, timeZone)}`,
  );
  return (
    <section aria-label="Run sheet" data-testid="run-sheet" className="space-y-2">
      <h2 className="text-2xl font-bold 2xl:text-3xl">
        Run sheet{" "}
        <span className="text-lg font-semibold text-asphalt-700 2xl:text-xl">
          version {runSheet.version}, published {formatWallClock(runSheet.publishedAt, timeZone)}
          {blocks.length > 0 ? ` · ${blocks.join(" · ")}` : ""}
        </span>
      </h2>
      <ol className="grid gap-2 md:grid-cols-2 2xl:grid-cols-3">
        {runSheet.groups.map((group) => {
          const sessions = live.filter((s) => s.groupIndex === group.index);
          return (
            <li
              key={group.index}
              className={`card space-y-2 p-3 ${onTrackGroup === group.index ? "border-4 border-asphalt-950" : ""}`}
              data-testid="run-sheet-group"
              data-group-name={group.name}
            >
              <h3 className="font-narrow text-3xl font-bold">
                {group.name}{" "}
                <span className="font-sans text-lg font-semibold text-asphalt-700">
                  {group.drives.length} {group.drives.length === 1 ? "car" : "cars"}
                </span>
              </h3>
              <ul className="flex flex-wrap gap-x-3 gap-y-0.5 text-base tabular">
                {sessions.map((s) => (
                  <li key={s.key} data-session-key={s.key}>
                    R{s.round}{" "}
                    <span className="font-semibold">
                      {formatWallClock(s.expectedStartsAt, timeZone)}
                    </span>
                    {s.shiftedMinutes > 0 ? (
                      <span className="text-attention">
                        {" "}
                        (<s>{formatWallClock(s.startsAt, timeZone)}</s>)
                      </span>
                    ) : null}
                    {s.state === "finished" || s.state === "cut-short" ? " ✓" : ""}
                  </li>
                ))}
              </ul>
              <ul className="grid grid-cols-[repeat(auto-fill,minmax(5.5rem,1fr))] gap-1.5">
                {group.drives.map((drive) => (
                  <DriveTile key={drive.key} drive={drive} size="small" />
                ))}
              </ul>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
