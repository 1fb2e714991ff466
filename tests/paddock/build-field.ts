// Larger random fields for the builder's property tests, made from a seed (fast-check picks the
// seed and the sizes). `plantedField` hides a valid assignment with a known number of groups.
import { type Drive, experienceLevels } from "../../lib/paddock/drive";

function prng(seed: number) {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Slot = { car: number; driver: number; group: number };

function toDrives(slots: Slot[], random: () => number): Drive[] {
  const classOfCar = new Map<number, number>();
  const seenCar = new Map<number, number>();
  // Ids from a shuffled numbering, so the planted order cannot leak through the ids.
  const ids = slots.map((_, k) => k).sort(() => random() - 0.5);
  return slots.map((s, k) => {
    const rank = classOfCar.get(s.car) ?? Math.floor(random() * 6);
    classOfCar.set(s.car, rank);
    const slot = (seenCar.get(s.car) ?? 0) + 1;
    seenCar.set(s.car, slot);
    return {
      driveId: `d${String(ids[k]).padStart(4, "0")}:${slot}`,
      entryId: `entry-${s.car}`,
      carNumber: s.car + 1,
      carKey: `car-${s.car}`,
      driverKey: `driver-${s.driver}`,
      driverName: `Driver ${s.driver}`,
      classId: `class-${rank}`,
      className: `Class ${String.fromCharCode(65 + rank)}`,
      classRank: rank,
      experience: experienceLevels[Math.floor(random() * 4)] ?? "novice",
      lapTimeMs: random() < 0.1 ? null : 100_000 - rank * 4_000 + Math.floor(random() * 12_000),
    };
  });
}

/**
 * `n` drives in `groups` planted groups (dealt round robin, so each holds at most ⌈n/groups⌉):
 * about `shareShare` of them pair up as shared cars and about `twoCarShare` as one driver's two
 * cars, always between planted groups at least two apart. The planted assignment keeps every rule,
 * so when ⌈n/cap⌉ = groups the builder must use exactly `groups` groups.
 */
export function plantedField(opts: {
  n: number;
  groups: number;
  seed: number;
  shareShare: number;
  twoCarShare: number;
}): Drive[] {
  const random = prng(opts.seed);
  const slots: Slot[] = Array.from({ length: opts.n }, (_, k) => ({
    car: k,
    driver: k,
    group: k % opts.groups,
  }));
  const pairUp = (share: number, key: "car" | "driver", taken: Set<number>) => {
    for (let t = 0; t < Math.floor((opts.n * share) / 2); t++) {
      const i = Math.floor(random() * opts.n);
      const a = slots[i];
      if (!a || taken.has(i)) continue;
      const far = slots
        .map((s, j) => ({ s, j }))
        .filter(({ s, j }) => !taken.has(j) && j !== i && Math.abs(s.group - a.group) >= 2);
      const pick = far[Math.floor(random() * far.length)];
      if (!pick) continue;
      // Give the pick this slot's car (or driver): its own was used by it alone.
      if (key === "car") {
        if (pick.s.driver === a.driver) continue;
        pick.s.car = a.car;
      } else {
        if (pick.s.car === a.car) continue;
        pick.s.driver = a.driver;
      }
      taken.add(i);
      taken.add(pick.j);
    }
  };
  pairUp(opts.shareShare, "car", new Set());
  pairUp(opts.twoCarShare, "driver", new Set());
  return toDrives(slots, random);
}

/** `n` drives from random cars: about `shareShare` in shared cars, about `twoCarShare` by drivers
 *  with a second car; nobody drives more than two drives. */
export function randomField(opts: {
  n: number;
  seed: number;
  shareShare: number;
  twoCarShare: number;
}): Drive[] {
  const random = prng(opts.seed);
  const slots: Slot[] = [];
  const once: number[] = [];
  let cars = 0;
  let drivers = 0;
  const driverFor = () => {
    if (once.length && random() < opts.twoCarShare) {
      const at = Math.floor(random() * once.length);
      const d = once[at] ?? 0;
      once.splice(at, 1);
      return d;
    }
    once.push(drivers);
    return drivers++;
  };
  while (slots.length < opts.n) {
    const car = cars++;
    const first = driverFor();
    slots.push({ car, driver: first, group: 0 });
    if (slots.length < opts.n && random() < opts.shareShare) {
      let second = driverFor();
      if (second === first) second = drivers++;
      slots.push({ car, driver: second, group: 0 });
    }
  }
  return toDrives(slots, random);
}
