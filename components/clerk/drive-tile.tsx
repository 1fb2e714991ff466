"use client";
import { useDraggable } from "@dnd-kit/core";
import type { Drive } from "@/lib/paddock/drive";
import { CarNumberChip } from "../car-number-chip";
import { StoppedIcon } from "../icons/state-icons";
import { formatLapEstimate } from "./format-lap-estimate";

const experienceLabel: Record<Drive["experience"], string> = {
  novice: "Novice",
  intermediate: "Intermediate",
  advanced: "Advanced",
  expert: "Expert",
};

/**
 * One drive in a run group: car number large, class, driver, experience and lap estimate; once
 * tapped (or Enter), why it sits here and "Move to …"; on a desk it can also be dragged.
 */
export function DriveTile({
  drive,
  explanation,
  breaksRule,
  flagged,
  selected,
  onSelect,
}: {
  drive: Drive;
  explanation: string | undefined;
  breaksRule: boolean;
  flagged: string | undefined;
  selected: boolean;
  onSelect: (driveId: string) => void;
}) {
  const { attributes, listeners, setNodeRef, transform, isDragging } = useDraggable({
    id: drive.driveId,
  });
  const style = transform
    ? { transform: `translate3d(${transform.x}px, ${transform.y}px, 0)` }
    : undefined;
  const border = breaksRule || flagged ? "border-stopped-line" : "border-asphalt-300";
  return (
    <li
      ref={setNodeRef}
      style={style}
      className={`rounded-lg border-2 bg-white ${border} ${isDragging ? "z-10 shadow-lg" : ""} ${
        selected ? "ring-4 ring-accent" : ""
      }`}
      data-testid="drive-tile"
      data-drive-id={drive.driveId}
      data-car-number={drive.carNumber}
    >
      <button
        type="button"
        {...listeners}
        {...attributes}
        aria-pressed={selected}
        aria-label={`Car ${drive.carNumber}, ${drive.driverName}${selected ? ", selected" : ""}`}
        onClick={() => onSelect(drive.driveId)}
        className="flex min-h-touch w-full cursor-grab items-start gap-3 p-2 text-left"
      >
        <CarNumberChip carNumber={drive.carNumber} />
        <span className="min-w-0 flex-1">
          <span className="block truncate text-lg font-semibold">{drive.driverName}</span>
          <span className="block text-base text-asphalt-800">
            {drive.className} · {experienceLabel[drive.experience]} ·{" "}
            <span className="tabular">{formatLapEstimate(drive.lapTimeMs)}</span>
          </span>
        </span>
      </button>
      {breaksRule ? (
        <p className="flex items-center gap-1.5 px-2 text-base font-semibold text-stopped">
          <StoppedIcon className="size-5 shrink-0" /> Breaks a rule: see the warnings
        </p>
      ) : null}
      {flagged ? (
        <p
          className="flex items-center gap-1.5 px-2 text-base font-semibold text-stopped"
          data-testid="drive-flagged"
        >
          <StoppedIcon className="size-5 shrink-0" /> {flagged}
        </p>
      ) : null}
      {selected && explanation ? (
        <p className="px-2 pb-2 text-sm text-asphalt-700" data-testid="drive-explanation">
          {explanation}
        </p>
      ) : null}
    </li>
  );
}
