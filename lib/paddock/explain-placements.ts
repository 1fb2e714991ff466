import { describeDrive, relationTo } from "./describe-drive";
import { formatLapTime } from "./format-lap-time";
import type { RunGroupInstance } from "./run-group-instance";

/**
 * One line per drive saying where it runs and why: the company it keeps (its class, the others'
 * classes, the group's range of estimates), how far it sits from its own car's other driver or its
 * driver's other car, and whether it shares the fastest car's group as a novice.
 */
export function explainPlacements(
  instance: RunGroupInstance,
  members: readonly number[][],
  names: readonly string[],
  spaceable: readonly boolean[],
  placedTwice: ReadonlySet<number>,
): Record<string, string> {
  const { drives } = instance;
  const groupCount = members.length;
  const groupOf = new Int32Array(drives.length).fill(-1);
  members.forEach((m, g) => {
    for (const i of m) groupOf[i] = g;
  });
  const out: Record<string, string> = {};
  drives.forEach((d, i) => {
    const g = groupOf[i] ?? -1;
    const who = describeDrive(d);
    if (g < 0) {
      out[d.driveId] = `${who} is in no group.`;
      return;
    }
    const name = names[g] ?? `Group ${g + 1}`;
    const mates = (members[g] ?? []).filter((k) => k !== i);
    const same = mates.filter((k) => drives[k]?.classId === d.classId).length;
    const otherClasses = [
      ...new Set(
        mates.flatMap((k) =>
          drives[k]?.classId === d.classId ? [] : [drives[k]?.className ?? ""],
        ),
      ),
    ];
    const others = mates.length - same;
    let company: string;
    if (mates.length === 0) company = "on its own";
    else if (others === 0)
      company = `with the other ${same} ${d.className} car${same === 1 ? "" : "s"}`;
    else {
      const listed = otherClasses.slice(0, 3).join(", ") + (otherClasses.length > 3 ? "…" : "");
      company = `with ${same} other ${d.className} car${same === 1 ? "" : "s"} and ${others} from ${listed}`;
    }
    const laps = (members[g] ?? []).map((k) => instance.lapOf[k] ?? -1).filter((l) => l > 0);
    const pace =
      laps.length >= 2
        ? ` (estimates in the group ${formatLapTime(Math.min(...laps))}–${formatLapTime(Math.max(...laps))})`
        : "";
    const parts = [`${who} runs in ${name} ${company}${pace}`];
    for (const e of instance.neighbours[i] ?? []) {
      const other = drives[e.other];
      const h = groupOf[e.other] ?? -1;
      if (!other || h < 0) continue;
      const rel = relationTo(d, other, e);
      const there = names[h] ?? `Group ${h + 1}`;
      const gap = Math.abs(g - h);
      if (gap === 0) parts.push(`in the same group as ${rel}, which is not allowed`);
      else if (gap >= 2) parts.push(`kept apart from ${rel} in ${there}`);
      else if (spaceable[instance.componentOf[i] ?? 0])
        parts.push(
          `back to back with ${rel} in ${there}, which ${groupCount} groups allow avoiding`,
        );
      else
        parts.push(
          `back to back with ${rel} in ${there}: with ${groupCount} groups no order keeps them apart`,
        );
    }
    if (i === instance.fastest) parts.push("its estimate is the fastest of the day");
    else if (
      instance.fastest >= 0 &&
      groupOf[instance.fastest] === g &&
      instance.experienceOf[i] === 0
    )
      parts.push("a novice in the group of the fastest estimate");
    if (placedTwice.has(i)) parts.push("it is also listed in another group");
    out[d.driveId] = `${parts.join("; ")}.`;
  });
  return out;
}
