import type { RunSheet } from "../paddock/run-sheet-schema";
import type { ClerkCar, FlaggedDrive } from "./clerk-view";

/**
 * Drives on the published run sheet whose car may no longer run: withdrawn, held, waiting again
 * (a re-inspection) or no longer signed on. The sheet stays as published; the flag says why.
 */
export function flagPublishedDrives(sheet: RunSheet, cars: ClerkCar[]): FlaggedDrive[] {
  const byEntry = new Map(cars.map((c) => [c.entryId, c]));
  return sheet.drives.flatMap((drive) => {
    const car = byEntry.get(drive.entryId);
    const why = whyNotReady(car);
    return why
      ? [{ driveId: drive.driveId, entryId: drive.entryId, carNumber: drive.carNumber, why }]
      : [];
  });
}

function whyNotReady(car: ClerkCar | undefined): string | null {
  if (!car || car.withdrawn) return "Withdrawn since the run sheet was published.";
  if (car.reinspection) {
    return `Sent back for re-inspection (${car.reinspection.cause}): ${car.reinspection.reason}`;
  }
  if (car.status === "held") return `Held at the tech line: ${car.reason ?? "see the tech sheet"}`;
  if (car.status !== "cleared" && car.status !== "moved-up") {
    return `No longer cleared (${car.status.replace("-", " ")}): ${car.reason ?? "see the tech sheet"}`;
  }
  if (!car.signOn.signedOn) return `Not signed on: ${car.signOn.missing.join("; ")}.`;
  return null;
}
