import type { ClerkCar } from "@/lib/run-sheet/clerk-view";
import { EntryList } from "../entry-list";
import {
  AttentionIcon,
  ClearedIcon,
  MovedUpIcon,
  StoppedIcon,
  WaitingIcon,
} from "../icons/state-icons";
import { CarStateList } from "./car-state-list";
import { carStateWhy } from "./car-state-why";

const isTechClear = (car: ClerkCar) => car.status === "cleared" || car.status === "moved-up";

/**
 * Every car of the event at a glance: counts first, then the lists. Ready means cleared or moved
 * up at the tech line, signed on and not withdrawn; the rest say why they cannot run yet.
 */
export function AtAGlance({ cars }: { cars: ClerkCar[] }) {
  const active = cars.filter((car) => !car.withdrawn);
  const ready = active.filter((car) => car.ready);
  const movedUp = active.filter((car) => car.status === "moved-up");
  const held = active.filter((car) => car.status === "held");
  const waiting = active.filter((car) => car.status === "waiting" || car.status === "re-measure");
  const notSignedOn = active.filter((car) => isTechClear(car) && !car.signOn.signedOn);
  const withdrawn = cars.filter((car) => car.withdrawn);
  const tiles = [
    {
      label: "Ready",
      count: ready.length,
      icon: <ClearedIcon />,
      look: "border-cleared-line bg-cleared-soft text-cleared",
    },
    {
      label: "Held",
      count: held.length,
      icon: <StoppedIcon />,
      look: "border-stopped-line bg-stopped-soft text-stopped",
    },
    {
      label: "Waiting",
      count: waiting.length,
      icon: <WaitingIcon />,
      look: "border-asphalt-400 bg-white text-asphalt-900",
    },
    {
      label: "Not signed on",
      count: notSignedOn.length,
      icon: <AttentionIcon />,
      look: "border-attention-line bg-attention-soft text-attention",
    },
    {
      label: "Of these, moved up a class",
      count: movedUp.length,
      icon: <MovedUpIcon />,
      look: "border-cleared-line bg-cleared-soft text-cleared",
    },
  ];
  return (
    <section className="space-y-3" aria-labelledby="glance-heading" data-testid="at-a-glance">
      <h2 id="glance-heading" className="text-2xl font-bold">
        Cars at a glance
      </h2>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-5">
        {tiles.map((tile) => (
          <div
            key={tile.label}
            className={`rounded-xl border-2 p-3 ${tile.look}`}
            data-testid="glance-tile"
          >
            <dt className="flex items-center gap-1.5 text-base font-semibold">
              {tile.icon}
              {tile.label}
            </dt>
            <dd className="tabular text-3xl font-bold">{tile.count}</dd>
          </div>
        ))}
      </dl>
      <p className="text-base">
        Only ready cars go into run groups: cleared or moved up at the tech line, and signed on
        (waiver and fee).
      </p>
      <CarStateList
        title="Cleared, but not signed on: keep out of run groups"
        cars={notSignedOn}
        testId="cleared-not-signed-on"
        empty="Every cleared car is signed on."
        why={(car) => `${car.signOn.missing.join("; ")}. The sign-on desk clears these.`}
      />
      <details className="card" data-testid="ready-list">
        <summary className="flex min-h-touch cursor-pointer items-center text-xl font-bold">
          Ready to run (<span className="tabular">{ready.length}</span>)
          <span aria-hidden="true" className="ml-auto text-asphalt-700">
            ▾
          </span>
        </summary>
        <EntryList rows={ready.map(toRow)} emptyText="No car is ready to run yet." />
      </details>
      <CarStateList
        title="Held"
        cars={held}
        testId="held-list"
        empty="No car is held."
        why={carStateWhy}
      />
      <CarStateList
        title="Waiting or re-measure"
        cars={waiting}
        testId="waiting-list"
        empty="No car is waiting."
        why={carStateWhy}
      />
      {withdrawn.length > 0 ? (
        <CarStateList
          title="Withdrawn"
          cars={withdrawn}
          testId="withdrawn-list"
          empty=""
          why={carStateWhy}
        />
      ) : null}
    </section>
  );
}

function toRow(car: ClerkCar) {
  return {
    entryId: car.entryId,
    carNumber: car.carNumber,
    declaredClass: car.declaredClassName,
    finalClass: car.runsInClassName,
    car: car.car,
    drivers: car.drivers,
    status: car.status,
    reason: car.status === "moved-up" ? car.reason : null,
    needsChief: false,
    signOn: car.signOn,
  };
}
