import type { BoardShift } from "@/lib/board/board-day";

const lead: Record<BoardShift["kind"], string> = {
  "red-flag": "Stopped",
  "cut-short": "Cut short",
  late: "Late",
};

/** The day's shifts: red flags, sessions cut short (with the clerk's note) and where a delay
 *  began; every session behind carries the delay in its times. */
export function DayShifts({ shifts }: { shifts: BoardShift[] }) {
  if (shifts.length === 0) return null;
  return (
    <section
      aria-label="Changes to the day"
      data-testid="day-shifts"
      className="rounded-xl border-2 border-attention-line bg-attention-soft p-3 text-attention"
    >
      <h2 className="text-base font-bold uppercase tracking-wider 2xl:text-xl">
        Changes to the day
      </h2>
      <ul className="mt-1 space-y-1 text-lg 2xl:text-2xl">
        {shifts.map((s) => (
          <li key={s.key} data-testid="day-shift" data-kind={s.kind}>
            <strong>
              {lead[s.kind]} — {s.groupName}, round {s.round}:
            </strong>{" "}
            {s.words}
            {s.note ? <span> — “{s.note}”</span> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
