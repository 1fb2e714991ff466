import type { ClerkCar } from "@/lib/run-sheet/clerk-view";

/** Why a car is not (or no longer) ready to run, in words the clerk can read out; null if it is. */
export function carStateWhy(car: ClerkCar): string | null {
  const parts: string[] = [];
  if (car.withdrawn) parts.push("Withdrawn");
  if (car.reinspection) {
    parts.push(
      `Re-inspection asked by ${car.reinspection.askedBy} (${car.reinspection.cause}): ${car.reinspection.reason}`,
    );
  }
  if (car.status !== "cleared" && car.status !== "moved-up" && car.reason) parts.push(car.reason);
  if (car.status === "waiting" && !car.reason && !car.reinspection) {
    parts.push("Not seen at the tech line yet");
  }
  if (!car.signOn.signedOn) parts.push(`${car.signOn.missing.join("; ")}`);
  if (parts.length === 0) return null;
  const text = parts.map((part) => part.replace(/[.\s]+$/, "")).join(". ");
  return `${text}.`;
}
