// Random fields of drives for the builder's tests: cars with one or two drivers, some drivers in two
// cars, classes on a ladder, experience levels, lap-time estimates (some missing, some tied).
import fc from "fast-check";
import { type Drive, experienceLevels } from "../../lib/paddock/drive";

export type CarSpec = {
  drivers: number[];
  classRank: number;
  experience: number[];
  laps: (number | null)[];
};

const carSpec = (driverPool: number, classes: number) =>
  fc.record({
    drivers: fc.oneof(
      { weight: 3, arbitrary: fc.tuple(fc.nat(driverPool - 1)).map((t) => [...t]) },
      {
        weight: 1,
        arbitrary: fc
          .tuple(fc.nat(driverPool - 1), fc.nat(driverPool - 1))
          .filter(([a, b]) => a !== b)
          .map((t) => [...t]),
      },
    ),
    classRank: fc.nat(classes - 1),
    experience: fc.array(fc.nat(3), { minLength: 2, maxLength: 2 }),
    laps: fc.array(fc.option(fc.integer({ min: 0, max: 40 }), { freq: 5 }), {
      minLength: 2,
      maxLength: 2,
    }),
  });

/** Drives from car specs, cut to `n` drives at most. Lap estimates are 90 s + k·0.5 s. */
export function drivesFromCars(cars: CarSpec[], n: number): Drive[] {
  const drives: Drive[] = [];
  cars.forEach((car, c) => {
    car.drivers.forEach((driver, slot) => {
      if (drives.length >= n) return;
      const lap = car.laps[slot] ?? null;
      drives.push({
        driveId: `e${String(c).padStart(3, "0")}:${slot + 1}`,
        entryId: `e${c}`,
        carNumber: c + 1,
        carKey: `car-${c}`,
        driverKey: `driver-${driver}`,
        driverName: `Driver ${driver}`,
        classId: `class-${car.classRank}`,
        className: `Class ${String.fromCharCode(65 + car.classRank)}`,
        classRank: car.classRank,
        experience: experienceLevels[car.experience[slot] ?? 0] ?? "novice",
        lapTimeMs: lap === null ? null : 90_000 + lap * 500,
      });
    });
  });
  return drives;
}

/** Small fields: `minDrives`…`maxDrives` drives from a pool of `minPool`…`minPool + 9` drivers (so
 *  some drive two or more cars). */
export function smallField(minDrives: number, maxDrives: number, minPool = 3) {
  return fc
    .record({
      n: fc.integer({ min: minDrives, max: maxDrives }),
      pool: fc.integer({ min: minPool, max: minPool + 9 }),
      classes: fc.integer({ min: 1, max: 3 }),
    })
    .chain(({ n, pool, classes }) =>
      fc
        .array(carSpec(pool, classes), { minLength: n, maxLength: n })
        .map((cars) => drivesFromCars(cars, n)),
    );
}
