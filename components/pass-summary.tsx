/** What a pass names, big enough to read from arm's length: car number, class, event, expiry.
 *  No personal details: the pass page may be opened by anyone who scans the QR. */
export function PassSummary({
  carNumber,
  className,
  eventName,
  eventDate,
  validUntil,
}: {
  carNumber: number;
  className: string;
  eventName: string | null;
  eventDate: string | null;
  validUntil: string;
}) {
  return (
    <div className="flex items-center gap-4" data-testid="pass-summary">
      <span
        className="tabular min-w-28 rounded-xl bg-asphalt-950 px-4 py-2 text-center text-7xl font-bold leading-none text-asphalt-50"
        data-testid="pass-car-number"
      >
        {carNumber}
      </span>
      <dl className="min-w-0 space-y-1 text-lg">
        <div>
          <dt className="sr-only">Class</dt>
          <dd className="text-2xl font-bold">{className}</dd>
        </div>
        {eventName ? (
          <div>
            <dt className="sr-only">Event</dt>
            <dd className="font-semibold">
              {eventName}
              {eventDate ? <span className="tabular font-normal"> · {eventDate}</span> : null}
            </dd>
          </div>
        ) : null}
        <div>
          <dt className="inline font-semibold text-asphalt-800">Valid until </dt>
          <dd className="tabular inline">{validUntil}</dd>
        </div>
      </dl>
    </div>
  );
}
