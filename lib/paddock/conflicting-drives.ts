import type { Drive } from "./drive";

/** Two drives that may not share a group, nor (where the number of groups allows) run back to back. */
export type DriveConflict = { a: string; b: string; sameCar: boolean; sameDriver: boolean };

/**
 * Every pair of drives that share a car (`carKey`: a shared car's two drivers) or a driver
 * (`driverKey`: one person entered in two cars), sorted by drive id. A car cannot be on track twice
 * at once, nor a driver (common practice (no source)).
 */
export function conflictingDrives(drives: readonly Drive[]): DriveConflict[] {
  const pairs = new Map<string, DriveConflict>();
  const sorted = [...drives].sort((x, y) =>
    x.driveId < y.driveId ? -1 : x.driveId > y.driveId ? 1 : 0,
  );
  const byKey = (key: (d: Drive) => string, mark: "sameCar" | "sameDriver") => {
    const buckets = new Map<string, Drive[]>();
    for (const d of sorted) {
      const k = key(d);
      const bucket = buckets.get(k);
      if (bucket) bucket.push(d);
      else buckets.set(k, [d]);
    }
    for (const bucket of buckets.values())
      for (let i = 0; i < bucket.length; i += 1)
        for (let j = i + 1; j < bucket.length; j += 1) {
          const a = bucket[i]?.driveId ?? "";
          const b = bucket[j]?.driveId ?? "";
          const id = `${a}\u0000${b}`;
          const pair = pairs.get(id) ?? { a, b, sameCar: false, sameDriver: false };
          pair[mark] = true;
          pairs.set(id, pair);
        }
  };
  byKey((d) => d.carKey, "sameCar");
  byKey((d) => d.driverKey, "sameDriver");
  return [...pairs.values()].sort((x, y) =>
    x.a === y.a ? (x.b < y.b ? -1 : 1) : x.a < y.a ? -1 : 1,
  );
}
