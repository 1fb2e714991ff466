"use client";
import type { ReactNode } from "react";
import type { Drive } from "@/lib/paddock/drive";
import type { RunGroup } from "@/lib/paddock/run-group-plan";

/**
 * After a tap on a car: one button per other group ("Move to Group 3") and Cancel. Sticks to the
 * bottom of the screen, where a thumb reaches on a phone; every button is keyboard operable.
 */
export function MoveChoices({
  drive,
  groups,
  fromIndex,
  explanation,
  onMove,
  onCancel,
  children,
}: {
  drive: Drive;
  groups: RunGroup[];
  fromIndex: number;
  explanation: string | undefined;
  onMove: (toIndex: number) => void;
  onCancel: () => void;
  /** More for this car (such as "Ask for re-inspection"). */
  children?: ReactNode;
}) {
  return (
    <section
      className="sticky bottom-0 z-20 space-y-2 rounded-t-xl border-2 border-accent bg-white p-3 shadow-lg"
      aria-label="Move the selected car"
      data-testid="move-choices"
    >
      <p className="text-lg font-semibold">
        Car <span className="tabular">{drive.carNumber}</span>, {drive.driverName} — now in{" "}
        {groups[fromIndex]?.name ?? "no group"}
      </p>
      {explanation ? <p className="text-base text-asphalt-800">{explanation}</p> : null}
      <div className="flex flex-wrap gap-2">
        {groups.map((group, index) =>
          index === fromIndex ? null : (
            <button
              key={group.name}
              type="button"
              className="btn-primary"
              onClick={() => onMove(index)}
            >
              Move to {group.name}
            </button>
          ),
        )}
        <button type="button" className="btn-secondary" onClick={onCancel}>
          Cancel
        </button>
      </div>
      {children}
    </section>
  );
}
