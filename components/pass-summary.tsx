import type { ClassMove } from "@/lib/entries/class-move";
import { formatEventDay } from "@/lib/passes/format-event-day";
import { ClassLine } from "./class-line";

/** The car number and class of a pass, big enough to read from arm's length; where the verdict
 *  moved the car up, the class it declared and the class it runs in. */
export function PassCarLine({ carNumber, move }: { carNumber: number; move: ClassMove }) {
  return (
    <div className="flex items-center gap-4">
      <span
        className="tabular min-w-32 rounded-xl bg-asphalt-950 px-4 py-2 text-center text-8xl font-bold leading-none text-asphalt-50"
        data-testid="pass-car-number"
      >
        {carNumber}
      </span>
      <div className="min-w-0 break-words">
        <ClassLine move={move} size="pass" />
      </div>
    </div>
  );
}

/** What else a pass names: the event and when it stops being good. No personal details: the
 *  pass check page may be opened by anyone who scans the QR. */
export function PassFacts({
  eventName,
  eventDate,
  validUntil,
}: {
  eventName: string | null;
  eventDate: string | null;
  validUntil: string;
}) {
  return (
    <dl className="space-y-2 text-lg" data-testid="pass-summary">
      {eventName ? (
        <div>
          <dt className="text-base font-semibold text-asphalt-700">Event</dt>
          <dd className="font-semibold">
            {eventName}
            {eventDate ? <span className="block">{formatEventDay(eventDate)}</span> : null}
          </dd>
        </div>
      ) : null}
      <div>
        <dt className="text-base font-semibold text-asphalt-700">Valid until</dt>
        <dd className="tabular font-semibold">{validUntil}</dd>
      </div>
    </dl>
  );
}
