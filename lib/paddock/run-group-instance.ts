import { conflictingDrives } from "./conflicting-drives";
import { type Drive, experienceLevels } from "./drive";

/** A conflicting neighbour of a drive (indices into `RunGroupInstance.drives`). */
export type ConflictEdge = { other: number; sameCar: boolean; sameDriver: boolean };

/**
 * The drives in the indexed form the search and the check work on: sorted by drive id (so the same
 * drives in any order give the same result), with class and experience as small integers, lap-time
 * estimates (−1 when unknown), conflict neighbours and connected conflict components.
 */
export type RunGroupInstance = {
  drives: Drive[];
  indexOf: Map<string, number>;
  classOf: Int32Array;
  classCount: number;
  experienceOf: Int32Array;
  /** Lap-time estimate in ms, −1 when the driver gave none. */
  lapOf: Float64Array;
  neighbours: ConflictEdge[][];
  componentOf: Int32Array;
  components: number[][];
  /** The drive with the fastest estimate (ties: lowest drive id); −1 when nobody gave one. */
  fastest: number;
};

/** Index the drives; throws on a drive id given twice. */
export function runGroupInstance(input: readonly Drive[]): RunGroupInstance {
  const drives = [...input].sort((x, y) =>
    x.driveId < y.driveId ? -1 : x.driveId > y.driveId ? 1 : 0,
  );
  const n = drives.length;
  const indexOf = new Map<string, number>();
  drives.forEach((d, i) => {
    if (indexOf.has(d.driveId)) throw new Error(`drive ${d.driveId} is listed twice`);
    indexOf.set(d.driveId, i);
  });
  const classIds = [...new Set(drives.map((d) => d.classId))].sort();
  const classIndex = new Map(classIds.map((c, i) => [c, i]));
  const classOf = Int32Array.from(drives, (d) => classIndex.get(d.classId) ?? 0);
  const experienceOf = Int32Array.from(drives, (d) => experienceLevels.indexOf(d.experience));
  const lapOf = Float64Array.from(drives, (d) => d.lapTimeMs ?? -1);
  const neighbours: ConflictEdge[][] = drives.map(() => []);
  for (const c of conflictingDrives(drives)) {
    const a = indexOf.get(c.a) ?? 0;
    const b = indexOf.get(c.b) ?? 0;
    neighbours[a]?.push({ other: b, sameCar: c.sameCar, sameDriver: c.sameDriver });
    neighbours[b]?.push({ other: a, sameCar: c.sameCar, sameDriver: c.sameDriver });
  }
  const componentOf = new Int32Array(n).fill(-1);
  const components: number[][] = [];
  for (let s = 0; s < n; s += 1) {
    if ((componentOf[s] ?? 0) >= 0) continue;
    const members = [s];
    componentOf[s] = components.length;
    for (let q = 0; q < members.length; q += 1)
      for (const e of neighbours[members[q] ?? 0] ?? [])
        if (componentOf[e.other] === -1) {
          componentOf[e.other] = components.length;
          members.push(e.other);
        }
    components.push(members.sort((x, y) => x - y));
  }
  let fastest = -1;
  for (let i = 0; i < n; i += 1) {
    const lap = lapOf[i] ?? -1;
    if (lap > 0 && (fastest < 0 || lap < (lapOf[fastest] ?? 0))) fastest = i;
  }
  return {
    drives,
    indexOf,
    classOf,
    classCount: classIds.length,
    experienceOf,
    lapOf,
    neighbours,
    componentOf,
    components,
    fastest,
  };
}
