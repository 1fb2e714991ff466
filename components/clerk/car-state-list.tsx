import type { ClerkCar } from "@/lib/run-sheet/clerk-view";
import { CarNumberChip } from "../car-number-chip";
import { VerdictBadge } from "../verdict-badge";

/** One list of cars in the at-a-glance section: number, verdict, drivers and why. */
export function CarStateList({
  title,
  cars,
  testId,
  empty,
  why,
}: {
  title: string;
  cars: ClerkCar[];
  testId: string;
  empty: string;
  why: (car: ClerkCar) => string | null;
}) {
  return (
    <details className="card" data-testid={testId} open={cars.length > 0 && cars.length <= 6}>
      <summary className="flex min-h-touch cursor-pointer items-center text-xl font-bold">
        {title} (<span className="tabular">{cars.length}</span>)
        <span aria-hidden="true" className="ml-auto text-asphalt-700">
          ▾
        </span>
      </summary>
      {cars.length === 0 ? <p className="text-base text-asphalt-700">{empty}</p> : null}
      <ul className="mt-2 divide-y divide-asphalt-200">
        {cars.map((car) => {
          const because = why(car);
          return (
            <li key={car.entryId} className="space-y-1 py-2" data-car-number={car.carNumber}>
              <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
                <CarNumberChip carNumber={car.carNumber} small />
                <VerdictBadge status={car.status} toClass={car.runsInClassName} />
                <span className="text-lg font-semibold">{car.drivers}</span>
                <span className="text-base text-asphalt-800">
                  {car.car} · {car.runsInClassName ?? car.declaredClassName}
                </span>
              </div>
              {because ? <p className="text-base font-semibold">{because}</p> : null}
            </li>
          );
        })}
      </ul>
    </details>
  );
}
