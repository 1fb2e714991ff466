import type { TechResultCar, TechResults } from "@/lib/results/shape-tech-results";
import { PrintBlock } from "./print-block";
import { PrintCarNumber } from "./print-car-number";

const cars = (n: number) => `${n} ${n === 1 ? "car" : "cars"}`;

/** The tech results, one block per class (lowest first), then the held cars and the undecided. */
export function TechResultsSheet({ results }: { results: TechResults }) {
  const { counts } = results;
  return (
    <div className="space-y-4">
      <p className="text-lg" data-testid="print-summary">
        {`${cars(counts.total)} entered: ${counts.cleared} cleared, ${counts["moved-up"]} moved up, ${counts.held} held, ${counts.waiting + counts["re-measure"]} not decided yet.`}
      </p>
      {results.classes.map((c) => (
        <PrintBlock
          key={c.classId}
          id={`class-${c.classId}`}
          heading={`${c.className} — ${cars(c.cars.length)}`}
        >
          {c.cars.length === 0 ? (
            <p className="text-base">No car runs in this class.</p>
          ) : (
            <CarRows rows={c.cars} />
          )}
        </PrintBlock>
      ))}
      <PrintBlock id="held" heading={`Held — ${cars(results.held.length)}`}>
        <p className="mb-2 text-base">These cars do not run until fixed and re-presented.</p>
        {results.held.length === 0 ? (
          <p className="text-base">No car is held.</p>
        ) : (
          <CarRows rows={results.held} />
        )}
      </PrintBlock>
      <PrintBlock id="not-yet" heading={`Not decided yet — ${cars(results.notYet.length)}`}>
        {results.notYet.length === 0 ? (
          <p className="text-base">Every car has a decision.</p>
        ) : (
          <CarRows rows={results.notYet} />
        )}
      </PrintBlock>
    </div>
  );
}

function CarRows({ rows }: { rows: TechResultCar[] }) {
  return (
    <ul className="divide-y divide-asphalt-300">
      {rows.map((car) => (
        <li
          key={car.entryId}
          className="print-row flex items-start gap-3 py-1.5"
          data-testid="print-car"
          data-car-number={car.carNumber}
        >
          <PrintCarNumber carNumber={car.carNumber} />
          <div className="min-w-0 flex-1">
            <p className="text-lg font-semibold">
              {car.drivers} <span className="font-normal text-asphalt-800">· {car.car}</span>
            </p>
            <p className="text-base">
              <strong>{stateLine(car)}</strong>{" "}
              {car.state === "cleared" && !car.decidedBy ? null : car.reason}
            </p>
            {car.decidedBy ? <p className="text-base">Decided by {car.decidedBy}.</p> : null}
          </div>
        </li>
      ))}
    </ul>
  );
}

function stateLine(car: TechResultCar): string {
  // A moved-up, held or waiting car's reason starts with its state ("Moves up from Kestrel to
  // Merlin — …", "Held — …"): the bold line only adds what the reason does not say.
  if (car.state === "moved-up") return "Moved up:";
  if (car.state === "cleared") return `Cleared in ${car.runsIn ?? car.declaredClass}.`;
  return `Entered in ${car.declaredClass}:`;
}
