import { AppError } from "../errors";

/**
 * Paying for an entry and withdrawing it are for its driver and the car's owner only (not a
 * co-driver, not an official): read from the stored entry, never from what the browser sent.
 */
export function requireEntryPayer(
  entry: { driverId: string; ownerId: string },
  userId: string,
): void {
  if (entry.driverId !== userId && entry.ownerId !== userId) {
    throw new AppError(
      "forbidden",
      "Only the entry's driver or the car's owner may do this: your account does not allow that.",
    );
  }
}
