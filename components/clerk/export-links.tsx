/** Where the printable and CSV exports live (the exports' routes: run sheet under /clerk, tech
 *  results and the chief scrutineer's report under /tech, CSV files under /api/events/<id>). */
export function exportLinks(eventId: string) {
  return [
    { label: "Run sheet (print, A4)", href: `/clerk/${eventId}/print/run-sheet` },
    { label: "Run sheet (CSV)", href: `/api/events/${eventId}/run-sheet/csv` },
    { label: "Tech results (print, A4)", href: `/tech/${eventId}/print/results` },
    { label: "Tech results (CSV)", href: `/api/events/${eventId}/tech-results/csv` },
    { label: "Chief scrutineer's report (print)", href: `/tech/${eventId}/print/chief-report` },
    { label: "Chief scrutineer's report (CSV)", href: `/api/events/${eventId}/chief-report/csv` },
  ];
}

/** Links to the print layouts and CSV files of the run sheet, the tech results and the report. */
export function ExportLinks({ eventId, published }: { eventId: string; published: boolean }) {
  return (
    <section
      className="card space-y-2"
      aria-labelledby="exports-heading"
      data-testid="export-links"
    >
      <h2 id="exports-heading" className="text-2xl font-bold">
        Print and export
      </h2>
      {!published ? (
        <p className="text-base">The run sheet prints once a version is published.</p>
      ) : null}
      <ul className="flex flex-wrap gap-2">
        {exportLinks(eventId).map((link) => (
          <li key={link.href}>
            <a className="btn-secondary" href={link.href}>
              {link.label}
            </a>
          </li>
        ))}
      </ul>
      <p className="text-base">
        Tech results are provisional, with their time of issue, until the protest time is over.
      </p>
    </section>
  );
}
