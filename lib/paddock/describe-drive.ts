import type { Drive } from "./drive";
import { formatLapTime } from "./format-lap-time";

/** "Car 12 (J. Doe, novice, 2:05.0 est.)": a drive as the explanations name it. */
export function describeDrive(d: Drive): string {
  const lap = d.lapTimeMs ? `${formatLapTime(d.lapTimeMs)} est.` : "no lap-time estimate";
  return `Car ${d.carNumber} (${d.driverName || "driver not named"}, ${d.experience}, ${lap})`;
}

/** How two conflicting drives relate, seen from `from`: "the same car's other driver (A. Roe)". */
export function relationTo(
  from: Drive,
  other: Drive,
  edge: { sameCar: boolean; sameDriver: boolean },
): string {
  if (edge.sameCar && edge.sameDriver)
    return `the same car and driver entered again (drive ${other.driveId})`;
  if (edge.sameCar) return `the same car's other driver (${other.driverName || "not named"})`;
  return `${from.driverName || "the same driver"}'s other car (Car ${other.carNumber})`;
}

/** "Car 12's two drivers, J. Doe and A. Roe," or "J. Doe, in Car 12 and Car 40,": a pair in words. */
export function describePair(
  a: Drive,
  b: Drive,
  edge: { sameCar: boolean; sameDriver: boolean },
): string {
  if (edge.sameCar && edge.sameDriver)
    return `Car ${a.carNumber} with ${a.driverName || "its driver"}, entered twice,`;
  if (edge.sameCar)
    return `Car ${a.carNumber}'s two drivers, ${a.driverName || "not named"} and ${b.driverName || "not named"},`;
  return `${a.driverName || "One driver"}, in Car ${a.carNumber} and Car ${b.carNumber},`;
}
