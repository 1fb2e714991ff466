import type { BoardSlot } from "@/lib/board/board-day";
import { DriveTile } from "./drive-tile";
import { SessionStateChip } from "./session-state-chip";
import { SessionTimes } from "./session-times";

/**
 * One of the board's three panels (on track now, next to call, after that): the group's name
 * large, its round and times in the venue's zone, the clerk's mark, and its cars as tiles. Cars
 * that may no longer run are named below the tiles with why.
 */
export function SessionPanel({
  label,
  slot,
  timeZone,
  empty,
  testId,
  emphasis,
}: {
  label: string;
  slot: BoardSlot | null;
  timeZone: string;
  empty: string;
  testId: string;
  emphasis: boolean;
}) {
  const flagged = slot ? slot.group.drives.filter((d) => d.flag) : [];
  // A big group (a long track allows 20 and more) goes five to a row in smaller type on a TV.
  const dense = (slot?.group.drives.length ?? 0) > 15;
  return (
    <section
      aria-label={label}
      data-testid={testId}
      className={`flex min-w-0 flex-col gap-2 rounded-xl border-2 bg-white p-3 2xl:p-4 ${emphasis ? "border-asphalt-950 border-4" : "border-asphalt-300"}`}
    >
      <h2 className="text-base font-bold uppercase tracking-wider text-asphalt-700 2xl:text-xl">
        {label}
      </h2>
      {slot ? (
        <>
          <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
            <p
              className="font-narrow text-4xl font-bold leading-none 2xl:text-6xl"
              data-testid="group-name"
            >
              {slot.group.name}
            </p>
            <SessionStateChip state={slot.session.state} />
          </div>
          <p className="text-lg 2xl:text-2xl">
            Round {slot.session.round} · <SessionTimes session={slot.session} timeZone={timeZone} />
          </p>
          {slot.session.note ? (
            <p className="text-lg font-semibold text-attention 2xl:text-xl">
              Clerk’s note: {slot.session.note}
            </p>
          ) : null}
          <ul
            className={`grid grid-cols-[repeat(auto-fill,minmax(5.5rem,1fr))] gap-1.5 2xl:gap-2 ${dense ? "2xl:grid-cols-5" : "2xl:grid-cols-4"}`}
          >
            {slot.group.drives.map((drive) => (
              <DriveTile key={drive.key} drive={drive} size={dense ? "small" : "large"} />
            ))}
          </ul>
          {flagged.length > 0 ? (
            <ul className="space-y-0.5 text-base font-semibold text-stopped 2xl:text-lg">
              {flagged.map((d) => (
                <li key={d.key}>
                  Car {d.carNumber}: {d.flag?.words}
                </li>
              ))}
            </ul>
          ) : null}
        </>
      ) : (
        <p className="text-xl 2xl:text-3xl">{empty}</p>
      )}
    </section>
  );
}
