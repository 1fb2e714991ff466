"use client";
import { DndContext, type DragEndEvent, MouseSensor, useSensor, useSensors } from "@dnd-kit/core";
import { type ReactNode, useMemo, useState } from "react";
import type { Drive } from "@/lib/paddock/drive";
import type { RunGroup } from "@/lib/paddock/run-group-plan";
import type { ConstraintNote } from "./clerk-view-models";
import { ConstraintList } from "./constraint-list";
import { MoveChoices } from "./move-choices";
import { moveDrive } from "./move-drive";
import { moveGroup } from "./move-group";
import { type GroupSession, RunGroupCard } from "./run-group-card";

const instructions =
  "Press Enter on a car to select it, then choose Move to and the group. With a mouse you can also drag a car onto another group.";

/**
 * The run groups as cards, with the live warnings above them. A car moves by tap-then-"Move to"
 * (phone, keyboard) or by dragging with a mouse (desk); groups reorder with Earlier / Later.
 * Every change goes to `onChange` (which checks and saves); nothing is kept here but the selection.
 */
export function RunGroupsEditor({
  groups,
  drives,
  capCars,
  timeZone,
  sessionsByGroup,
  explanations,
  notes,
  flagged,
  notReady,
  onChange,
  carControls,
}: {
  groups: RunGroup[];
  drives: Drive[];
  capCars: number;
  timeZone: string;
  sessionsByGroup: GroupSession[][];
  explanations: Record<string, string>;
  notes: ConstraintNote[];
  flagged: Map<string, string>;
  /** Cars in the draft that are not ready now, by drive id (see RunGroupCard). */
  notReady: Map<string, { carNumber: number; why: string }>;
  onChange: (groups: RunGroup[], what: string) => void;
  /** More for the selected car, under "Move to" (such as "Ask for re-inspection"). */
  carControls?: (drive: Drive) => ReactNode;
}) {
  const [selected, setSelected] = useState<string | null>(null);
  const drivesById = useMemo(() => new Map(drives.map((d) => [d.driveId, d])), [drives]);
  const ruleBreakers = useMemo(
    () => new Set(notes.filter((n) => n.kind !== "soft").flatMap((n) => n.driveIds)),
    [notes],
  );
  // Mouse only, after 8 px: a tap or a click stays a tap (select), the keyboard uses "Move to".
  const sensors = useSensors(useSensor(MouseSensor, { activationConstraint: { distance: 8 } }));

  const move = (driveId: string, toIndex: number) => {
    const next = moveDrive(groups, driveId, toIndex);
    setSelected(null);
    if (next === groups) return;
    const drive = drivesById.get(driveId);
    onChange(next, `Car ${drive?.carNumber ?? driveId} moved to ${groups[toIndex]?.name}`);
  };
  const onDragEnd = (event: DragEndEvent) => {
    const toIndex = event.over?.data.current?.index;
    if (typeof toIndex === "number") move(String(event.active.id), toIndex);
  };
  const takeOut = (driveId: string) => {
    const next = groups.map((g) => ({ ...g, driveIds: g.driveIds.filter((id) => id !== driveId) }));
    onChange(next, `Car ${notReady.get(driveId)?.carNumber ?? ""} taken out of the run groups`);
  };
  const onMoveGroup = (index: number, step: -1 | 1) => {
    const next = moveGroup(groups, index, step);
    if (next !== groups)
      onChange(next, `${groups[index]?.name} now runs ${step < 0 ? "earlier" : "later"}`);
  };

  const selectedDrive = selected ? drivesById.get(selected) : undefined;
  const fromIndex = selected ? groups.findIndex((g) => g.driveIds.includes(selected)) : -1;
  return (
    <div className="space-y-3">
      <ConstraintList notes={notes} />
      <DndContext
        sensors={sensors}
        onDragEnd={onDragEnd}
        accessibility={{ screenReaderInstructions: { draggable: instructions } }}
      >
        <div className="grid gap-3 md:grid-cols-2 xl:grid-cols-3" data-testid="run-groups">
          {groups.map((group, index) => (
            <RunGroupCard
              key={group.name}
              group={group}
              index={index}
              count={groups.length}
              capCars={capCars}
              drivesById={drivesById}
              sessions={sessionsByGroup[index] ?? []}
              timeZone={timeZone}
              explanations={explanations}
              ruleBreakers={ruleBreakers}
              flagged={flagged}
              selectedDriveId={selected}
              onSelect={(id) => setSelected((current) => (current === id ? null : id))}
              onMoveGroup={onMoveGroup}
              notReady={notReady}
              onTakeOut={takeOut}
            />
          ))}
        </div>
      </DndContext>
      {selectedDrive && fromIndex >= 0 ? (
        <MoveChoices
          drive={selectedDrive}
          groups={groups}
          fromIndex={fromIndex}
          explanation={explanations[selectedDrive.driveId]}
          onMove={(toIndex) => move(selectedDrive.driveId, toIndex)}
          onCancel={() => setSelected(null)}
        >
          {carControls?.(selectedDrive)}
        </MoveChoices>
      ) : null}
    </div>
  );
}
