import { countsAsMinor } from "./counts-as-minor";

type Driver = { id: string; name: string | null; dateOfBirth: string | null; role: string };
type Signed = {
  signerId: string;
  isMinor: boolean;
  signedAt: Date;
  textVersion: string;
  guardianEmail: string | null;
  guardianSignedAt: Date | null;
};

/** One driver's waiver, as the waiver page lists it. */
export type DriverWaiverLine = {
  driverId: string;
  who: string;
  state: "complete" | "needs-guardian" | "not-signed";
  minor: boolean;
  signedAt: Date | null;
  textVersion: string | null;
  guardianEmail: string | null;
};

/** Each driver of the entry with where their waiver stands. Pure. */
export function describeDriverWaivers(
  drivers: Driver[],
  signed: Signed[],
  eventDate: string,
): DriverWaiverLine[] {
  return drivers.map((d) => {
    const own = signed.find((w) => w.signerId === d.id);
    const minor = countsAsMinor({
      signedAsMinor: own?.isMinor ?? false,
      dateOfBirth: d.dateOfBirth,
      eventDate,
    });
    return {
      driverId: d.id,
      who: `${d.name ?? "A driver with no name yet"} (${d.role})`,
      state: !own
        ? "not-signed"
        : minor && own.guardianSignedAt === null
          ? "needs-guardian"
          : "complete",
      minor,
      signedAt: own?.signedAt ?? null,
      textVersion: own?.textVersion ?? null,
      guardianEmail: own?.guardianEmail ?? null,
    };
  });
}
