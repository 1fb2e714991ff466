"use client";
import { useDroppable } from "@dnd-kit/core";
import type { Drive } from "@/lib/paddock/drive";
import { formatWallClock } from "@/lib/paddock/format-wall-clock";
import type { RunGroup } from "@/lib/paddock/run-group-plan";
import { DriveTile } from "./drive-tile";
import { NotReadyTile } from "./not-ready-tile";

export type GroupSession = { round: number; startsAt: string; endsAt: string };

/** One run group as a card: its name, place in the rotation, session times and cars. */
export function RunGroupCard({
  group,
  index,
  count,
  capCars,
  drivesById,
  sessions,
  timeZone,
  explanations,
  ruleBreakers,
  flagged,
  selectedDriveId,
  onSelect,
  onMoveGroup,
  notReady,
  onTakeOut,
}: {
  group: RunGroup;
  index: number;
  count: number;
  capCars: number;
  drivesById: Map<string, Drive>;
  sessions: GroupSession[];
  timeZone: string;
  explanations: Record<string, string>;
  ruleBreakers: Set<string>;
  flagged: Map<string, string>;
  selectedDriveId: string | null;
  onSelect: (driveId: string) => void;
  onMoveGroup: (index: number, step: -1 | 1) => void;
  /** Cars in the draft that are not ready now, by drive id: number and why. */
  notReady: Map<string, { carNumber: number; why: string }>;
  onTakeOut: (driveId: string) => void;
}) {
  const { setNodeRef, isOver } = useDroppable({ id: `group-${index}`, data: { index } });
  const over = group.driveIds.length > capCars;
  return (
    <section
      ref={setNodeRef}
      className={`card space-y-3 ${isOver ? "border-accent bg-accent-soft" : ""}`}
      aria-labelledby={`group-${index}-heading`}
      data-testid="run-group"
      data-group-name={group.name}
    >
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 id={`group-${index}-heading`} className="text-2xl font-bold">
            {group.name}
          </h3>
          <p className={`text-base ${over ? "font-semibold text-stopped" : "text-asphalt-800"}`}>
            <span className="tabular">{group.driveIds.length}</span> of{" "}
            <span className="tabular">{capCars}</span> cars · runs {ordinal(index + 1)} in each
            round
          </p>
        </div>
        <div className="flex gap-2">
          <button
            type="button"
            className="btn-secondary min-w-touch px-3"
            disabled={index === 0}
            onClick={() => onMoveGroup(index, -1)}
            aria-label={`Run ${group.name} earlier`}
          >
            ↑ Earlier
          </button>
          <button
            type="button"
            className="btn-secondary min-w-touch px-3"
            disabled={index === count - 1}
            onClick={() => onMoveGroup(index, 1)}
            aria-label={`Run ${group.name} later`}
          >
            ↓ Later
          </button>
        </div>
      </header>
      {sessions.length > 0 ? (
        <p className="tabular text-base" data-testid="group-sessions">
          {sessions
            .map(
              (s) =>
                `R${s.round} ${formatWallClock(s.startsAt, timeZone)}–${formatWallClock(s.endsAt, timeZone)}`,
            )
            .join(" · ")}
        </p>
      ) : null}
      <ul className="space-y-2">
        {group.driveIds.map((driveId) => {
          const drive = drivesById.get(driveId);
          if (!drive) {
            const car = notReady.get(driveId);
            return (
              <NotReadyTile
                key={driveId}
                driveId={driveId}
                carNumber={car?.carNumber ?? null}
                why={car?.why ?? "No longer in the event."}
                onTakeOut={onTakeOut}
              />
            );
          }
          return (
            <DriveTile
              key={driveId}
              drive={drive}
              explanation={explanations[driveId]}
              breaksRule={ruleBreakers.has(driveId)}
              flagged={flagged.get(driveId)}
              selected={selectedDriveId === driveId}
              onSelect={onSelect}
            />
          );
        })}
        {group.driveIds.length === 0 ? (
          <li className="text-base text-asphalt-700">No cars: move one here or build again.</li>
        ) : null}
      </ul>
    </section>
  );
}

function ordinal(n: number): string {
  const suffix =
    n % 10 === 1 && n !== 11
      ? "st"
      : n % 10 === 2 && n !== 12
        ? "nd"
        : n % 10 === 3 && n !== 13
          ? "rd"
          : "th";
  return `${n}${suffix}`;
}
