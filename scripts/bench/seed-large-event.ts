// P7's large event: a second event on the demo's club, venue and pinned rule set, with the demo's
// officials, `entries` invented entrants and cars (the demo's makes, names and declarations, round
// and round) and every car through the tech line: the demo's tech sheet for its class, topped up
// with repeat readings to `recordsPerEntry`, and the verdict the engine derives from it.
import { eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Db } from "../../db/client";
import { cars, entries, eventOfficials, events, records, users, verdicts } from "../../db/schema";
import {
  demoCars,
  demoColours,
  demoDomain,
  demoFirstNames,
  demoLastNames,
} from "../../db/seed/demo-people";
import { demoRuleSet } from "../../db/seed/demo-rule-set";
import { demoTechRecords } from "../../db/seed/demo-tech-records";
import { createPrng } from "../../db/seed/prng";
import {
  type EntryDeclarationsInput,
  entryDeclarationsSchema,
} from "../../lib/scrutineer/classes/entry-declarations-schema";
import type { TechRecord } from "../../lib/scrutineer/records/record-schema";
import { displayUnits } from "../../lib/scrutineer/units/display-units";
import { evaluateEntry } from "../../lib/scrutineer/verdicts/evaluate-entry";
import { needsChiefScrutineer } from "../../lib/tech/needs-chief-scrutineer";

export type LargeEvent = { eventId: string; entryIds: string[]; records: number };

async function insertInChunks<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += 500) await insert(rows.slice(i, i + 500));
}

/** Add the large event beside the demo event `demoEventId`; `officials` make its records. */
export async function seedLargeEvent(
  db: Db,
  opts: {
    demoEventId: string;
    officials: [string, string];
    entries: number;
    recordsPerEntry: number;
  },
): Promise<LargeEvent> {
  const [demo] = await db.select().from(events).where(eq(events.id, opts.demoEventId));
  if (!demo) throw new Error("no demo event to copy");
  const templates = await db
    .select({ declaredClass: entries.declaredClass, declarations: entries.declarations })
    .from(entries)
    .where(eq(entries.eventId, demo.id))
    .orderBy(entries.carNumber);
  const officials = await db
    .select()
    .from(eventOfficials)
    .where(eq(eventOfficials.eventId, demo.id));
  const now = new Date();
  const eventId = uuidv7();
  const rnd = createPrng(3_002_025);
  const userRows: (typeof users.$inferInsert)[] = [];
  const carRows: (typeof cars.$inferInsert)[] = [];
  const entryRows: (typeof entries.$inferInsert)[] = [];
  const recordRows: (typeof records.$inferInsert)[] = [];
  const verdictRows: (typeof verdicts.$inferInsert)[] = [];
  for (let i = 0; i < opts.entries; i += 1) {
    const template = templates[i % templates.length];
    const cls = demoRuleSet.classes.find((c) => c.id === template?.declaredClass);
    if (!template || !cls) throw new Error("demo entry without a class of the demo rule set");
    const userId = uuidv7();
    userRows.push({
      id: userId,
      name: `${rnd.pick(demoFirstNames)} ${rnd.pick(demoLastNames)}`,
      email: `bench-driver-${eventId.slice(-6)}-${i + 1}@${demoDomain}`,
      createdAt: now,
    });
    const model = rnd.pick(demoCars);
    const carId = uuidv7();
    carRows.push({
      id: carId,
      ownerId: userId,
      make: model.make,
      model: model.model,
      year: model.year,
      colour: rnd.pick(demoColours),
      createdAt: now,
      updatedAt: now,
    });
    const entryId = uuidv7();
    const declarations = template.declarations as EntryDeclarationsInput;
    entryRows.push({
      id: entryId,
      eventId,
      carId,
      carNumber: i + 1,
      declaredClass: cls.id,
      driverId: userId,
      declarations,
      status: "entered",
      createdAt: now,
      updatedAt: now,
    });
    const made: TechRecord[] = demoTechRecords(
      {
        entryId,
        cls,
        declarations,
        officials: opts.officials,
        eventDate: demo.eventDate,
        twist: "none",
        seed: 5000 + i,
      },
      demoRuleSet,
    );
    const sheet = made.find((r) => r.kind === "reading");
    for (let extra = 0; made.length < opts.recordsPerEntry && sheet; extra += 1) {
      const at = Date.parse(sheet.deviceTime) + 3_600_000 + extra * 1000;
      made.push({ ...sheet, id: uuidv7({ msecs: at }), deviceTime: new Date(at).toISOString() });
    }
    for (const r of made)
      recordRows.push({
        ...r,
        eventId,
        deviceTime: new Date(r.deviceTime),
        receivedAt: new Date(now.getTime() - 3_600_000),
      });
    const verdict = evaluateEntry({
      ruleSet: demoRuleSet,
      entry: {
        entryId,
        declaredClassId: cls.id,
        declarations: entryDeclarationsSchema.parse(declarations),
      },
      records: made,
      eventDate: demo.eventDate,
      display: displayUnits({ length: "mm" }),
    });
    verdictRows.push({
      eventId,
      entryId,
      status: verdict.status,
      finalClass: verdict.classId,
      needsChief: needsChiefScrutineer(verdict),
      reason: verdict.reason.slice(0, 500),
      ruleSetVersionId: demo.ruleSetVersionId,
      result: verdict,
      recordCount: verdict.records.total,
      computedAt: now,
    });
  }
  await db.transaction(async (tx) => {
    await tx.insert(events).values({
      ...demo,
      id: eventId,
      name: `${demo.name} (bench field of ${opts.entries})`,
      slug: `bench-field-${eventId.slice(-12)}`,
      capacity: Math.max(demo.capacity, opts.entries),
      createdAt: now,
      updatedAt: now,
    });
    await tx
      .insert(eventOfficials)
      .values(officials.map((o) => ({ ...o, eventId, createdAt: now })));
    await insertInChunks(userRows, (c) => tx.insert(users).values(c));
    await insertInChunks(carRows, (c) => tx.insert(cars).values(c));
    await insertInChunks(entryRows, (c) => tx.insert(entries).values(c));
    await insertInChunks(recordRows, (c) => tx.insert(records).values(c));
    await insertInChunks(verdictRows, (c) => tx.insert(verdicts).values(c));
  });
  return {
    eventId,
    entryIds: entryRows.map((e) => e.id as string),
    records: recordRows.length,
  };
}
