import type { RunSheetDiff, TimeSpan } from "@/lib/paddock/diff-run-sheets";
import { formatWallClock } from "@/lib/paddock/format-wall-clock";
import { CarNumberChip } from "../car-number-chip";

const blockName = { briefing: "Drivers' briefing", lunch: "Lunch break" } as const;

/** What changes for the drivers between two run sheets: who moved, which times changed. */
export function RunSheetDiffList({
  diff,
  timeZone,
  firstVersion,
}: {
  diff: RunSheetDiff;
  timeZone: string;
  firstVersion: boolean;
}) {
  const span = (s: TimeSpan | null) =>
    s ? `${formatWallClock(s.startsAt, timeZone)}–${formatWallClock(s.endsAt, timeZone)}` : "none";
  if (firstVersion) {
    return (
      <p className="text-base" data-testid="run-sheet-diff">
        The first run sheet of the day: every driver on it is new.
      </p>
    );
  }
  const nothing =
    diff.moved.length === 0 && diff.timesChanged.length === 0 && diff.blocksChanged.length === 0;
  return (
    <div className="space-y-3" data-testid="run-sheet-diff">
      {nothing ? (
        <p className="text-base font-semibold">
          Nothing changes for any driver since the last version.
        </p>
      ) : null}
      {diff.moved.length > 0 ? (
        <div>
          <h4 className="text-lg font-bold">Who moved ({diff.moved.length})</h4>
          <ul className="space-y-1" data-testid="diff-moved">
            {diff.moved.map((m) => (
              <li key={m.driveId} className="flex flex-wrap items-center gap-2 text-base">
                <CarNumberChip carNumber={m.carNumber} small />
                <span className="font-semibold">{m.driverName}</span>
                <span>
                  {m.fromGroup ?? "not on the sheet"} → {m.toGroup ?? "off the sheet"}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {diff.timesChanged.length > 0 ? (
        <div>
          <h4 className="text-lg font-bold">Times that change ({diff.timesChanged.length})</h4>
          <ul className="tabular space-y-1 text-base" data-testid="diff-times">
            {diff.timesChanged.map((t) => (
              <li key={`${t.group}-${t.round}`}>
                {t.group}, round {t.round}: {span(t.from)} → {span(t.to)}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {diff.blocksChanged.length > 0 ? (
        <ul className="tabular space-y-1 text-base" data-testid="diff-blocks">
          {diff.blocksChanged.map((b) => (
            <li key={b.kind}>
              {blockName[b.kind]}: {span(b.from)} → {span(b.to)}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
