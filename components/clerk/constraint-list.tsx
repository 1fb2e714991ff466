import { AttentionIcon, ClearedIcon, StoppedIcon } from "../icons/state-icons";
import type { ConstraintNote } from "./clerk-view-models";

const heading: Record<ConstraintNote["kind"], string> = {
  blocks: "Blocks publishing",
  "gave-way": "Rule gave way (no way round it with these cars)",
  soft: "Worth a look",
};

/** The live constraint warnings after each change: hard rules in the stopped colour, soft ones in
 *  attention, each with its word and icon. */
export function ConstraintList({ notes }: { notes: ConstraintNote[] }) {
  const hardMet = !notes.some((note) => note.kind !== "soft");
  return (
    <div className="space-y-2" aria-live="polite">
      {hardMet ? (
        <p
          className="flex items-center gap-2 rounded-lg border-2 border-cleared-line bg-cleared-soft p-3 text-lg font-semibold text-cleared"
          data-testid="constraints-ok"
        >
          <ClearedIcon className="size-6 shrink-0" /> Every hard rule is met: no group over the cap,
          no car or driver twice in a group or in back-to-back groups.
        </p>
      ) : null}
      {notes.length > 0 ? (
        <ul className="space-y-2" data-testid="constraint-warnings">
          {notes.map((note) => (
            <ConstraintItem
              key={`${note.kind}:${note.rule}:${note.driveIds.join(",")}:${note.text}`}
              note={note}
            />
          ))}
        </ul>
      ) : null}
    </div>
  );
}

function ConstraintItem({ note }: { note: ConstraintNote }) {
  const hard = note.kind !== "soft";
  return (
    <li
      className={`flex gap-2 rounded-lg border-2 p-3 text-base ${
        hard
          ? "border-stopped-line bg-stopped-soft text-stopped"
          : "border-attention-line bg-attention-soft text-attention"
      }`}
      data-kind={note.kind}
      data-testid="constraint-warning"
    >
      {hard ? (
        <StoppedIcon className="mt-0.5 size-6 shrink-0" />
      ) : (
        <AttentionIcon className="mt-0.5 size-6 shrink-0" />
      )}
      <span>
        <strong className="font-semibold">{heading[note.kind]}: </strong>
        {note.text}
      </span>
    </li>
  );
}
