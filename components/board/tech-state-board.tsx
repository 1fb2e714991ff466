import { VerdictBadge } from "@/components/verdict-badge";
import { verdictLook } from "@/components/verdict-look";
import type { BoardCar } from "@/lib/board/board-schema";
import { type VerdictWord, verdictLabels } from "@/lib/verdict-word";
import { StateTile } from "./state-tile";

const order: VerdictWord[] = ["cleared", "moved-up", "re-measure", "held", "waiting"];

/** Every car's state at the tech line, grouped by state; each tile carries its state's colour,
 *  icon and word. Scrutineering only: it never says a car is ready to run. */
export function TechStateBoard({ cars }: { cars: BoardCar[] }) {
  return (
    <section aria-label="Tech line" className="space-y-3" data-testid="tech-state">
      <h2 className="text-2xl font-bold 2xl:text-3xl">Tech line</h2>
      <p className="text-base" data-testid="board-scope">
        Scrutineering only: “Cleared” means the car passed the tech line, not that it is ready to
        run. A car also needs to be signed on (waiver and fee) before the clerk of course puts it in
        a run group; the run sheet says who runs.
      </p>
      {order.map((status) => {
        const group = cars.filter((c) => c.status === status);
        if (group.length === 0) return null;
        const look = verdictLook[status];
        return (
          <section key={status} aria-label={verdictLabels[status]} data-testid={`board-${status}`}>
            <h3 className="mb-2 flex items-center gap-3 text-xl font-bold">
              <VerdictBadge status={status} /> <span className="tabular">{group.length}</span>
            </h3>
            <ul className="grid grid-cols-[repeat(auto-fill,minmax(5.5rem,1fr))] gap-1.5 2xl:grid-cols-12">
              {group.map((car) => (
                <StateTile
                  key={car.carNumber}
                  carNumber={car.carNumber}
                  className={car.finalClass ?? car.declaredClass}
                  look={{ ...look, word: verdictLabels[status] }}
                  size="small"
                  state={status}
                />
              ))}
            </ul>
          </section>
        );
      })}
    </section>
  );
}
