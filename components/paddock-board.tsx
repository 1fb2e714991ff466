"use client";
import { useQuery } from "@tanstack/react-query";
import { VerdictBadge } from "@/components/verdict-badge";
import { boardQuery } from "@/lib/query/board-queries";
import { type VerdictWord, verdictLabels } from "@/lib/verdict-word";

const order: VerdictWord[] = ["cleared", "moved-up", "re-measure", "held", "waiting"];

/** The paddock board for everyone: cars grouped by their state at the tech line, updating by
 *  itself. Scrutineering only: it never says a car is ready to run (sign-on and the run sheet
 *  decide that). */
export function PaddockBoard({ eventId }: { eventId: string }) {
  const { data, isError, dataUpdatedAt } = useQuery(boardQuery(eventId));
  if (!data)
    return (
      <p className="card">
        {isError ? "The board cannot be reached right now." : "Loading the board…"}
      </p>
    );
  return (
    <div className="space-y-6" data-testid="paddock-board">
      <p className="text-base text-asphalt-700" aria-live="polite">
        Updated{" "}
        {new Date(dataUpdatedAt).toLocaleTimeString("en-GB", {
          hour: "2-digit",
          minute: "2-digit",
          second: "2-digit",
        })}
        {isError ? " · cannot reach the server, showing the last board" : ""}
      </p>
      {order.map((status) => {
        const cars = data.cars.filter((c) => c.status === status);
        if (cars.length === 0) return null;
        return (
          <section key={status} aria-label={verdictLabels[status]} data-testid={`board-${status}`}>
            <h2 className="mb-2 flex items-center gap-3 text-2xl font-bold">
              <VerdictBadge status={status} /> <span className="tabular">{cars.length}</span>
            </h2>
            <ul className="grid grid-cols-3 gap-2 sm:grid-cols-6 lg:grid-cols-8">
              {cars.map((car) => (
                <li
                  key={car.carNumber}
                  className="card p-2 text-center"
                  data-car-number={car.carNumber}
                >
                  <span className="tabular block font-narrow text-4xl font-bold">
                    {car.carNumber}
                  </span>
                  <span className="block text-base">{car.finalClass ?? car.declaredClass}</span>
                </li>
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
