// The demo event day (invented): a club, its venue, a rule set, one event with about 40 entries in
// four classes, an official for every role, and entrants — one car shared by two drivers.
import { v7 as uuidv7 } from "uuid";
import { normalizeEmail } from "../../lib/auth/normalize-email";
import type { RefundPolicy } from "../../lib/entries/refund-policy-schema";
import { modeNow } from "../../lib/env";
import type { EntryDeclarationsInput } from "../../lib/scrutineer/classes/entry-declarations-schema";
import { entryDeclarationsSchema } from "../../lib/scrutineer/classes/entry-declarations-schema";
import { displayUnits } from "../../lib/scrutineer/units/display-units";
import { evaluateEntry } from "../../lib/scrutineer/verdicts/evaluate-entry";
import { needsChiefScrutineer } from "../../lib/tech/needs-chief-scrutineer";
import type { Db } from "../client";
import {
  cars,
  clubs,
  entries,
  eventOfficials,
  events,
  payments,
  records,
  ruleSets,
  ruleSetVersions,
  users,
  venues,
  verdicts,
  waivers,
} from "../schema";
import { DEMO_PASSWORD_HASH } from "./demo-password";
import {
  demoCars,
  demoColours,
  demoDomain,
  demoEntrants,
  demoFirstNames,
  demoLastNames,
  demoOfficials,
} from "./demo-people";
import { demoRuleSet } from "./demo-rule-set";
import { type DemoTwist, demoTechRecords } from "./demo-tech-records";
import { demoWaiverText, demoWaiverVersion } from "./demo-waiver";
import { createPrng } from "./prng";

/** Classes of the demo ladder and how many entries each gets (40 in all). */
const classPlan = [
  { classId: "kestrel", count: 12 },
  { classId: "merlin", count: 12 },
  { classId: "harrier", count: 10 },
  { classId: "peregrine", count: 6 },
] as const;

export type DemoSeed = { eventId: string; entryIds: string[]; userIds: Record<string, string> };

/** A demo account's address, in the one spelling sign-in compares (lib/auth/normalize-email.ts). */
function demoEmail(key: string): string {
  const email = normalizeEmail(`${key}@${demoDomain}`);
  if (email === null) throw new Error(`demo address for ${key} is not plausible`);
  return email;
}

/** The Saturday on or after `today` (YYYY-MM-DD), as YYYY-MM-DD. */
export function nextSaturday(today: string): string {
  const date = new Date(`${today}T12:00:00Z`);
  date.setUTCDate(date.getUTCDate() + ((6 - date.getUTCDay() + 7) % 7));
  return date.toISOString().slice(0, 10);
}

/**
 * Insert the whole demo in one transaction. `today` decides the event date (next Saturday).
 * Every demo account gets the password published in demo-password.ts, so this runs only when
 * the environment asks for the demo (PLUMBLINE_MODE=demo).
 */
export async function seedDemo(db: Db, opts: { today: string }): Promise<DemoSeed> {
  if (modeNow() !== "demo") {
    throw new Error(
      "Plumbline: refusing to seed the demo — its accounts share the password published in db/seed/demo-password.ts. Set PLUMBLINE_MODE=demo to seed a demo database.",
    );
  }
  const rnd = createPrng(20270417);
  // Experience and the co-driver's pace come from their own sequence, so the cars, classes and
  // readings drawn from `rnd` stay as they were before drivers declared experience.
  const pace = createPrng(20270418);
  const now = new Date();
  const eventDate = nextSaturday(opts.today);
  /** The open event: four weeks after the running one. */
  const openEventDate = new Date(Date.parse(`${eventDate}T12:00:00Z`) + 28 * 86_400_000)
    .toISOString()
    .slice(0, 10);
  const clubId = uuidv7();
  const venueId = uuidv7();
  const ruleSetId = uuidv7();
  const ruleSetVersionId = uuidv7();
  const eventId = uuidv7();
  const userIds: Record<string, string> = {};

  const userRows: (typeof users.$inferInsert)[] = [];
  const addUser = (key: string, name: string) => {
    const id = uuidv7();
    userIds[key] = id;
    userRows.push({
      id,
      name,
      email: demoEmail(key),
      emailVerified: now,
      passwordHash: DEMO_PASSWORD_HASH,
      createdAt: now,
    });
    return id;
  };
  for (const o of demoOfficials) addUser(o.key, o.name);
  for (const e of demoEntrants) addUser(e.key, e.name);

  const carRows: (typeof cars.$inferInsert)[] = [];
  const entryRows: (typeof entries.$inferInsert)[] = [];
  const usedNumbers = new Set<number>();
  const carNumber = () => {
    for (;;) {
      const n = rnd.int(2, 99);
      if (!usedNumbers.has(n)) {
        usedNumbers.add(n);
        return n;
      }
    }
  };

  let driverIndex = 0;
  for (const plan of classPlan) {
    for (let i = 0; i < plan.count; i += 1) {
      const first = driverIndex === 0;
      const driverKey = first ? "entrant" : `driver${String(driverIndex).padStart(2, "0")}`;
      const driverId =
        userIds[driverKey] ??
        addUser(driverKey, `${rnd.pick(demoFirstNames)} ${rnd.pick(demoLastNames)}`);
      driverIndex += 1;
      const model = rnd.pick(demoCars);
      const carId = uuidv7();
      carRows.push({
        id: carId,
        ownerId: driverId,
        make: model.make,
        model: model.model,
        year: model.year,
        colour: rnd.pick(demoColours),
        createdAt: now,
        updatedAt: now,
      });
      entryRows.push({
        id: uuidv7(),
        eventId,
        carId,
        carNumber: first ? 7 : carNumber(),
        declaredClass: plan.classId,
        driverId,
        coDriverId: first ? (userIds.codriver ?? null) : null,
        lapTimeEstimateMs: lapEstimateMs(plan.classId, rnd.next()),
        driverExperience: pace.pick(demoExperience),
        coDriverExperience: first ? "novice" : null,
        coDriverLapTimeEstimateMs: first ? 118_000 + pace.int(0, 6_000) : null,
        declarations: demoDeclarations(plan.classId, rnd.next(), eventDate),
        status: "entered",
        createdAt: now,
        updatedAt: now,
      });
      if (first) usedNumbers.add(7);
    }
  }

  // Dates of birth: grown-ups spread over four decades; entry 3's driver is 16 on the day (a minor).
  const minorDriver = entryRows[3]?.driverId;
  userRows.forEach((user, i) => {
    user.dateOfBirth =
      user.id === minorDriver
        ? `${Number(eventDate.slice(0, 4)) - 16}${eventDate.slice(4)}`
        : `${1962 + ((i * 7) % 38)}-${String((i % 12) + 1).padStart(2, "0")}-${String(((i * 3) % 28) + 1).padStart(2, "0")}`;
  });

  const { recordRows, verdictRows } = demoTechLine({
    entryRows,
    eventId,
    eventDate,
    ruleSetVersionId,
    userIds,
    now,
  });

  await db.transaction(async (tx) => {
    await tx.insert(users).values(userRows);
    await tx.insert(clubs).values({
      id: clubId,
      name: "Brackenmoor & District Car Club",
      slug: "brackenmoor",
      createdAt: now,
    });
    await tx.insert(venues).values({
      id: venueId,
      clubId,
      name: "Cinder Vale Circuit",
      trackLengthM: 2860,
      timeZone: "Europe/London",
      carsPerKm: "5.0",
      createdAt: now,
    });
    await tx
      .insert(ruleSets)
      .values({ id: ruleSetId, clubId, name: "Brackenmoor time-attack classes", createdAt: now });
    await tx.insert(ruleSetVersions).values({
      id: ruleSetVersionId,
      ruleSetId,
      version: 1,
      body: demoRuleSet,
      notes: "Demo ladder: Kestrel, Merlin, Harrier, Peregrine",
      createdBy: userIds.organizer ?? null,
      createdAt: now,
      lockedAt: now,
    });
    await tx.insert(events).values({
      id: eventId,
      clubId,
      venueId,
      name: "Cinder Vale Time Attack",
      slug: `cinder-vale-${eventDate}`,
      eventDate,
      timeZone: "Europe/London",
      unitSystem: "mm",
      status: "running",
      ruleSetVersionId,
      entryFeeMinor: 9500,
      currency: "GBP",
      capacity: 48,
      waiverText: demoWaiverText,
      waiverVersion: demoWaiverVersion,
      refundPolicy: demoRefundPolicy,
      createdAt: now,
      updatedAt: now,
    });
    // A second event a month on, open for entries: where a new entrant enters. The club's
    // officials run it too.
    const openEventId = uuidv7();
    await tx.insert(events).values({
      id: openEventId,
      clubId,
      venueId,
      name: "Cinder Vale Winter Sprint",
      slug: `cinder-vale-winter-${openEventDate}`,
      eventDate: openEventDate,
      timeZone: "Europe/London",
      unitSystem: "mm",
      status: "entries-open",
      ruleSetVersionId,
      entryFeeMinor: 8500,
      currency: "GBP",
      capacity: 30,
      entriesOpenAt: new Date(Date.parse(`${opts.today}T00:00:00Z`) - 7 * 86_400_000),
      entriesCloseAt: new Date(`${openEventDate}T00:00:00Z`),
      waiverText: demoWaiverText,
      waiverVersion: demoWaiverVersion,
      refundPolicy: demoRefundPolicy,
      createdAt: now,
      updatedAt: now,
    });
    await tx.insert(eventOfficials).values(
      [eventId, openEventId].flatMap((officialEventId) =>
        demoOfficials.map((o) => ({
          eventId: officialEventId,
          userId: userIds[o.key] ?? "",
          role: o.role,
          createdAt: now,
        })),
      ),
    );
    await tx.insert(cars).values(carRows);
    await tx.insert(entries).values(entryRows);
    await tx.insert(waivers).values(demoWaivers(entryRows, eventId, now, userRows));
    await tx.insert(payments).values(demoPayments(entryRows, eventId, now));
    if (recordRows.length > 0) await tx.insert(records).values(recordRows);
    if (verdictRows.length > 0) await tx.insert(verdicts).values(verdictRows);
  });

  return { eventId, entryIds: entryRows.map((e) => e.id as string), userIds };
}

/** The demo club's refund policy: in full up to two weeks before, half up to three days before. */
const demoRefundPolicy: RefundPolicy = {
  tiers: [
    { daysBefore: 14, percent: 100 },
    { daysBefore: 3, percent: 50 },
  ],
};

/** Drivers' experience in the demo: more novices and intermediates than experts, as at a club day. */
const demoExperience = [
  "novice",
  "novice",
  "intermediate",
  "intermediate",
  "intermediate",
  "advanced",
  "advanced",
  "expert",
] as const;

function lapEstimateMs(classId: string, r: number): number {
  const base: Record<string, number> = {
    kestrel: 118_000,
    merlin: 112_000,
    harrier: 106_000,
    peregrine: 101_000,
  };
  return Math.round((base[classId] ?? 115_000) + r * 6000);
}

function demoDeclarations(classId: string, r: number, eventDate: string): EntryDeclarationsInput {
  const aero = classId !== "kestrel" || r > 0.7;
  const year = Number(eventDate.slice(0, 4));
  return {
    aero: { wing: aero, splitter: classId !== "kestrel", diffuser: classId === "peregrine" },
    dynoSheet: {
      power: {
        value: Math.round(
          140 + r * 60 + (classId === "peregrine" ? 120 : classId === "harrier" ? 60 : 0),
        ),
        unit: "hp",
      },
      measuredAt: "wheel",
      correction: "sae-j1349",
      ambient: {
        pressure: { value: 1008 + Math.round(r * 12), unit: "mbar" },
        temperature: { value: 14 + Math.round(r * 10), unit: "C" },
      },
      date: `${year - 1}-0${1 + Math.floor(r * 8)}-15`,
    },
    tyres:
      classId === "peregrine" && r > 0.4
        ? { kind: "no-grade" }
        : { kind: "graded", treadwear: r > 0.5 ? 200 : 180 },
    modificationPoints: Math.round(r * 10),
    driverWeightKg: 70 + Math.round(r * 25),
    ballastKg: 0,
  };
}

function demoWaivers(
  rows: (typeof entries.$inferInsert)[],
  eventId: string,
  now: Date,
  people: (typeof users.$inferInsert)[],
): (typeof waivers.$inferInsert)[] {
  const nameOf = (id: string | null | undefined) =>
    people.find((p) => p.id === id)?.name ?? "signed online";
  // Most drivers have signed — each driver of a shared car their own — and the last two have not
  // (so the sign-on desk has work). Entry 3's driver is a minor whose guardian has not co-signed.
  return rows.slice(0, rows.length - 2).flatMap((row, i) =>
    [row.driverId, row.coDriverId]
      .filter((signer): signer is string => typeof signer === "string")
      .map((signerId) => ({
        id: uuidv7(),
        eventId,
        entryId: row.id as string,
        signerId,
        signedName: nameOf(signerId),
        signedAt: now,
        isMinor: i === 3 && signerId === row.driverId,
        guardianName: null,
        guardianSignedAt: null,
        textVersion: demoWaiverVersion,
      })),
  );
}

function demoPayments(
  rows: (typeof entries.$inferInsert)[],
  eventId: string,
  now: Date,
): (typeof payments.$inferInsert)[] {
  return rows.slice(0, rows.length - 3).map((row, i) => ({
    id: uuidv7(),
    eventId,
    entryId: row.id as string,
    provider: "demo",
    providerRef: `demo_${String(i + 1).padStart(4, "0")}`,
    amountMinor: 9500,
    currency: "GBP",
    status: "paid" as const,
    createdAt: now,
    updatedAt: now,
  }));
}

/** Which demo cars have been through the tech line already, and what went wrong for a few. */
function demoTwistFor(index: number): DemoTwist | null {
  // Car 7 (index 0, the demo entrant's) and the last thirteen entries are still to come.
  if (index === 0 || index > 26) return null;
  const twists: Record<number, DemoTwist> = {
    3: "over-height",
    14: "over-height",
    16: "over-height",
    9: "expired-harness",
    20: "too-close",
    24: "disagree",
  };
  return twists[index] ?? "none";
}

/** The demo's tech-line records and the verdicts the engine derives from them. */
function demoTechLine(opts: {
  entryRows: (typeof entries.$inferInsert)[];
  eventId: string;
  eventDate: string;
  ruleSetVersionId: string;
  userIds: Record<string, string>;
  now: Date;
}) {
  const officials: [string, string] = [
    opts.userIds.scrutineer ?? "",
    opts.userIds.scrutineer2 ?? "",
  ];
  const recordRows: (typeof records.$inferInsert)[] = [];
  const verdictRows: (typeof verdicts.$inferInsert)[] = [];
  opts.entryRows.forEach((entry, index) => {
    const twist = demoTwistFor(index);
    const cls = demoRuleSet.classes.find((c) => c.id === entry.declaredClass);
    if (twist === null || !cls) return;
    const declarations = entry.declarations as EntryDeclarationsInput;
    const entryId = entry.id as string;
    const made = demoTechRecords(
      {
        entryId,
        cls,
        declarations,
        officials,
        eventDate: opts.eventDate,
        twist,
        seed: 1000 + index,
      },
      demoRuleSet,
    );
    const verdict = evaluateEntry({
      ruleSet: demoRuleSet,
      entry: {
        entryId,
        declaredClassId: cls.id,
        declarations: entryDeclarationsSchema.parse(declarations),
      },
      records: made,
      eventDate: opts.eventDate,
      display: displayUnits({ length: "mm" }),
    });
    for (const r of made) {
      recordRows.push({
        ...r,
        eventId: opts.eventId,
        deviceTime: new Date(r.deviceTime),
        // Synced an hour before the demo starts (never in the future, whatever the event date).
        receivedAt: new Date(opts.now.getTime() - 3_600_000),
      });
    }
    verdictRows.push({
      eventId: opts.eventId,
      entryId,
      status: verdict.status,
      finalClass: verdict.classId,
      needsChief: needsChiefScrutineer(verdict),
      reason: verdict.reason.slice(0, 500),
      ruleSetVersionId: opts.ruleSetVersionId,
      result: verdict,
      recordCount: verdict.records.total,
      computedAt: opts.now,
    });
  });
  return { recordRows, verdictRows };
}
