import type { ChiefReport, ChiefReportCar } from "@/lib/results/shape-chief-report";
import { verdictLabels } from "@/lib/verdict-word";
import { PrintBlock } from "./print-block";
import { PrintCarNumber } from "./print-car-number";

/** The chief scrutineer's report: one block per car examined, with each reason for rejection,
 *  and a line for the chief scrutineer to sign when handing it to the clerk of course. */
export function ChiefReportSheet({ report }: { report: ChiefReport }) {
  const { counts } = report;
  return (
    <div className="space-y-4">
      <p className="text-lg" data-testid="print-summary">
        {`${counts.examined} ${counts.examined === 1 ? "car" : "cars"} examined: ${counts.cleared} cleared, ${counts["moved-up"]} moved up, ${counts.held} held, ${counts.waiting + counts["re-measure"]} not decided yet; ${counts.decidedByChief} decided by the chief scrutineer.`}
      </p>
      {report.cars.length === 0 ? (
        <p className="text-lg">No car has been examined at the tech line yet.</p>
      ) : null}
      {report.cars.map((car) => (
        <PrintBlock
          key={car.entryId}
          id={`car-${car.carNumber}`}
          heading={
            <>
              <PrintCarNumber carNumber={car.carNumber} />
              <span>{stateWords(car)}</span>
            </>
          }
        >
          <CarReport car={car} />
        </PrintBlock>
      ))}
      <section className="print-block space-y-6 pt-4 text-lg" aria-label="Signature">
        <p>For the clerk of the course. Chief scrutineer:</p>
        <p className="flex flex-wrap gap-8">
          <span>Name ______________________</span>
          <span>Signed ______________________</span>
          <span>Time ________</span>
        </p>
      </section>
    </div>
  );
}

function stateWords(car: ChiefReportCar): string {
  if (car.state === "cleared") return `Cleared in ${car.runsIn ?? car.declaredClass}`;
  if (car.state === "moved-up") return `Moved up: ${car.declaredClass} → ${car.runsIn ?? "?"}`;
  return `${verdictLabels[car.state]} (entered in ${car.declaredClass})`;
}

function CarReport({ car }: { car: ChiefReportCar }) {
  return (
    <div className="space-y-1 text-base" data-testid="print-car" data-car-number={car.carNumber}>
      <p className="text-lg font-semibold">
        {car.drivers} <span className="font-normal text-asphalt-800">· {car.car}</span>
      </p>
      <p>
        <strong>Verdict:</strong> {car.reason}
      </p>
      <div>
        <strong>Reasons for rejection:</strong>{" "}
        {car.rejections.length === 0 ? (
          "none."
        ) : (
          <ul className="ml-5 list-disc">
            {car.rejections.map((r) => (
              <li key={`${r.what}|${r.why}`}>
                {r.what}: {r.why}
              </li>
            ))}
          </ul>
        )}
      </div>
      {car.open.length > 0 ? (
        <div>
          <strong>Too close to call:</strong>
          <ul className="ml-5 list-disc">
            {car.open.map((o) => (
              <li key={o}>{o}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {car.decision ? (
        <p>
          <strong>Chief scrutineer&apos;s decision</strong> ({car.decision.by}):{" "}
          {car.decision.reason} — the records alone said: {car.decision.computed}
        </p>
      ) : null}
      {car.notApplied ? (
        <p>
          <strong>Override not applied</strong> ({car.notApplied.by}): {car.notApplied.problem}
        </p>
      ) : null}
      <p className="text-asphalt-800">
        {`${car.records} ${car.records === 1 ? "record" : "records"} at the tech line.`}
      </p>
    </div>
  );
}
